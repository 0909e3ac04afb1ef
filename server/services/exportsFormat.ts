/** Table → CSV (RFC 4180 quoting) or XLSX (exceljs) file. */
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

const cell = (v: string | number | null): string => {
  if (v === null || v === undefined) return '';
  let s = typeof v === 'number' ? (Number.isFinite(v) ? String(+v.toPrecision(8)) : '') : v;
  // a text cell starting like a formula is prefixed so spreadsheets show it as text
  if (typeof v === 'string' && /^[=+\-@]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

export function toCsv(t: Table): Buffer {
  const lines = [
    ...(t.notes ?? []).map((n) => cell(`# ${n}`)),
    t.headers.map(cell).join(','),
    ...t.rows.map((r) => r.map(cell).join(',')),
  ];
  return Buffer.from(`${lines.join('\r\n')}\r\n`, 'utf8');
}

export async function toXlsx(t: Table): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Frothline';
  const ws = wb.addWorksheet(t.sheet.slice(0, 31));
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
