/** Table → CSV (csv-stringify: RFC 4180 quoting, formula escaping) or XLSX (exceljs) file. */
import { stringify } from 'csv-stringify/sync';
import ExcelJS from 'exceljs';

export interface Table {
  sheet: string;
  headers: string[];
  rows: (string | number | null)[][];
  /** lines written above the table in CSV (as "# …") and on an "About" sheet in XLSX */
  notes?: string[];
}

export interface ExportFile {
  fileName: string;
  contentType: string;
  body: Buffer;
}

/** Numbers to 8 significant digits; a non-finite number is an empty cell. */
const number = (v: number): string => (Number.isFinite(v) ? String(+v.toPrecision(8)) : '');

/**
 * CSV for spreadsheets: a text cell starting with = + - @, a tab or a carriage return (or their full-width
 * forms) is prefixed with ' so a spreadsheet shows it as text instead of running it as a formula
 * (csv-stringify's escape_formulas); numbers, negative ones included, stay numbers.
 */
export function toCsv(t: Table): Buffer {
  const records = [...(t.notes ?? []).map((n) => [`# ${n}`]), t.headers, ...t.rows];
  return Buffer.from(stringify(records, { escape_formulas: true, record_delimiter: 'windows', cast: { number } }), 'utf8');
}

export async function toXlsx(t: Table): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Frothline';
  const ws = wb.addWorksheet(t.sheet.slice(0, 31));
  // cells are plain values: exceljs writes a string as text (never a formula), whatever it starts with
  ws.addRow(t.headers).font = { bold: true };
  for (const r of t.rows) ws.addRow(r.map((v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v)));
  ws.columns.forEach((c) => (c.width = 16));
  if (t.notes?.length) {
    const about = wb.addWorksheet('About');
    for (const n of t.notes) about.addRow([n]);
    about.getColumn(1).width = 120;
  }
  return Buffer.from(await wb.xlsx.writeBuffer());
}

export async function toFile(t: Table, base: string, format: 'csv' | 'xlsx'): Promise<ExportFile> {
  const safe = base.replace(/[^\w.-]+/g, '_').slice(0, 80);
  return format === 'csv'
    ? { fileName: `${safe}.csv`, contentType: 'text/csv; charset=utf-8', body: toCsv(t) }
    : {
        fileName: `${safe}.xlsx`,
        contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
        body: await toXlsx(t),
      };
}
