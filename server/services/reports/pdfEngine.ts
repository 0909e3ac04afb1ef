/**
 * pdfmake 0.3 with Noto Sans (TTF from @expo-google-fonts/noto-sans; pdfmake cannot read WOFF2), shared by the
 * PDF reports. No remote or local file access beyond the fonts. The header of every page names the document, the
 * footer says "page x of y" once (pdfmake knows the page count; Chromium's print does not fill @page boxes). US Letter
 * for users working in US customary units, A4 otherwise.
 */
import { createRequire } from 'node:module';
import path from 'node:path';
import type { UnitSystem } from '../../../shared/types/api.js';

export type Content = Record<string, unknown> | string | Content[];
interface PdfMake {
  setFonts(f: Record<string, Record<string, string>>): void;
  setUrlAccessPolicy(fn: (url: string) => boolean): void;
  setLocalAccessPolicy(fn: (p: string) => boolean): void;
  createPdf(doc: Record<string, unknown>): { getBuffer(): Promise<Buffer> };
}
const require = createRequire(import.meta.url);
const fontDir = path.dirname(require.resolve('@expo-google-fonts/noto-sans/package.json'));
let pdfmake: PdfMake | null = null;

function engine(): PdfMake {
  if (pdfmake) return pdfmake;
  pdfmake = require('pdfmake') as PdfMake;
  const f = (dir: string) => path.join(fontDir, dir, `NotoSans_${dir}.ttf`);
  pdfmake.setFonts({
    NotoSans: { normal: f('400Regular'), bold: f('700Bold'), italics: f('400Regular_Italic'), bolditalics: f('700Bold_Italic') },
  });
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy((p) => path.resolve(p).startsWith(fontDir));
  return pdfmake;
}

export const PDF_STYLES = {
  h1: { fontSize: 15, bold: true, margin: [0, 0, 0, 2] },
  h2: { fontSize: 11, bold: true, margin: [0, 10, 0, 4] },
  th: { bold: true, fillColor: '#e8eef0' },
  small: { fontSize: 7.5, color: '#444444' },
};

export interface PdfParts {
  pageOrientation?: 'portrait' | 'landscape';
  /** left of the header on every page: what the document is about (column, record) */
  header: string;
  /** left of the footer on every page */
  footer: string;
  content: Content[];
}

/** Header and footer of every page: the document's name above, the footer's text and "page x of y" below. */
export function pageFrame(p: Pick<PdfParts, 'header' | 'footer'>) {
  return {
    header: () => ({ text: p.header, bold: true, margin: [28, 16, 28, 0], fontSize: 8 }),
    footer: (page: number, pages: number) => ({
      columns: [{ text: p.footer }, { text: `page ${page} of ${pages}`, alignment: 'right', width: 80 }],
      margin: [28, 10, 28, 0],
      fontSize: 7,
      color: '#555555',
    }),
  };
}

/** Paper people print on: US Letter where US customary units are used, A4 elsewhere. */
export const paperFor = (sys: UnitSystem): 'LETTER' | 'A4' => (sys === 'US' ? 'LETTER' : 'A4');

export function renderPdf(p: PdfParts, sys: UnitSystem): Promise<Buffer> {
  const doc = {
    pageSize: paperFor(sys),
    pageOrientation: p.pageOrientation ?? 'portrait',
    pageMargins: [28, 40, 28, 34],
    defaultStyle: { font: 'NotoSans', fontSize: 8.5 },
    styles: PDF_STYLES,
    ...pageFrame(p),
    content: p.content,
  };
  return engine().createPdf(doc).getBuffer();
}

/** A date-time for people in UTC, to the minute: "2026-05-04 09:12 UTC". */
export function pdfDateTime(iso: string | Date): string {
  const s = typeof iso === 'string' ? iso : iso.toISOString();
  return `${s.slice(0, 10)} ${s.slice(11, 16)} UTC`;
}

/** A safe file name from parts. */
export const pdfFileName = (...parts: string[]): string => parts.join('-').replace(/[^A-Za-z0-9._-]+/g, '_') + '.pdf';
