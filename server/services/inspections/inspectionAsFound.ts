/**
 * Rating as found: tray-section geometry rebuilt from an inspection's measurements and findings, rated
 * with A1's createRatingRun beside a design run of the same load case, and compared tray by tray.
 */
import type { DataSource } from 'typeorm';
import { InspectionTray } from '../../db/entities/InspectionTray.js';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { ValidationError } from '../../errors.js';
import { columnSections } from './inspectionRead.js';
import { visibleInspection } from './inspections.js';
import { createRatingRun } from '../runs/runs.js';
import { compareResults } from '../runs/runsCompare.js';
import { CHECK_NAMES, type SectionGeometry } from '../../../shared/types/rating.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { AsFoundRequest, AsFoundResult, AsFoundTrayChange, TrayMeasurements } from '../../../shared/types/inspections.js';

/** Plugging is capped here: a fully blocked tray has no open area and cannot be rated (our choice). */
export const MAX_BLOCKED_PERCENT = 95;

const mean = (xs: number[]): number | null => (xs.length ? xs.reduce((a, b) => a + b, 0) / xs.length : null);

interface TrayState {
  tray: number;
  weir: number | null;
  clearance: number | null;
  blocked: number;
  valvesLost: number;
}

/** Per tray: mean of measuring points and of passes; blocked % averaged over passes; missing + stuck valves summed over passes. */
export function trayStates(
  records: Pick<InspectionTray, 'tray' | 'findings' | 'asFound' | 'asLeft'>[],
  state: 'asFound' | 'asLeft',
): TrayState[] {
  const byTray = new Map<number, typeof records>();
  for (const r of records) byTray.set(r.tray, [...(byTray.get(r.tray) ?? []), r]);
  return [...byTray.entries()].map(([tray, rs]) => {
    const m = (f: (x: TrayMeasurements) => number[]) => mean(rs.flatMap((r) => f(r[state])));
    return {
      tray,
      weir: m((x) => x.weirHeight_mm),
      clearance: m((x) => x.downcomerClearance_mm),
      blocked: mean(rs.map((r) => r.findings.blockedPercent)) ?? 0,
      valvesLost: rs.reduce((k, r) => k + r.findings.valvesMissing + r.findings.valvesStuck, 0),
    };
  });
}

/**
 * As-found geometry of one section from its inspected trays. 'average' takes means over trays; 'worst'
 * takes the highest weir and the lowest clearance (both raise downcomer backup) and the most plugging.
 * Open area: hole area × (1 − blocked/100); on valve trays the valve count is reduced by the same share and
 * by the missing or stuck valves, and the hole area in proportion (the rule: missing valves count as
 * lost open area; a bare orifice left by a missing valve really passes vapour and weeps — a screening simplification).
 */
export function asFoundSectionGeometry(
  design: SectionGeometry,
  trays: TrayState[],
  combine: 'average' | 'worst',
): { geometry: SectionGeometry; blocked: number } {
  const pick = (xs: (number | null)[], worst: (a: number[]) => number): number | null => {
    const v = xs.filter((x): x is number => x !== null);
    return v.length ? (combine === 'worst' ? worst(v) : mean(v)) : null;
  };
  const weir =
    pick(
      trays.map((t) => t.weir),
      (v) => Math.max(...v),
    ) ?? design.weirHeight_mm;
  const clearance =
    pick(
      trays.map((t) => t.clearance),
      (v) => Math.min(...v),
    ) ?? design.downcomerClearance_mm;
  const blocked = Math.min(
    MAX_BLOCKED_PERCENT,
    pick(
      trays.map((t) => t.blocked),
      (v) => Math.max(...v),
    ) ?? 0,
  );
  const lost =
    pick(
      trays.map((t) => t.valvesLost),
      (v) => Math.max(...v),
    ) ?? 0;
  const g: SectionGeometry = {
    ...design,
    weirHeight_mm: weir,
    downcomerClearance_mm: clearance,
    holeArea_m2: design.holeArea_m2 * (1 - blocked / 100),
  };
  if (design.valves) {
    const count = Math.max(1, Math.round(design.valves.count * (1 - blocked / 100) - lost));
    g.valves = { ...design.valves, count };
    g.holeArea_m2 = (design.holeArea_m2 * count) / design.valves.count;
  }
  return { geometry: g, blocked };
}

