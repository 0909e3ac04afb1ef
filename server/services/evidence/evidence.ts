/**
 * Field evidence of a column: store, list, read, edit the header (and the datum's nudge), delete. Visibility
 * is the column's (its site); a record of a column the user may not see answers 404.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { FieldEvidence } from '../../db/entities/FieldEvidence.js';
import { ValidationError, type ErrorDetail } from '../../errors.js';
import { validate } from '../../http/validation.js';
import { audit } from '../audit/audit.js';
import { assertVersion, visibleChild, visibleColumn } from '../columns/columnsCommon.js';
import { toEvidenceRecord, toEvidenceSummary } from './evidenceRead.js';
import { EVIDENCE_DATA_SCHEMAS } from '../../../shared/schemas/evidence.js';
import { EVIDENCE_LIST_CUT } from '../../../shared/contract/evidence.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type {
  CreateEvidenceEnvelope,
  EvidenceDataByKind,
  EvidenceKind,
  EvidenceRecord,
  EvidenceSummary,
  UpdateEvidenceBody,
} from '../../../shared/types/evidence.js';

export function visibleEvidence(em: EntityManager, user: SessionUser, id: string, lock = false): Promise<FieldEvidence> {
  return visibleChild(em, user, FieldEvidence, id, 'Field evidence', lock);
}

/** The data checked against its kind's schema; errors name the field under `data`. */
export function checkData<K extends EvidenceKind>(kind: K, data: unknown): EvidenceDataByKind[K] {
  try {
    return validate<EvidenceDataByKind[K]>(EVIDENCE_DATA_SCHEMAS[kind], data, 'body');
  } catch (e) {
    if (!(e instanceof ValidationError)) throw e;
    throw new ValidationError(
      'Invalid body',
      (e.details ?? []).map((d) => ({ path: d.path === '(root)' ? 'data' : `data.${d.path}`, message: d.message })),
    );
  }
}

/** Faults the schema cannot see: trays outside the column, a count-rate line without calibration, order of tappings. */
export function dataFaults(
  kind: EvidenceKind,
  data: EvidenceDataByKind[EvidenceKind],
  trayCount: number,
  sectionNames: string[],
): ErrorDetail[] {
  const out: ErrorDetail[] = [];
  const tray = (t: number, path: string) => {
    if (t > trayCount) out.push({ path, message: `tray ${t} is outside the column (trays 1–${trayCount})` });
  };
  if (kind === 'gamma-scan') {
    const d = data as EvidenceDataByKind['gamma-scan'];
    tray(d.datum.tray, 'data.datum.tray');
    d.lines.forEach((l, i) => {
      if (l.measure === 'count-rate' && !l.calibration)
        out.push({
          path: `data.lines.${i}.calibration`,
          message: 'is required for a count-rate line (vapour and liquid count rates)',
        });
      if (l.calibration && l.calibration.liquidCountRate >= l.calibration.vapourCountRate)
        out.push({
          path: `data.lines.${i}.calibration.liquidCountRate`,
          message: 'must be below the vapour count rate (liquid absorbs more of the beam)',
        });
    });
    if (d.lines.some((l) => l.measure === 'density') && d.liquidDensity_kg_m3 === null)
      out.push({ path: 'data.liquidDensity_kg_m3', message: 'is required to read a density scan' });
  } else if (kind === 'dp-survey') {
    const d = data as EvidenceDataByKind['dp-survey'];
    tray(d.datum.tray, 'data.datum.tray');
    d.readings.forEach((r, i) => {
      const at = `data.readings.${i}`;
      const byElevation = r.upperElevation_m !== null || r.lowerElevation_m !== null;
      if (byElevation === (r.section !== null))
        out.push({ path: `${at}.section`, message: 'give either both tapping elevations or a section, not both or neither' });
      else if (byElevation && (r.upperElevation_m === null || r.lowerElevation_m === null))
        out.push({
          path: `${at}.${r.upperElevation_m === null ? 'upper' : 'lower'}Elevation_m`,
          message: 'is required with the other tapping',
        });
      else if (byElevation && r.upperElevation_m! <= r.lowerElevation_m!)
        out.push({ path: `${at}.upperElevation_m`, message: 'must be above the lower tapping' });
      else if (r.section !== null && !sectionNames.includes(r.section))
        out.push({
          path: `${at}.section`,
          message: `"${r.section}" is not a tray section of this column (${sectionNames.join(', ') || 'none'})`,
        });
    });
  } else {
    const d = data as EvidenceDataByKind['temperature-survey'];
    const seen = new Set<number>();
    d.readings.forEach((r, i) => {
      tray(r.tray, `data.readings.${i}.tray`);
      if (seen.has(r.tray)) out.push({ path: `data.readings.${i}.tray`, message: `tray ${r.tray} is listed twice` });
      seen.add(r.tray);
    });
  }
  return out;
}

