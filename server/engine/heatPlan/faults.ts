/**
 * Checks of a heat-recovery plan input that a JSON Schema cannot express. Each pump-around gets the
 * single study's checks (sections, tray loads, its place in the column, ΔT or circulation, sweep order:
 * server/engine/pumpAround/faults.ts), with the paths moved under /pumpArounds/<i>; then the plan's own:
 * names unique, zones not overlapping, and a grid of at most MAX_GRID_POINTS points.
 */
import type { HeatPlanInput } from '../../../shared/types/heatPlan.js';
import type { StudyInput } from '../../../shared/types/pumpAround.js';
import type { FieldError } from '../index.js';
import { studyInputFaults } from '../pumpAround/faults.js';
import { topDownPosition } from '../pumpAround/traffic.js';

/** largest duty grid accepted (points = Π (steps + 1)) */
export const MAX_GRID_POINTS = 20000;

export function heatPlanFaults(input: HeatPlanInput): FieldError[] {
  const faults: FieldError[] = [];
  const numbering = input.numbering ?? 'top-down';
  input.pumpArounds.forEach((pa, i) => {
    const { drawTemperature_C: _t, sweep, latentHeat_kJ_kg: _l, ...spec } = pa;
    const study: StudyInput = { ...input, pumpAround: spec, sweep };
    for (const f of studyInputFaults(study)) {
      const own = f.path.startsWith('/pumpAround/') || f.path.startsWith('/sweep/');
      if (!own && i > 0) continue; // section and tray faults once
      const path = f.path.replace(/^\/pumpAround\//, `/pumpArounds/${i}/`).replace(/^\/sweep\//, `/pumpArounds/${i}/sweep/`);
      faults.push({ path, message: own ? `pump-around "${pa.name}", ${f.message}` : f.message });
    }
  });
  const span = (i: number): [number, number] => {
    const pa = input.pumpArounds[i]!;
    return [topDownPosition(pa.returnTray, numbering), topDownPosition(pa.drawTray, numbering)];
  };
  input.pumpArounds.forEach((pa, j) => {
    for (let i = 0; i < j; i++) {
      const other = input.pumpArounds[i]!;
      if (other.name === pa.name)
        faults.push({ path: `/pumpArounds/${j}/name`, message: `name: "${pa.name}" is used by pump-around ${i + 1} too` });
      const [r1, d1] = span(i);
      const [r2, d2] = span(j);
      if (r1 < d1 && r2 < d2 && r1 <= d2 && r2 <= d1)
        faults.push({
          path: `/pumpArounds/${j}/returnTray`,
          message: `returnTray: the zone of "${pa.name}" (trays ${pa.returnTray}–${pa.drawTray}) overlaps the zone of "${other.name}" (trays ${other.returnTray}–${other.drawTray})`,
        });
    }
  });
  const points = input.pumpArounds.reduce((p, pa) => p * (pa.sweep.steps + 1), 1);
  if (points > MAX_GRID_POINTS)
    faults.push({
      path: `/pumpArounds/${input.pumpArounds.length - 1}/sweep/steps`,
      message: `steps: the duty grid would have ${points} points; at most ${MAX_GRID_POINTS} (fewer steps per pump-around)`,
    });
  return faults;
}

/** Drift entries: a tray of the load case, one coefficient per pump-around, properties positive over the grid. */
export function driftFaults(input: HeatPlanInput): FieldError[] {
  const faults: FieldError[] = [];
  const n = input.pumpArounds.length;
  const corners = input.pumpArounds.reduce<number[][]>(
    (acc, pa) => acc.flatMap((c) => [pa.sweep.fromDuty_kW, pa.sweep.toDuty_kW].map((q) => [...c, q - pa.baseDuty_kW])),
    [[]],
  );
  (input.propertyDrift ?? []).forEach((d, j) => {
    const base = input.trays.find((t) => t.tray === d.tray);
    if (!base) {
      faults.push({ path: `/propertyDrift/${j}/tray`, message: `tray: tray ${d.tray} has no load in trays` });
      return;
    }
    const fields = [
      ['vapourDensity_kg_m3_per_kW', base.vapourDensity_kg_m3],
      ['liquidDensity_kg_m3_per_kW', base.liquidDensity_kg_m3],
      ['surfaceTension_mN_m_per_kW', base.surfaceTension_mN_m],
      ['liquidViscosity_mPa_s_per_kW', base.liquidViscosity_mPa_s],
    ] as const;
    for (const [key, p0] of fields) {
      const g = d[key];
      if (!g) continue;
      if (g.length !== n) {
        faults.push({
          path: `/propertyDrift/${j}/${key}`,
          message: `${key}: tray ${d.tray} needs ${n} values (one per pump-around); got ${g.length}`,
        });
        continue;
      }
      if (p0 === undefined) continue;
      if (corners.some((dq) => p0 + dq.reduce((s, q, i) => s + g[i]! * q, 0) <= 0))
        faults.push({
          path: `/propertyDrift/${j}/${key}`,
          message: `${key}: tray ${d.tray}, the property would fall to zero or below within the sweeps`,
        });
    }
  });
  return faults;
}