export async function rateAsFound(ds: DataSource, user: SessionUser, id: string, body: AsFoundRequest): Promise<AsFoundResult> {
  const state = body.state ?? 'asFound';
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    const records = await em.find(InspectionTray, { where: { inspectionId: id } });
    const states = trayStates(records, state);
    const sections = await columnSections(em, insp.columnId);
    const override: Record<string, SectionGeometry> = {};
    const info: AsFoundResult['geometry'] = {};
    for (const s of sections) {
      const inSection = states.filter((t) => t.tray >= s.first_tray && t.tray <= s.last_tray);
      if (!inSection.length) continue;
      const { geometry, blocked } = asFoundSectionGeometry(s.geometry, inSection, body.combine);
      override[s.id] = geometry;
      info[s.id] = {
        weirHeight_mm: geometry.weirHeight_mm,
        downcomerClearance_mm: geometry.downcomerClearance_mm,
        holeArea_m2: geometry.holeArea_m2,
        valveCount: geometry.valves?.count ?? null,
        blockedPercent: blocked,
        trays: inSection.map((t) => t.tray),
      };
    }
    if (!Object.keys(override).length)
      throw new ValidationError('Nothing to rate as found', [
        { path: 'trays', message: 'no recorded tray lies in a tray section of the column' },
      ]);
    const base = { columnId: insp.columnId, loadCaseId: body.loadCaseId, sectionIds: Object.keys(override) };
    const design = await createRatingRun(em, user, {
      ...base,
      label: `Design — for inspection ${insp.turnaround}`,
      kind: 'as-found-design',
    });
    const asFound = await createRatingRun(em, user, {
      ...base,
      geometryOverride: override,
      kind: 'as-found',
      asFoundDate: insp.startDate,
      label: `As ${state === 'asFound' ? 'found' : 'left'} ${insp.turnaround} (${body.combine})`,
    });
    await em.query(`UPDATE inspections SET as_found_run_ids = array_append(as_found_run_ids, $2) WHERE id = $1`, [
      id,
      asFound.id,
    ]);
    return compareDesignAsFound(design, asFound, info);
  });
}

function compareDesignAsFound(design: RatingRun, asFound: RatingRun, geometry: AsFoundResult['geometry']): AsFoundResult {
  const da = new Map(design.results.trays.map((t) => [t.tray, t]));
  const db = new Map(asFound.results.trays.map((t) => [t.tray, t]));
  const rhoL = new Map(asFound.snapshot.loads.map((l) => [l.tray, l.liquidDensity_kg_m3]));
  const trays: AsFoundTrayChange[] = compareResults(design.results.trays, asFound.results.trays).map((d) => {
    const a = da.get(d.tray);
    const b = db.get(d.tray);
    const moved = CHECK_NAMES.flatMap((c) => {
      const x = a?.checks[c];
      const y = b?.checks[c];
      return x && y && x.status !== y.status
        ? [{ check: c, design: x.percentOfLimit, asFound: y.percentOfLimit, designStatus: x.status, asFoundStatus: y.status }]
        : [];
    });
    return {
      tray: d.tray,
      designControlling: d.controllingA,
      asFoundControlling: d.controllingB,
      controllingChanged: d.controllingChanged,
      movedChecks: moved,
      dryPressureDrop_mm: { design: a?.details.dryPressureDrop_mm ?? 0, asFound: b?.details.dryPressureDrop_mm ?? 0 },
      liquidDensity_kg_m3: rhoL.get(d.tray) ?? null,
    };
  });
  const sum = (r: RatingRun) => ({
    controllingTray: r.results.controllingTray,
    controllingCheck: r.results.controllingCheck,
    maxPercentOfLimit: r.results.maxPercentOfLimit,
  });
  return { designRunId: design.id, asFoundRunId: asFound.id, geometry, design: sum(design), asFound: sum(asFound), trays };
}
