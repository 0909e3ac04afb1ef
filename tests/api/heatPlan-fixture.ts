/**
 * Fixture for the heat-recovery plan tests: the invented study column C-410 (study-fixture.ts) with a second,
 * lower pump-around (invented: draw tray 14, return tray 12) and two invented "simulation" load cases made
 * from the base case at other duties, so that a plan has two pump-arounds and cases to calibrate against.
 */
import type { DataSource } from 'typeorm';
import { EXAMPLE, makeStudyColumn, type StudyFixture } from './study-fixture.js';
import type { TrayLoad } from '../../shared/types/rating.js';

export interface HeatPlanFixture extends StudyFixture {
  lowerPumpAroundId: string;
  simulationCaseIds: string[];
}

/** invented lower pump-around of the test column */
export const LOWER_PA = { name: 'Lower PA (invented)', drawTray: 14, returnTray: 12, baseDuty_kW: 4000 };

/** The base case with every tray's traffic scaled: an invented stand-in for a simulation case at other duties. */
function scaled(trays: TrayLoad[], f: number): TrayLoad[] {
  return trays.map((t) => ({
    ...t,
    vapourMassFlow_kg_h: t.vapourMassFlow_kg_h * f,
    liquidMassFlow_kg_h: t.liquidMassFlow_kg_h * f,
  }));
}

export async function makeHeatPlanColumn(ds: DataSource): Promise<HeatPlanFixture> {
  const f = await makeStudyColumn(ds);
  const [p] = (await ds.query(
    `INSERT INTO pump_arounds (column_id, name, draw_tray, return_tray, base_duty_kw) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
    [f.columnId, LOWER_PA.name, LOWER_PA.drawTray, LOWER_PA.returnTray, LOWER_PA.baseDuty_kW],
  )) as { id: string }[];
  const top = EXAMPLE.pumpAround.baseDuty_kW;
  const sims: string[] = [];
  for (const [i, k] of [0.97, 1.03].entries()) {
    const duties = [
      { pumpAroundId: f.pumpAroundId, duty_kW: top * (i ? 1.2 : 0.8) },
      { pumpAroundId: p!.id, duty_kW: LOWER_PA.baseDuty_kW * (i ? 0.8 : 1.2) },
    ];
    const [lc] = (await ds.query(
      `INSERT INTO load_cases (column_id, name, basis, source, loads, pump_around_duties) VALUES ($1, $2, 'other', 'imported', $3, $4) RETURNING id`,
      [f.columnId, `Simulation case ${i + 1}`, JSON.stringify(scaled(EXAMPLE.trays, k)), JSON.stringify(duties)],
    )) as { id: string }[];
    sims.push(lc!.id);
  }
  return { ...f, lowerPumpAroundId: p!.id, simulationCaseIds: sims };
}
