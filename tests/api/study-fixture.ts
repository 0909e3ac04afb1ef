/**
 * Fixture for the stored pump-around study tests: an invented site and column (C-410, the column of
 * examples/pump-around-study.json) with its sections, one pump-around and a base load case, written
 * straight into the tables so that the tests do not depend on the column-editing routes.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { DataSource } from 'typeorm';
import type { StudyInput } from '../../shared/types/pumpAround.js';

export const EXAMPLE = JSON.parse(readFileSync('examples/pump-around-study.json', 'utf8')) as StudyInput;

export interface StudyFixture {
  siteId: string;
  columnId: string;
  loadCaseId: string;
  pumpAroundId: string;
}

export async function makeStudyColumn(ds: DataSource): Promise<StudyFixture> {
  const tag = randomUUID().slice(0, 6);
  const [site] = await ds.query<{ id: string }[]>(
    `INSERT INTO sites (name, location) VALUES ($1, 'invented test site') RETURNING id`,
    [`Study test site ${tag}`],
  );
  const [unit] = await ds.query<{ id: string }[]>(
    `INSERT INTO process_units (site_id, name) VALUES ($1, 'Test unit') RETURNING id`,
    [site!.id],
  );
  const [col] = await ds.query<{ id: string }[]>(
    `INSERT INTO columns (unit_id, tag, service, numbering, tray_count) VALUES ($1, $2, 'invented test column', 'top-down', 16) RETURNING id`,
    [unit!.id, `C-410-${tag}`],
  );
  for (const s of EXAMPLE.sections) {
    const { name, fromTray, toTray, ...geometry } = s;
    await ds.query(
      `INSERT INTO tray_sections (column_id, name, first_tray, last_tray, geometry, provenance) VALUES ($1, $2, $3, $4, $5, 'design')`,
      [col!.id, name, fromTray, toTray, JSON.stringify(geometry)],
    );
  }
  const pa = EXAMPLE.pumpAround;
  const [p] = await ds.query<{ id: string }[]>(
    `INSERT INTO pump_arounds (column_id, name, draw_tray, return_tray, base_duty_kw) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
    [col!.id, pa.name, pa.drawTray, pa.returnTray, pa.baseDuty_kW],
  );
  const [lc] = await ds.query<{ id: string }[]>(
    `INSERT INTO load_cases (column_id, name, basis, source, loads) VALUES ($1, 'Base case', 'normal', 'typed', $2) RETURNING id`,
    [col!.id, JSON.stringify(EXAMPLE.trays)],
  );
  return { siteId: site!.id, columnId: col!.id, loadCaseId: lc!.id, pumpAroundId: p!.id };
}

/** The request that reproduces examples/pump-around-study.json from the stored column. */
export function exampleBody(f: StudyFixture): Record<string, unknown> {
  const pa = EXAMPLE.pumpAround;
  return {
    label: 'Top pump-around push',
    loadCaseId: f.loadCaseId,
    pumpAroundId: f.pumpAroundId,
    latentHeat_kJ_kg: EXAMPLE.latentHeat_kJ_kg,
    liquidHeatCapacity_kJ_kgK: pa.liquidHeatCapacity_kJ_kgK,
    returnTemperatureDrop_K: pa.returnTemperatureDrop_K,
    // the example's zone liquid is the net internal liquid, as the engine takes it
    zoneLiquidIncludesCirculation: false,
    sweep: EXAMPLE.sweep,
    methods: EXAMPLE.methods,
  };
}
