/**
 * Fixture for the inspection tests: an invented site, column X-204 (12 sieve trays, one section) with an
 * engineer, and a load case, written straight into the tables. Numbers are our own, not from any source.
 */
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { SectionGeometry, TrayLoad } from '../../shared/types/rating.js';

export const GEOMETRY: SectionGeometry = {
  trayType: 'sieve',
  passes: 1,
  columnDiameter_m: 2.0,
  traySpacing_mm: 610,
  activeArea_m2: 2.54,
  downcomerTopArea_m2: 0.3,
  downcomerBottomArea_m2: 0.3,
  outletWeirLength_m: 1.45,
  weirHeight_mm: 50,
  downcomerClearance_mm: 38,
  holeArea_m2: 0.25,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3,
  systemFactor: 1,
  foaming: 'low',
};

export const LOADS: TrayLoad[] = Array.from({ length: 12 }, (_, i) => ({
  tray: i + 1,
  vapourMassFlow_kg_h: 26000,
  liquidMassFlow_kg_h: 30000,
  vapourDensity_kg_m3: 3,
  liquidDensity_kg_m3: 700,
  surfaceTension_mN_m: 20,
}));

export interface InspectionFixture {
  siteId: string;
  columnId: string;
  sectionId: string;
  loadCaseId: string;
  tag: string;
}

export async function makeInspectionColumn(ds: DataSource, engineerId: string | null): Promise<InspectionFixture> {
  const k = randomUUID().slice(0, 6);
  const one = async (sql: string, p: unknown[]) => (await ds.query<{ id: string }[]>(sql, p))[0]!.id;
  const siteId = await one(`INSERT INTO sites (name, location) VALUES ($1, 'invented test site') RETURNING id`, [
    `Inspection test site ${k}`,
  ]);
  const unitId = await one(`INSERT INTO process_units (site_id, name) VALUES ($1, 'Test unit') RETURNING id`, [siteId]);
  const tag = `X-204-${k}`;
  const columnId = await one(
    `INSERT INTO columns (unit_id, tag, service, numbering, tray_count, engineer_id) VALUES ($1, $2, 'invented test column', 'top-down', 12, $3) RETURNING id`,
    [unitId, tag, engineerId],
  );
  const sectionId = await one(
    `INSERT INTO tray_sections (column_id, name, first_tray, last_tray, geometry, provenance) VALUES ($1, 'Trays 1-12', 1, 12, $2, 'design') RETURNING id`,
    [columnId, JSON.stringify(GEOMETRY)],
  );
  const loadCaseId = await one(
    `INSERT INTO load_cases (column_id, name, basis, source, loads) VALUES ($1, 'Normal', 'normal', 'typed', $2) RETURNING id`,
    [columnId, JSON.stringify(LOADS)],
  );
  return { siteId, columnId, sectionId, loadCaseId, tag };
}

export const cleanFindings = {
  fouling: false,
  blockedPercent: 0,
  corrosion: false,
  damage: 'none',
  valvesMissing: 0,
  valvesStuck: 0,
  looseFasteners: false,
  manwayInstalled: true,
  closureWitnessed: true,
  debris: false,
  notes: '',
};

export const noMeasurements = { weirHeight_mm: [], downcomerClearance_mm: [], levelness_mm: null, traySpacing_mm: null };
