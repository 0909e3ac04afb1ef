/** Inspection records as returned by the API: header, trays with tolerance checks, punch list, photos. */
import type { EntityManager } from 'typeorm';
import { Inspection } from '../../db/entities/Inspection.js';
import { InspectionPhoto } from '../../db/entities/InspectionPhoto.js';
import { InspectionTray } from '../../db/entities/InspectionTray.js';
import { PunchItemEntity } from '../../db/entities/PunchItem.js';
import { iso } from '../columns/columnsCommon.js';
import { checkMeasurements, ruleSetFor } from '../../../shared/inspectionTolerance.js';
import type { SectionPasses } from '../../../shared/passes.js';
import type { SectionGeometry } from '../../../shared/types/rating.js';
import type {
  InspectionRecord,
  InspectionTrayRecord,
  PhotoRecord,
  PunchItem,
  TrayDesign,
} from '../../../shared/types/inspections.js';

interface SectionRow {
  id: string;
  first_tray: number;
  last_tray: number;
  geometry: SectionGeometry;
}

/** Design values for a tray from the column's tray section covering it (nulls when no section covers it). */
export function designFor(sections: SectionRow[], tray: number): TrayDesign {
  const s = sections.find((x) => tray >= x.first_tray && tray <= x.last_tray);
  if (!s)
    return { sectionId: null, weirHeight_mm: null, downcomerClearance_mm: null, traySpacing_mm: null, columnDiameter_mm: null };
  const g = s.geometry;
  return {
    sectionId: s.id,
    weirHeight_mm: g.weirHeight_mm,
    downcomerClearance_mm: g.downcomerClearance_mm,
    traySpacing_mm: g.traySpacing_mm,
    columnDiameter_mm: g.columnDiameter_m * 1000,
  };
}

export async function columnSections(em: EntityManager, columnId: string): Promise<SectionRow[]> {
  return await em.query<SectionRow[]>(
    `SELECT id, first_tray, last_tray, geometry FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`,
    [columnId],
  );
}

/** The sections' spans and pass counts, as shared/passes.ts reads them. */
export const sectionPasses = (sections: SectionRow[]): SectionPasses[] =>
  sections.map((s) => ({ firstTray: s.first_tray, lastTray: s.last_tray, passes: s.geometry.passes }));

export function trayRecord(t: InspectionTray, design: TrayDesign, insp: Inspection): InspectionTrayRecord {
  const rules = ruleSetFor(insp.rules);
  const cls = insp.rules.levelnessClass;
  return {
    id: t.id,
    tray: t.tray,
    pass: t.pass,
    findings: t.findings,
    asFound: t.asFound,
    asLeft: t.asLeft,
    design,
    checks: {
      asFound: checkMeasurements(t.asFound, design, rules, cls),
      asLeft: checkMeasurements(t.asLeft, design, rules, cls),
    },
    version: t.version,
  };
}

async function names(em: EntityManager, ids: (string | null)[]): Promise<Map<string, string>> {
  const list = [...new Set(ids.filter((x): x is string => !!x))];
  if (!list.length) return new Map();
  const rows = await em.query<
    {
      id: string;
      name: string;
    }[]
  >(`SELECT id, name FROM users WHERE id = ANY($1::uuid[])`, [list]);
  return new Map(rows.map((r) => [r.id, r.name]));
}

export function punchRecord(p: PunchItemEntity, n: Map<string, string>): PunchItem {
  return {
    id: p.id,
    itemNo: p.itemNo,
    tray: p.tray,
    pass: p.pass,
    finding: p.finding,
    action: p.action,
    priority: p.priority,
    owner: p.owner,
    status: p.status,
    closedBy: p.closedBy,
    closedByName: p.closedBy ? (n.get(p.closedBy) ?? null) : null,
    closedAt: p.closedAt ? iso(p.closedAt) : null,
    voidedBy: p.voidedBy,
    voidedByName: p.voidedBy ? (n.get(p.voidedBy) ?? null) : null,
    voidedAt: p.voidedAt ? iso(p.voidedAt) : null,
    voidReason: p.voidReason,
    version: p.version,
  };
}

export function photoRecord(p: InspectionPhoto, n: Map<string, string>): PhotoRecord {
  return {
    id: p.id,
    tray: p.tray,
    pass: p.pass,
    finding: p.finding,
    caption: p.caption,
    contentType: p.contentType,
    bytes: p.bytes,
    width: p.width,
    height: p.height,
    uploadedAt: iso(p.uploadedAt),
    uploadedByName: p.uploadedBy ? (n.get(p.uploadedBy) ?? null) : null,
  };
}

export async function toInspectionRecord(em: EntityManager, insp: Inspection): Promise<InspectionRecord> {
  const [col] = await em.query<
    {
      tag: string;
      engineer_id: string | null;
      tray_count: number;
    }[]
  >(`SELECT tag, engineer_id, tray_count FROM columns WHERE id = $1`, [insp.columnId]);
  const sections = await columnSections(em, insp.columnId);
  const trays = await em.find(InspectionTray, { where: { inspectionId: insp.id }, order: { tray: 'ASC', pass: 'ASC' } });
  const punch = await em.find(PunchItemEntity, { where: { inspectionId: insp.id }, order: { itemNo: 'ASC' } });
  const photos = await em.find(InspectionPhoto, { where: { inspectionId: insp.id }, order: { uploadedAt: 'ASC' } });
  const n = await names(em, [
    insp.inspectorId,
    col?.engineer_id ?? null,
    ...punch.map((p) => p.closedBy),
    ...punch.map((p) => p.voidedBy),
    ...photos.map((p) => p.uploadedBy),
  ]);
  const trayRecords = trays.map((t) => trayRecord(t, designFor(sections, t.tray), insp));
  const failedChecks = trayRecords.reduce(
    (k, t) => k + [...t.checks.asFound, ...t.checks.asLeft].filter((c) => c.pass === false).length,
    0,
  );
  return {
    id: insp.id,
    columnId: insp.columnId,
    columnTag: col?.tag ?? '',
    turnaround: insp.turnaround,
    startDate: insp.startDate,
    endDate: insp.endDate,
    inspectorId: insp.inspectorId,
    inspectorName: insp.inspectorId ? (n.get(insp.inspectorId) ?? null) : null,
    status: insp.status,
    trayCount: trays.length,
    openPunchItems: punch.filter((p) => p.status === 'open').length,
    failedChecks,
    version: insp.version,
    updatedAt: iso(insp.updatedAt),
    permitRef: insp.permitRef,
    gasTestRef: insp.gasTestRef,
    rules: insp.rules,
    ruleSet: ruleSetFor(insp.rules),
    notes: insp.notes,
    engineerId: col?.engineer_id ?? null,
    engineerName: col?.engineer_id ? (n.get(col.engineer_id) ?? null) : null,
    inspectorSignature: insp.inspectorSignature,
    engineerSignature: insp.engineerSignature,
    trays: trayRecords,
    punch: punch.map((p) => punchRecord(p, n)),
    photos: photos.map((p) => photoRecord(p, n)),
    asFoundRunIds: insp.asFoundRunIds,
    columnTrayCount: col?.tray_count ?? 0,
    designSections: sections.map((s) => ({
      firstTray: s.first_tray,
      lastTray: s.last_tray,
      passes: s.geometry.passes,
      design: designFor(sections, s.first_tray),
    })),
  };
}
