/**
 * Tray-profile import: preview (parse, detect header/units/numbering, convert, every row's errors) and
 * commit (all-or-nothing in one transaction: any row error stores nothing).
 */
import type { DataSource, EntityManager } from 'typeorm';
import { ValidationError } from '../../errors.js';
import { visibleColumn } from '../columns/columnsCommon.js';
import { detectHeader, detectNumbering } from './importsDetect.js';
import { parseUpload } from './importsParse.js';
import { convertRows } from './importsRows.js';
import { keepPreview, previewRows } from './importsStash.js';
import { insertLoadCase } from '../loads/loads.js';
import { toLoadCaseRecord } from '../loads/loadsRead.js';
import { dutyTagErrors } from '../heatPlans/dutyTags.js';
import { IMPORT_LIMITS } from '../../../shared/importLimits.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type {
  ImportCheckBody,
  ImportCheckResult,
  ImportCommitBody,
  ImportPreview,
  ImportRowError,
} from '../../../shared/types/imports.js';
import type { LoadCaseRecord } from '../../../shared/types/loads.js';

/** A commit refused for row errors: answered 400 with the row errors (the first ones listed) and their count. */
export class ImportRowsError extends ValidationError {
  public readonly rowErrors: ImportRowError[];
  public readonly errorCount: number;
  constructor(all: ImportRowError[]) {
    const rowErrors = listed(all);
    super(
      `The file has ${all.length} error${all.length === 1 ? '' : 's'}; nothing was stored — fix the rows and import again`,
      rowErrors.map((e) => ({ path: `row ${e.row}, ${e.column}`, message: e.message })),
    );
    this.rowErrors = rowErrors;
    this.errorCount = all.length;
  }

  /** the first row errors and how many there are, beside the error and its details (ImportRowsErrorBodySchema) */
  override body() {
    return { ...super.body(), rowErrors: this.rowErrors, errorCount: this.errorCount };
  }
}

const clip = (s: string, n: number): string => (s.length > n ? `${s.slice(0, n - 1)}…` : s);

/** The errors an answer lists (IMPORT_LIMITS.listedErrors, texts clipped); the answer gives the count. */
function listed(errors: ImportRowError[]): ImportRowError[] {
  return errors
    .slice(0, IMPORT_LIMITS.listedErrors)
    .map((e) => ({ row: e.row, column: clip(e.column, 120), message: clip(e.message, 300) }));
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
  const cutNote =
    parsed.cutAfterRow === null
      ? null
      : `Only the first ${parsed.cutAfterRow} rows were read; the file continues after row ${parsed.cutAfterRow} (at most ${IMPORT_LIMITS.rows} rows or ${IMPORT_LIMITS.totalChars.toLocaleString('en-GB')} characters are read)`;
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
  const token = await keepPreview(ds.manager, user.id, columnId, { headers, rows, firstDataRow, fileName: file.originalname });
  const short = (r: string[]) => r.map((c) => clip(c, IMPORT_LIMITS.previewCellChars));
  return {
    token,
    fileName: file.originalname,
    format: parsed.format,
    sheet: parsed.sheet,
    headerRow: det.headerIndex + 1,
    headers: short(headers),
    rows: rows.slice(0, IMPORT_LIMITS.previewRows).map(short),
    rowCount: rows.length,
    cutAfterRow: parsed.cutAfterRow,
    mapping: det.mapping,
    units: det.units,
    numbering,
    loads,
    errors: listed(errors),
    errorCount: errors.length,
    notes: cutNote ? [cutNote, ...det.notes] : det.notes,
  };
}

/** The rows to convert: from the preview token (same user and column, not expired) or sent back by the client. */
async function source(
  em: EntityManager,
  user: SessionUser,
  columnId: string,
  body: ImportCheckBody,
  take = false,
): Promise<{ headers: string[]; rows: string[][]; firstDataRow: number }> {
  if (body.token) return previewRows(em, user.id, columnId, body.token, take);
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
  const { headers, rows, firstDataRow } = await source(ds.manager, user, columnId, body);
  const { mapping, units, numbering } = body;
  const { loads, errors } = convertRows({
    headers,
    rows,
    firstDataRow,
    mapping,
    units,
    numbering,
    trayCount: col.trayCount,
    columnDirection: col.numbering,
  });
  return { loads, errors: listed(errors), errorCount: errors.length };
}

export async function commitImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: ImportCommitBody,
): Promise<LoadCaseRecord> {
  return ds.transaction(async (em) => {
    const col = await visibleColumn(em, user, columnId, true);
    const tags = body.pumpAroundDuties ?? [];
    const tagErrors = await dutyTagErrors(em, columnId, tags, 'pumpAroundDuties');
    if (tagErrors.length) throw new ValidationError('Invalid pump-around duties', tagErrors);
    // taken from the stash in this transaction: stored with the load case, or kept when the commit fails
    const { headers: h, rows: r, firstDataRow } = await source(em, user, columnId, body, true);
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
    const lc = await insertLoadCase(
      em,
      user,
      columnId,
      {
        name: body.name,
        basis: body.basis,
        source: 'imported',
        sourceFile: body.fileName,
        notes: body.notes ?? '',
        loads,
        stageMap: body.numbering.key === 'stage' && body.numbering.stageMap?.length ? body.numbering.stageMap : null,
      },
      tags,
    );
    return toLoadCaseRecord(em, lc);
  });
}
