/**
 * Read an uploaded tray profile (CSV with , ; or tab, or an XLSX sheet) into rows of text cells, as streams,
 * with IMPORT_LIMITS enforced while reading: a wider row or a longer cell refuses the file (naming its row and
 * column), rows past the row or text limit are cut (reading stops there) and the result says where.
 */
import { parse } from 'csv-parse';
import ExcelJS from 'exceljs';
import { Readable } from 'node:stream';
import { DomainError, ValidationError } from '../../errors.js';
import { detectHeader } from './importsDetect.js';
import { checkedStream, checkXlsxZip, hasPart, unreadable } from './importsZip.js';
import { IMPORT_LIMITS } from '../../../shared/importLimits.js';

export interface ParsedFile {
  format: 'csv' | 'xlsx';
  sheet: string | null;
  cells: string[][];
  /** the last row read when the file was cut (it continues after this row), else null */
  cutAfterRow: number | null;
}

/** Collects rows under the limits; `add` answers false once the file must be cut (the row is not kept). */
class RowCollector {
  readonly cells: string[][] = [];
  cutAfterRow: number | null = null;
  private chars = 0;

  /** @param keepEmpty keep rows without text (CSV: row numbers stay those of the file's records) */
  constructor(private readonly keepEmpty: boolean) {}

  add(row: string[]): boolean {
    let last = row.length;
    while (last > 0 && !row[last - 1]) last--;
    if (last === 0 && !this.keepEmpty) return true;
    const at = this.cells.length + 1;
    if (last > IMPORT_LIMITS.columns)
      throw this.refuse(
        'The file has too many columns',
        `row ${at} has ${last} columns; at most ${IMPORT_LIMITS.columns} are read`,
      );
    let chars = 0;
    for (let c = 0; c < last; c++) {
      const n = row[c]!.length;
      if (n > IMPORT_LIMITS.cellChars)
        throw this.refuse(
          'A cell of the file is too long',
          `row ${at}, ${this.columnName(c)}: the cell holds ${n} characters; at most ${IMPORT_LIMITS.cellChars} are read`,
        );
      chars += n;
    }
    if (this.cells.length >= IMPORT_LIMITS.rows || this.chars + chars > IMPORT_LIMITS.totalChars) {
      this.cutAfterRow = this.cells.length;
      return false;
    }
    this.chars += chars;
    this.cells.push(last === row.length ? row : row.slice(0, last));
    return true;
  }

  /** "column 3" or, once a header row was read, 'column 3 ("Remarks")' */
  private columnName(c: number): string {
    const det = detectHeader(this.cells);
    const h = det ? this.cells[det.headerIndex]![c] : undefined;
    return `column ${c + 1}${h ? ` ("${h.slice(0, 60)}")` : ''}`;
  }

  private refuse(message: string, detail: string): DomainError {
    return new DomainError(422, message, [{ path: 'file', message: detail }]);
  }
}

function detectDelimiter(buf: Buffer): string {
  const head = buf
    .subarray(0, 64 * 1024)
    .toString('utf8')
    .split(/\r?\n/)
    .slice(0, 10)
    .join('\n');
  const counts = [',', ';', '\t'].map((d) => [d, head.split(d).length] as const);
  return counts.sort((a, b) => b[1] - a[1])[0]![0];
}

function* chunks(buf: Buffer, size = 64 * 1024): Generator<Buffer> {
  for (let i = 0; i < buf.length; i += size) yield buf.subarray(i, i + size);
}

export async function parseCsv(buf: Buffer): Promise<{ cells: string[][]; cutAfterRow: number | null }> {
  const rows = new RowCollector(true);
  const parser = Readable.from(chunks(buf)).pipe(
    parse({
      bom: true,
      delimiter: detectDelimiter(buf),
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      // one record (all its cells) is never held beyond what the column and cell limits allow
      max_record_size: IMPORT_LIMITS.columns * (IMPORT_LIMITS.cellChars + 3),
    }),
  );
  try {
    for await (const rec of parser as AsyncIterable<string[]>) if (!rows.add(rec)) break;
  } catch (e) {
    if (e instanceof DomainError) throw e;
    throw new ValidationError('The CSV file cannot be read', [{ path: 'file', message: (e as Error).message }]);
  } finally {
    parser.destroy();
  }
  return { cells: rows.cells, cutAfterRow: rows.cutAfterRow };
}

