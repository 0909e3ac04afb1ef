/**
 * Gamma-scan import with the load import's machinery: the same streaming reader and limits (importsParse,
 * importsZip), the same preview stash (import_previews, 30 minutes, same user and column) and the same
 * all-or-nothing commit (any row error stores nothing and keeps the preview).
 */
import type { DataSource } from 'typeorm';
import { ValidationError } from '../../errors.js';
import { visibleColumn } from '../columns/columnsCommon.js';
import { ImportRowsError } from '../imports/imports.js';
import { parseUpload } from '../imports/importsParse.js';
import { keepPreview, previewRows } from '../imports/importsStash.js';
import { insertEvidence } from './evidence.js';
import { toEvidenceRecord } from './evidenceRead.js';
import { convertScanRows, detectScanHeader } from './scanImportRows.js';
import { IMPORT_LIMITS } from '../../../shared/importLimits.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { EvidenceRecord, ScanImportCommitBody, ScanImportPreview } from '../../../shared/types/evidence.js';

const clip = (s: string, n: number): string => (s.length > n ? `${s.slice(0, n - 1)}…` : s);

export async function previewScanImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  file: { buffer: Buffer; originalname: string } | undefined,
  sheet?: string,
): Promise<ScanImportPreview> {
  await visibleColumn(ds.manager, user, columnId);
  if (!file)
    throw new ValidationError('No file uploaded', [
      { path: 'file', message: 'is required (multipart field "file", CSV or XLSX)' },
    ]);
  const parsed = await parseUpload(file.buffer, file.originalname, sheet);
  const det = detectScanHeader(parsed.cells);
  if (!det)
    throw new ValidationError('No header row found', [
      {
        path: 'file',
        message: 'none of the first 20 rows names an elevation column together with a density or count-rate column',
      },
    ]);
  const start = (det.unitRowIndex >= 0 ? det.unitRowIndex : det.headerIndex) + 1;
  const headers = parsed.cells[det.headerIndex]!;
  const rows = parsed.cells.slice(start);
  const firstDataRow = start + 1;
  const { lines, errors } = convertScanRows({ headers, rows, firstDataRow, mapping: det.mapping, units: det.units });
  const token = await keepPreview(ds.manager, user.id, columnId, { headers, rows, firstDataRow, fileName: file.originalname });
  const cut =
    parsed.cutAfterRow === null
      ? []
      : [`Only the first ${parsed.cutAfterRow} rows were read; the file continues after row ${parsed.cutAfterRow}`];
  return {
    token,
    fileName: file.originalname,
    format: parsed.format,
    sheet: parsed.sheet,
    headerRow: det.headerIndex + 1,
    headers: headers.map((h) => clip(h, IMPORT_LIMITS.previewCellChars)),
    rowCount: rows.length,
    cutAfterRow: parsed.cutAfterRow,
    mapping: det.mapping,
    units: det.units,
    lines,
    errors: errors.slice(0, IMPORT_LIMITS.listedErrors),
    errorCount: errors.length,
    notes: [...cut, ...det.notes],
  };
}

/** Store the previewed scan as a gamma-scan record, all or nothing. */
export async function commitScanImport(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: ScanImportCommitBody,
): Promise<EvidenceRecord> {
  return ds.transaction(async (em) => {
    await visibleColumn(em, user, columnId, true);
    const src = await previewRows(em, user.id, columnId, body.token, true);
    const { lines, errors } = convertScanRows({ ...src, mapping: body.mapping, units: body.units });
    if (errors.length) throw new ImportRowsError(errors);
    const ev = await insertEvidence(
      em,
      user,
      columnId,
      {
        kind: 'gamma-scan',
        title: body.title,
        takenOn: body.takenOn,
        operatingCase: body.operatingCase,
        runId: body.runId ?? null,
        inspectionId: body.inspectionId ?? null,
        inspectionTiming: body.inspectionTiming ?? null,
        notes: body.notes ?? '',
        data: {
          datum: body.datum,
          liquidDensity_kg_m3: body.liquidDensity_kg_m3,
          vapourDensity_kg_m3: body.vapourDensity_kg_m3,
          lines: lines.map((l) => ({
            label: l.label,
            chord: body.chord,
            orientation_deg: body.orientation_deg,
            pass: body.pass,
            takenOn: body.takenOn,
            operatingCase: body.operatingCase,
            measure: l.measure,
            calibration: l.measure === 'count-rate' ? body.calibration : null,
            points: l.points,
          })),
        },
      },
      src.fileName,
    );
    return toEvidenceRecord(em, ev);
  });
}
