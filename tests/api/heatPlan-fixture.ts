/**
 * Fixture for the heat-recovery plan tests: the invented study column C-410 (study-fixture.ts) with a second,
 * lower pump-around (invented: draw tray 14, return tray 12) and two invented "simulation" load cases made by
 * the engine's own traffic model at other duties with a latent heat 10 % above the plan's (SIM_LATENT_HEAT),
 * so that a calibration against them must find that latent heat again.
 */
import type { DataSource } from 'typeorm';
import { EXAMPLE, makeStudyColumn, type StudyFixture } from './study-fixture.js';
import { shiftPlanTraffic, trayRoles } from '../../server/engine/heatPlan/index.js';
import type { PlanPumpAround } from '../../shared/types/heatPlan.js';
import type { TrayLoad } from '../../shared/types/rating.js';

export interface HeatPlanFixture extends StudyFixture {
  lowerPumpAroundId: string;
  simulationCaseIds: string[];
}

/** invented lower pump-around of the test column */
export const LOWER_PA = { name: 'Lower PA (invented)', drawTray: 14, returnTray: 12, baseDuty_kW: 4000 };

/** latent heat the synthetic simulation cases were made with: 10 % above the plan's (invented) */
export const SIM_LATENT_HEAT = EXAMPLE.latentHeat_kJ_kg * 1.1;

const sweep = { fromDuty_kW: 1000, toDuty_kW: 9000, steps: 4 };
const PAS: PlanPumpAround[] = [
  { ...EXAMPLE.pumpAround, drawTemperature_C: 180, sweep },
  { ...LOWER_PA, liquidHeatCapacity_kJ_kgK: 2.6, returnTemperatureDrop_K: 60, drawTemperature_C: 221, sweep },
];

/**
 * A synthetic simulation case: the base traffic moved by the model at these duties with SIM_LATENT_HEAT, the
 * zone liquid net of the circulation (the pump-around as a side cooler, as a simulator's per-stage export has it).
 */
export function synthetic(duties: number[]): TrayLoad[] {
  const roles = trayRoles(EXAMPLE.trays, PAS, 'top-down');
  const r = shiftPlanTraffic(EXAMPLE.trays, PAS, duties, SIM_LATENT_HEAT);
  return r.trays.map((t, k) => {
    const { rawLiquid_kg_h: raw, rawVapour_kg_h: _v, dry: _d, ...load } = t;
    const zone = roles[k]!.zone;
    return { ...load, liquidMassFlow_kg_h: zone >= 0 ? raw - r.states[zone]!.circulation_kg_h : raw };
  });
}

export async function makeHeatPlanColumn(ds: DataSource): Promise<HeatPlanFixture> {
  const f = await makeStudyColumn(ds);
  const [p] = await ds.query<{ id: string }[]>(
    `INSERT INTO pump_arounds (column_id, name, draw_tray, return_tray, base_duty_kw) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
    [f.columnId, LOWER_PA.name, LOWER_PA.drawTray, LOWER_PA.returnTray, LOWER_PA.baseDuty_kW],
  );
  const top = EXAMPLE.pumpAround.baseDuty_kW;
  const sims: string[] = [];
  for (const i of [0, 1]) {
    const at = [top * (i ? 1.2 : 0.8), LOWER_PA.baseDuty_kW * (i ? 0.8 : 1.3)];
    const duties = [
      { pumpAroundId: f.pumpAroundId, duty_kW: at[0]! },
      { pumpAroundId: p!.id, duty_kW: at[1]! },
    ];
    const [lc] = await ds.query<{ id: string }[]>(
      `INSERT INTO load_cases (column_id, name, basis, source, loads, pump_around_duties) VALUES ($1, $2, 'other', 'imported', $3, $4) RETURNING id`,
      [f.columnId, `Simulation case ${i + 1}`, JSON.stringify(synthetic(at)), JSON.stringify(duties)],
    );
    sims.push(lc!.id);
  }
  return { ...f, lowerPumpAroundId: p!.id, simulationCaseIds: sims };
}

/** invented third pump-around of the test column, above the other two (draw tray 5, return tray 3) */
export const UPPER_PA = { name: 'Upper PA (invented)', drawTray: 5, returnTray: 3, baseDuty_kW: 1500 };

/** Add UPPER_PA to a fixture column; its id. */
export async function addUpperPumpAround(ds: DataSource, columnId: string): Promise<string> {
  const [p] = await ds.query<{ id: string }[]>(
    `INSERT INTO pump_arounds (column_id, name, draw_tray, return_tray, base_duty_kw) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
    [columnId, UPPER_PA.name, UPPER_PA.drawTray, UPPER_PA.returnTray, UPPER_PA.baseDuty_kW],
  );
  return p!.id;
}
