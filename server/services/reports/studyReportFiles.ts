/** A pump-around study as a PDF report, a CSV (csv-stringify, formulas escaped) or an XLSX workbook (exceljs). */
import { stringify } from 'csv-stringify/sync';
import ExcelJS from 'exceljs';
import type { DataSource } from 'typeorm';
import { chartSvg, legendSvg } from './reportCharts.js';
import { pdfDateTime, pdfFileName, renderPdf, type Content, type PdfParts } from './pdfEngine.js';
import { getStudy } from '../studies/studies.js';
import { studyReportData, type StudyReportData } from './studyReport.js';
import { REVIEW_LABELS } from '../../../shared/labels.js';
import { palette } from '../../../shared/palette.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { StudyRecord } from '../../../shared/types/studies.js';
import type { ExportFile } from './exportsFormat.js';

const th = (t: string) => ({ text: t, style: 'th' });
const ACTION_WORDS = { submit: 'Submitted', approve: 'Approved', return: 'Returned' } as const;

/** A line where each tray section ends, labelled with the section that follows (as on the run report's chart). */
export function sectionBoundaries(sections: readonly { name: string; fromTray: number; toTray: number }[]) {
  const sorted = [...sections].sort((a, b) => Math.min(a.fromTray, a.toTray) - Math.min(b.fromTray, b.toTray));
  return sorted.slice(1).map((next, i) => ({ x: Math.max(sorted[i]!.fromTray, sorted[i]!.toTray) + 0.5, label: next.name }));
}

function trafficChart(s: StudyRecord, d: StudyReportData): Content[] {
  const pts = (i: number) => d.traffic.map((r) => [Number(r[0]), Number(r[i])] as [number, number]);
  const pa = s.inputs.input.pumpAround;
  const [lo, hi] = [Math.min(pa.returnTray, pa.drawTray), Math.max(pa.returnTray, pa.drawTray)];
  const svg = chartSvg({
    width: 520,
    height: 230,
    xTitle: 'Tray',
    yTitle: d.trafficHeaders[2]!.replace('Vapour', 'Flow'),
    xIntegers: true,
    yMin: 0,
    series: [
      { name: 'Vapour', color: palette.info, kind: 'step', points: pts(2) },
      { name: 'Liquid', color: palette.secondary, kind: 'step', points: pts(3) },
    ],
    xLines: [{ x: lo - 0.5, label: 'zone' }, { x: hi + 0.5, label: '' }, ...sectionBoundaries(s.inputs.input.sections)],
  });
  return [
    {
      unbreakable: true,
      stack: [
        { text: 'Traffic at the base duty, tray by tray', style: 'h2' },
        { svg, width: 520 },
        {
          svg: legendSvg(
            [
              { name: 'Vapour', color: palette.info },
              { name: 'Liquid', color: palette.secondary },
            ],
            300,
          ),
        },
      ],
    },
  ];
}

