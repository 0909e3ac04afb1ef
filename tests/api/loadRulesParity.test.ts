/**
 * One set of per-tray load rules (shared/trayLoadRules.ts): the load grid, the loads API and the
 * tray-profile import give the same error, on the same field, for the same bad row. Numbers are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GRID_COLUMNS, useLoadGrid } from '../../src/composables/useLoadGrid.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makePlant, type Plant } from './columnsFixture.js';
import type { TrayLoad } from '../../shared/types/rating.js';

let ctx: TestContext;
let plant: Plant;
let agent: Awaited<ReturnType<typeof signedIn>>['agent'];
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  agent = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
});
afterAll(() => ctx.close());

type Row = Partial<TrayLoad>;
type Fault = { field: keyof TrayLoad; message: string };
const good: TrayLoad = {
  tray: 3,
  vapourMassFlow_kg_h: 90000,
  liquidMassFlow_kg_h: 120000,
  vapourDensity_kg_m3: 3.1,
  liquidDensity_kg_m3: 690,
  surfaceTension_mN_m: 19,
};
/** the import file's columns, SI units, and the field each one maps to */
const FILE: [string, keyof TrayLoad][] = [
  ['Tray', 'tray'],
  ['Vapour mass flow [kg/h]', 'vapourMassFlow_kg_h'],
  ['Liquid mass flow [kg/h]', 'liquidMassFlow_kg_h'],
  ['Vapour density [kg/m3]', 'vapourDensity_kg_m3'],
  ['Liquid density [kg/m3]', 'liquidDensity_kg_m3'],
  ['Surface tension [mN/m]', 'surfaceTension_mN_m'],
];

function viaGrid(row: Row): Fault[] {
  const g = useLoadGrid('SI');
  g.rows.value = [GRID_COLUMNS.map((c) => (row[c.key] === undefined ? '' : String(row[c.key])))];
  return g.toLoads().errors.map((e) => ({ field: GRID_COLUMNS[e.col]!.key, message: e.message }));
}

async function viaApi(row: Row): Promise<Fault[]> {
  const res = await agent
    .post(`/api/columns/${plant.columnId}/load-cases`)
    .send({ name: 'Parity', basis: 'normal', source: 'typed', loads: [row] });
  expect(res.status).toBe(400);
  return (res.body.details as { path: string; message: string }[]).map((d) => {
    const m = /^loads\.0\.(\w+)$/.exec(d.path);
    expect(m, d.path).not.toBeNull();
    return { field: m![1] as keyof TrayLoad, message: d.message };
  });
}

async function viaImport(row: Row): Promise<Fault[]> {
  const csv = [FILE.map(([h]) => h).join(','), FILE.map(([, f]) => (row[f] === undefined ? '' : String(row[f]))).join(',')].join(
    '\n',
  );
  const res = await agent.post(`/api/columns/${plant.columnId}/imports`).attach('file', Buffer.from(csv), 'parity.csv');
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return (res.body.errors as { row: number; column: string; message: string }[]).map((e) => {
    expect(e.row).toBe(2);
    return { field: FILE.find(([h]) => h === e.column)![1], message: e.message };
  });
}

const CASES: [string, Row, Fault[]][] = [
  ['a negative vapour flow', { ...good, vapourMassFlow_kg_h: -5 }, [{ field: 'vapourMassFlow_kg_h', message: 'must be >= 0' }]],
  [
    'a liquid no denser than its vapour',
    { ...good, vapourDensity_kg_m3: 690, liquidDensity_kg_m3: 690 },
    [{ field: 'vapourDensity_kg_m3', message: 'vapour density (690 kg/m³) must be below the liquid density (690 kg/m³)' }],
  ],
  ['a row without its tray', { ...good, tray: undefined }, [{ field: 'tray', message: 'is required' }]],
  [
    'a surface tension under the bound',
    { ...good, surfaceTension_mN_m: 0.05 },
    [{ field: 'surfaceTension_mN_m', message: 'must be >= 0.1' }],
  ],
];

describe('the grid, the loads API and the import agree on a bad row', () => {
  for (const [what, row, expected] of CASES)
    it(what, async () => {
      expect(viaGrid(row), 'grid').toEqual(expected);
      expect(await viaApi(row), 'loads API').toEqual(expected);
      expect(await viaImport(row), 'import').toEqual(expected);
    });

  it('a tray outside the column: the loads API and the import say the same (the grid does not know the column)', async () => {
    const expected: Fault[] = [{ field: 'tray', message: 'tray 25 is outside the column (trays 1–20)' }];
    expect(await viaApi({ ...good, tray: 25 })).toEqual(expected);
    expect(await viaImport({ ...good, tray: 25 })).toEqual(expected);
  });
});
