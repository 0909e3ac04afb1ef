/**
 * Tray-profile import: preview (parse, detect header/units/numbering, convert, every row's errors) and
 * commit (all-or-nothing in one transaction: any row error stores nothing).
 */
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { ValidationError } from '../errors.js';
import { visibleColumn } from './columnsCommon.js';
import { detectHeader, detectNumbering } from './importsDetect.js';
import { parseUpload } from './importsParse.js';
import { convertRows } from './importsRows.js';
import { insertLoadCase } from './loads.js';
import { toLoadCaseRecord } from './loadsRead.js';
import type { SessionUser } from '../../shared/types/api.js';
import type {
  ImportCheckBody,
  ImportCheckResult,
  ImportCommitBody,
  ImportPreview,
  ImportRowError,
} from '../../shared/types/imports.js';
import type { LoadCaseRecord } from '../../shared/types/loads.js';

/** A commit refused for row errors: the route answers 400 with every row error. */
export class ImportRowsError extends ValidationError {
  constructor(public readonly rowErrors: ImportRowError[]) {
    super(
      `The file has ${rowErrors.length} error${rowErrors.length === 1 ? '' : 's'}; nothing was stored — fix the rows and import again`,
      rowErrors.map((e) => ({ path: `row ${e.row}, ${e.column}`, message: e.message })),
    );
  }
}

interface Stash {
  userId: string;
  columnId: string;
  headers: string[];
  rows: string[][];
  firstDataRow: number;
  fileName: string;
  expires: number;
}
const TOKEN_MS = 30 * 60 * 1000;
const stash = new Map<string, Stash>();

function keep(s: Stash): string {
  const now = Date.now();
  for (const [k, v] of stash) if (v.expires < now) stash.delete(k);
  while (stash.size >= 200) stash.delete(stash.keys().next().value!);
  const token = randomUUID();
  stash.set(token, s);
  return token;
}

export async function previewImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  file: { buffer: Buffer; originalname: string } | undefined,
  sheet?: string,
): Promise<ImportPreview> {
  const col = await visibleColumn(ds.manager, user, columnId);
  if (!file)
    throw new ValidationError('No file uploaded', [
      { path: 'file', message: 'is required (multipart field "file", CSV or XLSX)' },
    ]);
  const parsed = await parseUpload(file.buffer, file.originalname, sheet);
  const det = detectHeader(parsed.cells);
  if (!det)
    throw new ValidationError('No header row found', [
      {
        path: 'file',
        message:
          'none of the first 20 rows names at least three known columns (tray or stage, vapour and liquid flow, densities, surface tension)',
      },
    ]);
  const start = (det.unitRowIndex >= 0 ? det.unitRowIndex : det.headerIndex) + 1;
  const headers = parsed.cells[det.headerIndex]!;
  const rows = parsed.cells.slice(start);
  const numbering = detectNumbering(rows, det.mapping, col.numbering, det.notes);
  const firstDataRow = start + 1;
  const { loads, errors } = convertRows({
    headers,
    rows,
    firstDataRow,
    mapping: det.mapping,
    units: det.units,
    numbering,
    trayCount: col.trayCount,
    columnDirection: col.numbering,
  });
  const token = keep({
    userId: user.id,
    columnId,
    headers,
    rows,
    firstDataRow,
    fileName: file.originalname,
    expires: Date.now() + TOKEN_MS,
  });
  return {
    token,
    fileName: file.originalname,
    format: parsed.format,
    sheet: parsed.sheet,
    headerRow: det.headerIndex + 1,
    headers,
    rows,
    mapping: det.mapping,
    units: det.units,
    numbering,
    loads,
    errors,
    notes: det.notes,
  };
}

/** The rows to convert: from the preview token (same user and column, 30 minutes) or sent back by the client. */
function source(
  user: SessionUser,
  columnId: string,
  body: ImportCheckBody,
): { headers: string[]; rows: string[][]; firstDataRow: number } {
  if (body.token) {
    const s = stash.get(body.token);
    if (!s || s.expires < Date.now() || s.userId !== user.id || s.columnId !== columnId)
      throw new ValidationError('Import token expired or unknown', [
        { path: 'token', message: 'upload the file again (a preview is kept for 30 minutes)' },
      ]);
    return s;
  }
  if (!body.headers || !body.rows)
    throw new ValidationError('Nothing to import', [{ path: 'rows', message: 'send the preview token, or headers and rows' }]);
  return { headers: body.headers, rows: body.rows, firstDataRow: body.firstDataRow ?? 2 };
}

/** Re-check the rows with the mapping, units and numbering the user confirmed; stores nothing. */
export async function checkImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: ImportCheckBody,
): Promise<ImportCheckResult> {
  const col = await visibleColumn(ds.manager, user, columnId);
  const { headers, rows, firstDataRow } = source(user, columnId, body);
  const { mapping, units, numbering } = body;
  return convertRows({
    headers,
    rows,
    firstDataRow,
    mapping,
    units,
    numbering,
    trayCount: col.trayCount,
    columnDirection: col.numbering,
  });
}

export async function commitImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: ImportCommitBody,
): Promise<LoadCaseRecord> {
  const { headers: h, rows: r, firstDataRow } = source(user, columnId, body);
  return ds.transaction(async (em) => {
    const col = await visibleColumn(em, user, columnId, true);
    const { loads, errors } = convertRows({
      headers: h,
      rows: r,
      firstDataRow,
      mapping: body.mapping,
      units: body.units,
      numbering: body.numbering,
      trayCount: col.trayCount,
      columnDirection: col.numbering,
    });
    if (errors.length) throw new ImportRowsError(errors);
    const lc = await insertLoadCase(em, user, columnId, {
      name: body.name,
      basis: body.basis,
      source: 'imported',
      sourceFile: body.fileName,
      notes: body.notes ?? '',
      loads,
      stageMap: body.numbering.key === 'stage' && body.numbering.stageMap?.length ? body.numbering.stageMap : null,
    });
    if (body.token) stash.delete(body.token);
    return toLoadCaseRecord(em, lc);
  });
}
