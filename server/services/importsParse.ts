/** Read an uploaded tray profile (CSV with , ; or tab, or an XLSX sheet) into rows of text cells. */
import { parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import { ValidationError } from '../errors.js';

export interface ParsedFile {
  format: 'csv' | 'xlsx';
  sheet: string | null;
  cells: string[][];
}

const MAX_ROWS = 5000;

function detectDelimiter(text: string): string {
  const head = text.split(/\r?\n/).slice(0, 10).join('\n');
  const counts = [',', ';', '\t'].map((d) => [d, head.split(d).length] as const);
  return counts.sort((a, b) => b[1] - a[1])[0]![0];
}

export function parseCsv(buf: Buffer): string[][] {
  const text = buf.toString('utf8');
  try {
    return parse(text, {
      bom: true,
      delimiter: detectDelimiter(text),
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      to: MAX_ROWS + 50,
    }) as string[][];
  } catch (e) {
    throw new ValidationError('The CSV file cannot be read', [{ path: 'file', message: (e as Error).message }]);
  }
}

function cellText(v: ExcelJS.CellValue): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  if (typeof v === 'string') return v.trim();
  if (v instanceof Date) return v.toISOString();
  if ('result' in v) return cellText((v as ExcelJS.CellFormulaValue).result as ExcelJS.CellValue);
  if ('richText' in v)
    return v.richText
      .map((r) => r.text)
      .join('')
      .trim();
  if ('text' in v) return String(v.text).trim();
  return '';
}

export async function parseXlsx(buf: Buffer, sheetName?: string): Promise<{ sheet: string; cells: string[][] }> {
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(buf as unknown as ArrayBuffer);
  } catch (e) {
    throw new ValidationError('The XLSX file cannot be read', [{ path: 'file', message: (e as Error).message }]);
  }
  const ws = sheetName ? wb.getWorksheet(sheetName) : wb.worksheets[0];
  if (!ws)
    throw new ValidationError('No such sheet', [
      {
        path: 'sheet',
        message: `"${sheetName ?? ''}" is not in the workbook (sheets: ${wb.worksheets.map((w) => w.name).join(', ')})`,
      },
    ]);
  const cells: string[][] = [];
  ws.eachRow({ includeEmpty: false }, (row) => {
    if (cells.length > MAX_ROWS + 50) return;
    const values = row.values as ExcelJS.CellValue[];
    cells.push(values.slice(1).map(cellText));
  });
  return { sheet: ws.name, cells };
}

export async function parseUpload(buf: Buffer, fileName: string, sheet?: string): Promise<ParsedFile> {
  const isXlsx = /\.xlsx$/i.test(fileName) || buf.subarray(0, 2).toString('latin1') === 'PK';
  if (isXlsx) {
    const x = await parseXlsx(buf, sheet);
    return { format: 'xlsx', sheet: x.sheet, cells: x.cells };
  }
  if (buf.includes(0))
    throw new ValidationError('Unsupported file', [{ path: 'file', message: 'is neither CSV text nor an XLSX workbook' }]);
  return { format: 'csv', sheet: null, cells: parseCsv(buf) };
}