export function studyReportDoc(s: StudyRecord, sys: SessionUser['unitSystem'], printedAt = new Date()): PdfParts {
  const d = studyReportData(s, sys);
  const decided = [...s.reviews].reverse().find((r) => r.action !== 'submit');
  return {
    header: `${s.columnTag} · ${s.label} · pump-around study`,
    footer: `Screening estimate · ${REVIEW_LABELS[s.status]} · printed ${pdfDateTime(printedAt)}`,
    content: [
      { text: `Pump-around duty study — ${s.columnTag}`, style: 'h1' },
      { text: s.label, fontSize: 11 },
      {
        text: `By ${s.authorName}, ${pdfDateTime(s.createdAt)} · ${REVIEW_LABELS[s.status]}${decided ? ` · ${ACTION_WORDS[decided.action].toLowerCase()} by ${decided.userName} on ${pdfDateTime(decided.at)}` : ''}`,
      },
      s.reviewComment ? { text: `Review comment: “${s.reviewComment}”` } : '',
      { text: 'Cautions', style: 'h2' },
      { ul: d.cautions },
      { text: 'Inputs', style: 'h2' },
      { table: { widths: ['auto', '*'], body: d.inputs }, layout: 'lightHorizontalLines' },
      { text: 'Duties found', style: 'h2' },
      {
        table: {
          headerRows: 1,
          widths: ['auto', 'auto', '*'],
          body: [
            ['', 'Duty', 'Where, what'].map(th),
            ...d.duties.map((r) => [r[0], { text: r[1], bold: r[0] === 'Suggested duty' }, r[2]]),
          ],
        },
      },
      ...trafficChart(s, d),
      { text: 'Traffic at the base duty', style: 'h2' },
      {
        table: {
          headerRows: 1,
          dontBreakRows: true,
          widths: ['auto', '*', 'auto', 'auto', '*', 'auto'],
          body: [
            d.trafficHeaders.map(th),
            ...d.traffic.map((r) => r.map((v) => (v === null ? '—' : typeof v === 'number' ? v.toLocaleString('en-US') : v))),
          ],
        },
        fontSize: 7.5,
      },
      s.reviews.length ? { text: 'Review record', style: 'h2' } : '',
      s.reviews.length
        ? {
            table: {
              headerRows: 1,
              widths: ['auto', 'auto', 'auto', '*'],
              body: [
                ['When', 'Who', 'Action', 'Comment'].map(th),
                ...s.reviews.map((r) => [pdfDateTime(r.at), r.userName, ACTION_WORDS[r.action], r.comment || '—']),
              ],
            },
          }
        : '',
      d.notes.length ? { text: 'Notes', style: 'h2' } : '',
      d.notes.length ? { ul: d.notes, fontSize: 7.5 } : '',
    ],
  };
}

/** CSV blocks one after another, each under a title line; text cells that look like formulas are escaped. */
export function studyCsv(d: StudyReportData): Buffer {
  const rows: (string | number | null)[][] = [
    ['Inputs'],
    ...d.inputs,
    [],
    ['Duties found', 'Duty', 'Where, what'],
    ...d.duties,
    [],
    ['Traffic at the base duty'],
    d.trafficHeaders,
    ...d.traffic,
    [],
    ['Cautions'],
    ...d.cautions.map((c) => [c]),
  ];
  return Buffer.from(stringify(rows, { escape_formulas: true, record_delimiter: 'windows' }), 'utf8');
}

export async function studyXlsx(d: StudyReportData): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Frothline';
  const sheet = (name: string, header: string[] | null, rows: (string | number | null)[][], widths: number[]) => {
    const ws = wb.addWorksheet(name);
    if (header) ws.addRow(header).font = { bold: true };
    rows.forEach((r) => ws.addRow(r));
    widths.forEach((w, i) => (ws.getColumn(i + 1).width = w));
  };
  sheet('Inputs', null, d.inputs, [34, 70]);
  sheet('Duties found', ['', 'Duty', 'Where, what'], d.duties, [24, 26, 80]);
  sheet('Traffic at base', d.trafficHeaders, d.traffic, [8, 20, 16, 16, 24, 12]);
  sheet(
    'Cautions',
    null,
    d.cautions.map((c) => [c]),
    [130],
  );
  return Buffer.from(await wb.xlsx.writeBuffer());
}

export async function studyReportPdf(ds: DataSource, user: SessionUser, id: string): Promise<{ pdf: Buffer; filename: string }> {
  const s = await getStudy(ds, user, id);
  return {
    pdf: await renderPdf(studyReportDoc(s, user.unitSystem), user.unitSystem),
    filename: pdfFileName('study', s.columnTag, s.label),
  };
}

export async function exportStudy(ds: DataSource, user: SessionUser, id: string, format: 'csv' | 'xlsx'): Promise<ExportFile> {
  const s = await getStudy(ds, user, id);
  const d = studyReportData(s, user.unitSystem);
  const base = `${s.columnTag}-${s.label}-study`.replace(/[^\w.-]+/g, '_').slice(0, 80);
  return format === 'csv'
    ? { fileName: `${base}.csv`, contentType: 'text/csv; charset=utf-8', body: studyCsv(d) }
    : {
        fileName: `${base}.xlsx`,
        contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
        body: await studyXlsx(d),
      };
}