/** A linked run or inspection must belong to the same column. */
async function checkLinks(
  em: EntityManager,
  columnId: string,
  runId?: string | null,
  inspectionId?: string | null,
): Promise<void> {
  const errs: ErrorDetail[] = [];
  if (runId) {
    const r = await em.query<unknown[]>(`SELECT 1 FROM rating_runs WHERE id = $1 AND column_id = $2`, [runId, columnId]);
    if (!r.length) errs.push({ path: 'runId', message: 'is not a rating run of this column' });
  }
  if (inspectionId) {
    const r = await em.query<unknown[]>(`SELECT 1 FROM inspections WHERE id = $1 AND column_id = $2`, [inspectionId, columnId]);
    if (!r.length) errs.push({ path: 'inspectionId', message: 'is not an inspection of this column' });
  }
  if (errs.length) throw new ValidationError('Invalid link', errs);
}

/** Insert a checked record in the caller's transaction (also used by the scan import). */
export async function insertEvidence(
  em: EntityManager,
  user: SessionUser,
  columnId: string,
  body: CreateEvidenceEnvelope,
  sourceFile: string | null = null,
): Promise<FieldEvidence> {
  const col = await visibleColumn(em, user, columnId, true);
  const data = checkData(body.kind, body.data);
  const names = await em.query<
    {
      name: string;
    }[]
  >(`SELECT name FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`, [columnId]);
  const faults = dataFaults(
    body.kind,
    data,
    col.trayCount,
    names.map((n) => n.name),
  );
  if (body.inspectionTiming && !body.inspectionId) faults.push({ path: 'inspectionTiming', message: 'needs an inspectionId' });
  if (faults.length) throw new ValidationError('Invalid body', faults);
  await checkLinks(em, columnId, body.runId, body.inspectionId);
  const row = await em.save(
    FieldEvidence,
    em.create(FieldEvidence, {
      columnId,
      kind: body.kind,
      title: body.title.trim(),
      takenOn: body.takenOn,
      operatingCase: body.operatingCase.trim(),
      runId: body.runId ?? null,
      inspectionId: body.inspectionId ?? null,
      inspectionTiming: body.inspectionTiming ?? null,
      data,
      notes: body.notes ?? '',
      sourceFile,
      authorId: user.id,
    }),
  );
  await audit(em, user.id, 'create', 'field-evidence', row.id, { columnId, kind: body.kind, title: body.title, sourceFile });
  return row;
}

export async function createEvidence(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: CreateEvidenceEnvelope,
): Promise<EvidenceRecord> {
  return ds.transaction(async (em) => toEvidenceRecord(em, await insertEvidence(em, user, columnId, body)));
}

/** The newest EVIDENCE_LIST_CUT records of a column (of one kind if given) and how many there are in all. */
export async function listEvidence(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  kind?: EvidenceKind,
): Promise<{ items: EvidenceSummary[]; total: number }> {
  await visibleColumn(ds.manager, user, columnId);
  const [rows, total] = await ds.getRepository(FieldEvidence).findAndCount({
    where: { columnId, ...(kind ? { kind } : {}) },
    order: { takenOn: 'DESC', createdAt: 'DESC' },
    take: EVIDENCE_LIST_CUT,
  });
  return { items: await toEvidenceSummary(ds.manager, rows), total };
}

export async function getEvidence(ds: DataSource, user: SessionUser, id: string): Promise<EvidenceRecord> {
  return toEvidenceRecord(ds.manager, await visibleEvidence(ds.manager, user, id));
}

export async function updateEvidence(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: UpdateEvidenceBody,
): Promise<EvidenceRecord> {
  return ds.transaction(async (em) => {
    const ev = await visibleEvidence(em, user, id, true);
    assertVersion('evidence record', ev.version, body.version);
    const { version: _v, nudge_m, ...header } = body;
    void _v;
    if (nudge_m !== undefined) {
      if (ev.kind === 'temperature-survey')
        throw new ValidationError('Invalid body', [{ path: 'nudge_m', message: 'a temperature survey has no datum' }]);
      const d = ev.data as EvidenceDataByKind['gamma-scan' | 'dp-survey'];
      ev.data = { ...d, datum: { ...d.datum, nudge_m } };
    }
    const inspectionId = header.inspectionId !== undefined ? header.inspectionId : ev.inspectionId;
    const timing = header.inspectionTiming !== undefined ? header.inspectionTiming : ev.inspectionTiming;
    if (timing && !inspectionId)
      throw new ValidationError('Invalid body', [{ path: 'inspectionTiming', message: 'needs an inspectionId' }]);
    await checkLinks(em, ev.columnId, header.runId, header.inspectionId);
    Object.assign(ev, header, { updatedAt: new Date() });
    if (header.title !== undefined) ev.title = header.title.trim();
    await em.save(FieldEvidence, ev);
    await audit(em, user.id, 'update', 'field-evidence', id, { ...header, ...(nudge_m !== undefined ? { nudge_m } : {}) });
    return toEvidenceRecord(em, ev);
  });
}

export async function deleteEvidence(ds: DataSource, user: SessionUser, id: string, version: number): Promise<void> {
  await ds.transaction(async (em) => {
    const ev = await visibleEvidence(em, user, id, true);
    assertVersion('evidence record', ev.version, version);
    await em.delete(FieldEvidence, { id });
    await audit(em, user.id, 'delete', 'field-evidence', id, { columnId: ev.columnId, kind: ev.kind, title: ev.title });
  });
}
