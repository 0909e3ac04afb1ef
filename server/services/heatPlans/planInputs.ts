/**
 * The engine's HeatPlanInput for a stored plan, built from the column's stored data: its tray sections, a
 * base load case, two or three of its pump-arounds (draw, return, base duty) and the simulation cases tagged
 * with their duties; c_p, ΔT or circulation, draw temperature, sweep, useful temperature, margin and L/V
 * threshold from the request. Ids that are not the column's answer 400 naming the request field.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { ValidationError, type ErrorDetail } from '../../errors.js';
import { netZoneLiquidOf } from '../studies/studyInputs.js';
import type { TrayNumbering } from '../../../shared/types/columns.js';
import type { HeatPlanInput, PlanPumpAround } from '../../../shared/types/heatPlan.js';
import type { CreateHeatPlanBody, HeatPlanSource } from '../../../shared/types/heatPlans.js';
import type { PumpAroundDutyTag } from '../../../shared/types/loads.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';

interface PaRow {
  id: string;
  name: string;
  drawTray: number;
  returnTray: number;
  baseDuty_kW: number;
}
interface CaseRow {
  id: string;
  name: string;
  loads: TrayLoad[];
  pumpAroundDuties: PumpAroundDutyTag[];
}

export interface PlanParts {
  column: { id: string; tag: string; numbering: TrayNumbering };
  sections: { name: string; firstTray: number; lastTray: number; geometry: Omit<StudySection, 'name' | 'fromTray' | 'toTray'> }[];
  base: CaseRow;
  pumpArounds: PaRow[];
  simulations: CaseRow[];
}

const CASE_SQL = `SELECT id, name, loads, pump_around_duties AS "pumpAroundDuties" FROM load_cases WHERE column_id = $1 AND id = ANY($2::uuid[])`;

/** Column, sections, base case, the chosen pump-arounds and simulation cases; 400 naming each foreign id. */
export async function loadPlanParts(
  db: DataSource | EntityManager,
  columnId: string,
  body: CreateHeatPlanBody,
): Promise<PlanParts> {
  const [column] = await db.query<PlanParts['column'][]>(`SELECT id, tag, numbering FROM columns WHERE id = $1`, [columnId]);
  const sections = await db.query<PlanParts['sections']>(
    `SELECT name, first_tray AS "firstTray", last_tray AS "lastTray", geometry FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`,
    [columnId],
  );
  const paIds = body.pumpArounds.map((p) => p.pumpAroundId);
  const pas = await db.query<PaRow[]>(
    `SELECT id, name, draw_tray AS "drawTray", return_tray AS "returnTray", base_duty_kw::float8 AS "baseDuty_kW" FROM pump_arounds WHERE column_id = $1 AND id = ANY($2::uuid[])`,
    [columnId, paIds],
  );
  const simIds = body.simulationCaseIds ?? [];
  const cases = await db.query<CaseRow[]>(CASE_SQL, [columnId, [body.loadCaseId, ...simIds]]);
  const errors: ErrorDetail[] = [];
  const base = cases.find((c) => c.id === body.loadCaseId);
  if (!base) errors.push({ path: 'loadCaseId', message: 'is not a load case of this column' });
  const pumpArounds = paIds.map((id, i) => {
    const pa = pas.find((p) => p.id === id);
    if (!pa) errors.push({ path: `pumpArounds.${i}.pumpAroundId`, message: 'is not a pump-around of this column' });
    else if (paIds.indexOf(id) !== i) errors.push({ path: `pumpArounds.${i}.pumpAroundId`, message: 'is chosen twice' });
    return pa;
  });
  const simulations = simIds.map((id, i) => {
    const c = cases.find((x) => x.id === id);
    const path = `simulationCaseIds.${i}`;
    if (!c) errors.push({ path, message: 'is not a load case of this column' });
    else if (simIds.indexOf(id) !== i) errors.push({ path, message: 'is chosen twice' });
    else if (id === body.loadCaseId)
      errors.push({ path, message: 'is the base load case; choose other cases to calibrate against' });
    else {
      const missing = pumpArounds.filter((p) => p && !c.pumpAroundDuties.some((d) => d.pumpAroundId === p.id));
      if (missing.length)
        errors.push({ path, message: `"${c.name}" is not tagged with the duty of ${missing.map((p) => p!.name).join(' and ')}` });
    }
    return c;
  });
  if (!sections.length)
    errors.push({ path: 'column sections', message: 'the column has no tray sections: add its tray geometry first' });
  if (errors.length || !column || !base) throw new ValidationError('The plan cannot be built from this column', errors);
  return { column, sections, base, pumpArounds: pumpArounds as PaRow[], simulations: simulations as CaseRow[] };
}

