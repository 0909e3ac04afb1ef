/**
 * Demo heat-recovery plan (issue 17): T-701's two pump-arounds (top and diesel) rated together over a 21 × 21
 * grid of duties on the demo base load case, authored by the demo process engineer and left as a draft.
 * c_p, ΔT, λ, the useful temperature and the base condenser duty are invented demo values (no plant data);
 * draw temperatures come from the demo load case. The demo load cases carry the circulation on the zone
 * trays, as a rating case does, so the plan takes the base circulations off first. The margin is 80 %: at the
 * usual 70 % no split of this invented case keeps the margin (the plan's margin table shows it).
 * Two invented "simulation" cases are added and tagged with their duties: made by the traffic model itself
 * with zone latent heats 8 % and 5 % above the plan's (no simulator was run), so the demo shows a calibration,
 * and placed on grid nodes, so that its map shows points rated on simulated (and interpolated) loads.
 */
import type { EntityManager } from 'typeorm';
import type { User } from '../entities/User.js';
import { ValidationError } from '../../errors.js';
import { shiftPlanTraffic } from '../../engine/heatPlan/index.js';
import { insertLoadCase } from '../../services/loads/loads.js';
import { toSessionUser } from '../../services/auth/users.js';
import { LoadCase } from '../entities/LoadCase.js';
import type { HeatPlanInput } from '../../../shared/types/heatPlan.js';
import { buildPlan, insertPlan } from '../../services/heatPlans/plans.js';
import type { HeatPlan } from '../entities/HeatPlan.js';
import type { CreateHeatPlanBody } from '../../../shared/types/heatPlans.js';

/** invented demo values */
const DEMO = {
  latentHeat_kJ_kg: 265,
  cp_kJ_kgK: [2.6, 2.8],
  drop_K: [85, 130],
  usefulAbove_C: 150,
  condenser_kW: 52000,
};

export async function seedHeatPlan(em: EntityManager, columnId: string, users: User[]): Promise<HeatPlan | null> {
  const author = users.find((u) => u.role === 'process-engineer');
  const [column] = await em.query<{ numbering: string }[]>(`SELECT numbering FROM columns WHERE id = $1`, [columnId]);
  const order = column?.numbering === 'bottom-up' ? 'DESC' : 'ASC';
  const pas = await em.query<{ id: string; duty: number }[]>(
    `SELECT id, base_duty_kw::float8 AS duty FROM pump_arounds WHERE column_id = $1 ORDER BY return_tray ${order} LIMIT 2`,
    [columnId],
  );
  const [lc] = await em.query<{ id: string }[]>(
    `SELECT id FROM load_cases WHERE column_id = $1 ORDER BY (basis = 'normal') DESC, created_at LIMIT 1`,
    [columnId],
  );
  if (!author || pas.length < 2 || !lc) return null;
  const sweep = (duty: number) => ({
    fromDuty_kW: Math.round((0.5 * duty) / 100) * 100,
    toDuty_kW: Math.round((1.5 * duty) / 100) * 100,
    steps: 20,
  });
  const body: CreateHeatPlanBody = {
    label: 'Top and diesel pump-arounds: best split for preheat (80 % margin)',
    loadCaseId: lc.id,
    pumpArounds: pas.map((p, i) => ({
      pumpAroundId: p.id,
      sweep: sweep(p.duty),
      liquidHeatCapacity_kJ_kgK: DEMO.cp_kJ_kgK[i]!,
      returnTemperatureDrop_K: DEMO.drop_K[i]!,
    })),
    latentHeat_kJ_kg: DEMO.latentHeat_kJ_kg,
    usefulAboveTemperature_C: DEMO.usefulAbove_C,
    baseCondenserDuty_kW: DEMO.condenser_kW,
    zoneLiquidIncludesCirculation: true,
    margin: 0.8,
  };
  try {
    const first = await buildPlan(em, columnId, body);
    const sims = await seedSimulationCases(
      em,
      columnId,
      author,
      first.inputs.input,
      pas.map((p) => p.id),
    );
    const withCases = { ...body, simulationCaseIds: sims };
    return await insertPlan(em, author.id, withCases, await buildPlan(em, columnId, withCases));
  } catch (e) {
    // the demo plant's data did not make a valid plan: keep the rest of the demo, say why
    console.warn('Demo heat-recovery plan skipped:', e instanceof ValidationError ? JSON.stringify(e.details) : e);
    return null;
  }
}

/** invented: the "true" zone latent heats of the demo cases, as multiples of the plan's */
const DEMO_TRUE_LATENT = [1.08, 1.05];

/** Two invented simulation cases at other duties (zone liquid with the circulation, as the demo's cases), tagged. */
async function seedSimulationCases(
  em: EntityManager,
  columnId: string,
  author: User,
  input: HeatPlanInput,
  pumpAroundIds: string[],
): Promise<string[]> {
  const pas = input.pumpArounds.map((pa, i) => ({ ...pa, latentHeat_kJ_kg: input.latentHeat_kJ_kg * DEMO_TRUE_LATENT[i]! }));
  // on grid nodes one step either side of the middle of both sweeps, so that the demo map shows points rated on
  // a case's loads and, at the middle node between them, on loads interpolated between the two cases
  const node = (i: number, k: number) => {
    const s = pas[i]!.sweep;
    return s.fromDuty_kW + ((s.toDuty_kW - s.fromDuty_kW) * k) / s.steps;
  };
  const mid = (i: number) => pas[i]!.sweep.steps / 2;
  const at = [
    [node(0, mid(0) + 1), node(1, mid(1) - 1)],
    [node(0, mid(0) - 1), node(1, mid(1) + 1)],
  ];
  const ids: string[] = [];
  for (const [n, duties] of at.entries()) {
    // a deterministic ±1 % wobble tray by tray, so that the fit is not exact (invented)
    const trays = shiftPlanTraffic(input.trays, pas, duties, input.latentHeat_kJ_kg, input.numbering).trays.map(
      ({ rawLiquid_kg_h: _l, rawVapour_kg_h: _v, dry: _d, ...load }) => {
        const w = 1 + 0.01 * Math.sin(7 * load.tray + n);
        return {
          ...load,
          vapourMassFlow_kg_h: Math.round(load.vapourMassFlow_kg_h * w),
          liquidMassFlow_kg_h: Math.round(load.liquidMassFlow_kg_h * w),
        };
      },
    );
    const lc = await insertLoadCase(em, toSessionUser(author), columnId, {
      name: `Simulation case ${n + 1} (invented): ${duties.map((d) => `${(d / 1000).toFixed(2)} MW`).join(' / ')}`,
      basis: 'other',
      source: 'imported',
      notes: 'Invented demo case standing in for a simulation at other pump-around duties.',
      loads: trays,
    });
    await em.update(
      LoadCase,
      { id: lc.id },
      {
        pumpAroundDuties: pumpAroundIds.map((id, i) => ({ pumpAroundId: id, duty_kW: duties[i]! })),
      },
    );
    ids.push(lc.id);
  }
  return ids;
}