function cellText(v: ExcelJS.CellValue): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  if (typeof v === 'string') return v.trim();
  if (v instanceof Date) return v.toISOString();
  if ('result' in v) return cellText((v as ExcelJS.CellFormulaValue).result);
  if ('richText' in v)
    return v.richText
      .map((r) => r.text)
      .join('')
      .trim();
  if ('text' in v) return String(v.text).trim();
  return '';
}

type SheetReader = AsyncIterable<ExcelJS.Row> & { name: string };

/** The chosen sheet (or the first) read row by row; the other sheets are skipped unread. */
export async function parseXlsx(
  buf: Buffer,
  sheetName?: string,
): Promise<{ sheet: string; cells: string[][]; cutAfterRow: number | null }> {
  const zip = await checkXlsxZip(buf);
  const missing = ['xl/workbook.xml', 'xl/_rels/workbook.xml.rels'].find((part) => !hasPart(zip, part));
  if (missing) {
    zip.zip.close();
    throw unreadable(`no ${missing}`);
  }
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(checkedStream(zip), {
    worksheets: 'emit',
    sharedStrings: 'cache',
    hyperlinks: 'ignore',
    styles: 'ignore',
    entries: 'ignore',
  });
  // a workbook without shared strings (numbers only): say so, else the reader waits for them (see checkedStream)
  if (!hasPart(zip, 'xl/sharedStrings.xml')) (reader as unknown as { sharedStrings: string[] }).sharedStrings = [];
  const read = readSheet(reader as unknown as AsyncIterable<SheetReader>, sheetName);
  read.catch(() => undefined); // when the zip fails first, this never settles or its error is moot
  return Promise.race([read, zip.failed]);
}

async function readSheet(
  reader: AsyncIterable<SheetReader>,
  sheetName: string | undefined,
): Promise<{ sheet: string; cells: string[][]; cutAfterRow: number | null }> {
  const rows = new RowCollector(false);
  const seen: string[] = [];
  let found: string | null = null;
  try {
    for await (const ws of reader) {
      seen.push(ws.name);
      if (sheetName !== undefined && ws.name !== sheetName) continue;
      found = ws.name;
      for await (const row of ws) {
        const values = row.values as ExcelJS.CellValue[];
        const text: string[] = [];
        for (let c = 1; c < values.length; c++) text.push(cellText(values[c]));
        if (!rows.add(text)) break;
      }
      break;
    }
  } catch (e) {
    if (e instanceof DomainError) throw e;
    throw unreadable((e as Error).message);
  }
  if (found === null)
    throw new ValidationError('No such sheet', [
      { path: 'sheet', message: `"${sheetName ?? ''}" is not in the workbook (sheets: ${seen.join(', ') || 'none'})` },
    ]);
  return { sheet: found, cells: rows.cells, cutAfterRow: rows.cutAfterRow };
}

export async function parseUpload(buf: Buffer, fileName: string, sheet?: string): Promise<ParsedFile> {
  const isXlsx = /\.xlsx$/i.test(fileName) || buf.subarray(0, 2).toString('latin1') === 'PK';
  if (isXlsx) {
    const x = await parseXlsx(buf, sheet);
    return { format: 'xlsx', sheet: x.sheet, cells: x.cells, cutAfterRow: x.cutAfterRow };
  }
  if (buf.includes(0))
    throw new ValidationError('Unsupported file', [{ path: 'file', message: 'is neither CSV text nor an XLSX workbook' }]);
  const csv = await parseCsv(buf);
  return { format: 'csv', sheet: null, ...csv };
}