const inside = (parts: PlanParts) => (tray: number) => parts.sections.some((s) => tray >= s.firstTray && tray <= s.lastTray);

/** Draw temperature: entered, else the base case's liquid temperature on the draw tray (400 naming the field when neither). */
function drawTemperature(parts: PlanParts, body: CreateHeatPlanBody, i: number): number {
  const given = body.pumpArounds[i]!.drawTemperature_C;
  if (given !== undefined) return given;
  const pa = parts.pumpArounds[i]!;
  const t = parts.base.loads.find((l) => l.tray === pa.drawTray)?.temperature_C;
  if (t === undefined)
    throw new ValidationError('A draw temperature is needed', [
      {
        path: `pumpArounds.${i}.drawTemperature_C`,
        message: `is required: the load case "${parts.base.name}" has no temperature on draw tray ${pa.drawTray}`,
      },
    ]);
  return t;
}

/** The engine input and the source record kept with it. */
export function planInputFrom(parts: PlanParts, body: CreateHeatPlanBody): { input: HeatPlanInput; source: HeatPlanSource } {
  const sections: StudySection[] = parts.sections.map((s) => ({
    ...s.geometry,
    name: s.name,
    fromTray: s.firstTray,
    toTray: s.lastTray,
  }));
  const pumpArounds: PlanPumpAround[] = body.pumpArounds.map((c, i) => {
    const pa = parts.pumpArounds[i]!;
    return {
      name: pa.name,
      drawTray: pa.drawTray,
      returnTray: pa.returnTray,
      baseDuty_kW: c.baseDuty_kW ?? pa.baseDuty_kW,
      liquidHeatCapacity_kJ_kgK: c.liquidHeatCapacity_kJ_kgK,
      ...(c.returnTemperatureDrop_K !== undefined ? { returnTemperatureDrop_K: c.returnTemperatureDrop_K } : {}),
      ...(c.circulation_kg_h !== undefined ? { circulation_kg_h: c.circulation_kg_h } : {}),
      drawTemperature_C: drawTemperature(parts, body, i),
      sweep: c.sweep,
    };
  });
  const numbering = parts.column.numbering;
  let trays = parts.base.loads.filter((t) => inside(parts)(t.tray));
  if (body.zoneLiquidIncludesCirculation) for (const pa of pumpArounds) trays = netZoneLiquidOf(trays, pa, numbering).trays;
  const input: HeatPlanInput = {
    sections,
    trays,
    numbering,
    latentHeat_kJ_kg: body.latentHeat_kJ_kg,
    margin: body.margin ?? 0.7,
    pumpArounds,
    usefulAboveTemperature_C: body.usefulAboveTemperature_C,
    fractionationThreshold: body.liquidToVapourThreshold ?? 0.8,
    ...(body.methods ? { methods: body.methods } : {}),
  };
  const source: HeatPlanSource = {
    columnTag: parts.column.tag,
    loadCaseId: parts.base.id,
    loadCaseName: parts.base.name,
    pumpArounds: parts.pumpArounds.map((p) => ({ id: p.id, name: p.name, drawTray: p.drawTray, returnTray: p.returnTray })),
    simulationCases: parts.simulations.map((c) => ({
      id: c.id,
      name: c.name,
      duties_kW: parts.pumpArounds.map((p) => c.pumpAroundDuties.find((d) => d.pumpAroundId === p.id)!.duty_kW),
    })),
    request: body,
  };
  return { input, source };
}
