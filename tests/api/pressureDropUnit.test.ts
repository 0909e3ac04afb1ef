/**
 * Tray ΔP unit: a per-user preference (mm or in of liquid, mbar, psi) kept on the server, applied to the run
 * export and the printed report. The head is ΔP/(ρL g) with the tray's own liquid density.
 */
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runReportDoc } from '../../server/services/reports/runReportPdf.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section } from './columnsFixture.js';
import type { RunRecord } from '../../shared/types/runs.js';
import { G_HEAD } from '../../shared/units.js';

let ctx: TestContext;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let run: RunRecord;

beforeAll(async () => {
  ctx = await setupApp();
  const plant = await makePlant(ctx.ds);
  const s = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
  engineer = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
  await s.agent.post(`/api/columns/${plant.columnId}/sections`).send(section(1, 8, 'Top'));
  const lc = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 8) })
  ).body.id;
  const made = await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label: 'ΔP units' });
  expect(made.status, JSON.stringify(made.body)).toBe(201);
  run = (await engineer.get(`/api/runs/${made.body.id}`)).body;
});
afterAll(() => ctx.close());

const exportRows = async () => {
  const res = await engineer.get(`/api/runs/${run.id}/export?format=csv`);
  expect(res.status).toBe(200);
  const rows: string[][] = parse(res.text, { relax_column_count: true });
  const header = rows.find((r) => r[0] === 'Tray')!;
  return { header, data: rows.filter((r) => /^\d+$/.test(r[0] ?? '')) };
};

describe('tray ΔP unit preference', () => {
  it('starts unset (the unit system’s head of liquid) and is kept per user', async () => {
    expect((await engineer.get('/api/auth/me')).body.user.pressureDropUnit).toBeNull();
    const put = await engineer.put('/api/auth/preferences').send({ pressureDropUnit: 'mbar' });
    expect(put.status, JSON.stringify(put.body)).toBe(200);
    expect(put.body.user.pressureDropUnit).toBe('mbar');
    expect(put.body.user.unitSystem).toBe('SI'); // untouched
    expect((await engineer.get('/api/auth/me')).body.user.pressureDropUnit).toBe('mbar');
  });

  it('refuses an unknown unit or an empty body, naming the field', async () => {
    const bad = await engineer.put('/api/auth/preferences').send({ pressureDropUnit: 'inH2O' });
    expect(bad.status).toBe(400);
    expect(bad.body.details.map((d: { path: string }) => d.path)).toContain('pressureDropUnit');
    expect((await engineer.put('/api/auth/preferences').send({})).status).toBe(400);
    expect((await engineer.get('/api/auth/me')).body.user.pressureDropUnit).toBe('mbar');
  });

  it('the run export adds the tray ΔP and its limit in the chosen unit (mbar = Pa/100)', async () => {
    const { header, data } = await exportRows();
    const pa = header.indexOf('Tray ΔP (Pa)');
    const mbar = header.indexOf('Tray ΔP (mbar)');
    expect(pa).toBeGreaterThan(0);
    expect(mbar).toBeGreaterThan(pa);
    for (const r of data) expect(Number(r[mbar])).toBeCloseTo(Number(r[pa]) / 100, 2);
  });

  it('back to the default: mm of the tray’s own liquid in the export and the report', async () => {
    const put = await engineer.put('/api/auth/preferences').send({ pressureDropUnit: null });
    expect(put.body.user.pressureDropUnit).toBeNull();
    const { header, data } = await exportRows();
    const pa = header.indexOf('Tray ΔP (Pa)');
    const mm = header.indexOf('Tray ΔP (mm liquid)');
    expect(mm).toBeGreaterThan(pa);
    for (const r of data) {
      const rho = run.snapshot.loads.find((l) => l.tray === Number(r[0]))!.liquidDensity_kg_m3;
      expect(Number(r[mm])).toBeCloseTo((Number(r[pa]) / (rho * G_HEAD)) * 1000, 1);
    }
    const si = JSON.stringify(runReportDoc(run, null, 'SI').content);
    expect(si).toMatch(/tray ΔP in mm liquid/);
    expect(si).toMatch(/"Tray ΔP","\d+","[\d.]+ mm liquid","at most [\d.]+ mm liquid"/);
    const psi = JSON.stringify(runReportDoc(run, null, 'US', new Date(), 'psi').content);
    expect(psi).toMatch(/"Tray ΔP","\d+","0\.\d+ psi","at most 0\.\d+ psi"/);
    expect(JSON.stringify(runReportDoc(run, null, 'US').content)).toMatch(/"[\d.]+ in liquid"/);
  });
});
