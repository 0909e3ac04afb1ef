/** Field evidence: store, read, edit, delete, site isolation, roles and bad input naming the field. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makePlant, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
let other: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let inspector: Agent;
let viewer: Agent;
let outsider: Agent;

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  other = await makePlant(ctx.ds, 20);
  inspector = (await signedIn(ctx, 'inspector', [plant.siteId])).agent;
  viewer = (await signedIn(ctx, 'viewer', [plant.siteId])).agent;
  outsider = (await signedIn(ctx, 'process-engineer', [other.siteId])).agent;
});
afterAll(() => ctx.close());

/** An invented density scan: liquid peaks just above each deck, vapour between. */
const scan = () => ({
  kind: 'gamma-scan' as const,
  title: 'Scan after rate increase',
  takenOn: '2026-11-20',
  operatingCase: 'Max throughput test, step 3',
  data: {
    datum: { tray: 10, elevation_m: 20 },
    liquidDensity_kg_m3: 650,
    vapourDensity_kg_m3: 3,
    lines: [
      {
        label: 'Line A',
        chord: '0°–180° through the active area',
        orientation_deg: 0,
        pass: null,
        takenOn: '2026-11-20',
        operatingCase: 'Max throughput test, step 3',
        measure: 'density' as const,
        calibration: null,
        points: [
          { elevation_m: 19.9, value: 5 },
          { elevation_m: 20.05, value: 300 },
          { elevation_m: 20.3, value: 8 },
        ],
      },
    ],
  },
});

const dpSurvey = {
  kind: 'dp-survey',
  title: 'ΔP survey, top section',
  takenOn: '2026-11-21',
  operatingCase: 'Normal',
  data: {
    datum: { tray: 1, elevation_m: 30 },
    gauge: 'one digital gauge moved between nozzles, lines purged',
    vapourHeadCorrected: false,
    readings: [{ label: 'N3 to N7', upperElevation_m: 30.2, lowerElevation_m: 25.1, section: null, measured_Pa: 5200 }],
  },
};

const tempSurvey = {
  kind: 'temperature-survey',
  title: 'Shell temperatures',
  takenOn: '2026-11-21',
  operatingCase: 'Normal',
  data: {
    instrument: 'contact thermometer on the shell',
    readings: [
      { tray: 3, temperature_C: 121.5 },
      { tray: 8, temperature_C: 140 },
    ],
  },
};

const url = () => `/api/columns/${plant.columnId}/evidence`;

describe('field evidence', () => {
  it('stores each kind, lists it and reads it back whole, with author and default nudge', async () => {
    const a = await inspector.post(url()).send(scan());
    expect(a.status, JSON.stringify(a.body)).toBe(201);
    expect(a.body).toMatchObject({ kind: 'gamma-scan', title: 'Scan after rate increase', itemCount: 1, version: 1 });
    expect(a.body.authorName).toMatch(/Test inspector/);
    expect(a.body.data.datum).toEqual({ tray: 10, elevation_m: 20, nudge_m: 0 });
    expect(a.body.data.lines[0].points).toHaveLength(3);
    expect((await inspector.post(url()).send(dpSurvey)).status).toBe(201);
    expect((await inspector.post(url()).send(tempSurvey)).status).toBe(201);
    const list = await viewer.get(url());
    expect(list.status).toBe(200);
    expect(list.body.items.map((x: { kind: string }) => x.kind).sort()).toEqual([
      'dp-survey',
      'gamma-scan',
      'temperature-survey',
    ]);
    expect(list.body.total).toBe(3);
    const only = await viewer.get(`${url()}?kind=dp-survey`);
    expect(only.body.items).toHaveLength(1);
    expect(only.body.total).toBe(1);
    const one = await viewer.get(`/api/evidence/${a.body.id}`);
    expect(one.body).toEqual(a.body);
  });

  it('nudges the datum and edits the header with a version check; a stale version answers 409', async () => {
    const a = (await inspector.post(url()).send(scan())).body;
    const r = await inspector.patch(`/api/evidence/${a.id}`).send({ version: a.version, nudge_m: 0.15, title: 'Renamed' });
    expect(r.status).toBe(200);
    expect(r.body.data.datum.nudge_m).toBe(0.15);
    expect(r.body.title).toBe('Renamed');
    expect(r.body.version).toBe(a.version + 1);
    const stale = await inspector.patch(`/api/evidence/${a.id}`).send({ version: a.version, nudge_m: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body.details[0].path).toBe('version');
  });

  it('links a run or inspection only of the same column', async () => {
    const insp = await inspector
      .post('/api/inspections')
      .send({ columnId: plant.columnId, turnaround: 'TA 2026', startDate: '2026-10-01' });
    expect(insp.status).toBe(201);
    const ok = await inspector.post(url()).send({ ...scan(), inspectionId: insp.body.id, inspectionTiming: 'before' });
    expect(ok.status).toBe(201);
    expect(ok.body.inspectionLabel).toBe('TA 2026 (from 2026-10-01)');
    const otherInsp = await ctx.ds.query(
      `INSERT INTO inspections (column_id, turnaround, start_date, rules) VALUES ($1, 'X', '2026-01-01', '{}') RETURNING id`,
      [other.columnId],
    );
    const bad = await inspector.post(url()).send({ ...scan(), inspectionId: otherInsp[0].id });
    expect(bad.status).toBe(400);
    expect(bad.body.details).toEqual([{ path: 'inspectionId', message: 'is not an inspection of this column' }]);
    const timing = await inspector.post(url()).send({ ...scan(), inspectionTiming: 'after' });
    expect(timing.status).toBe(400);
    expect(timing.body.details[0].path).toBe('inspectionTiming');
  });

  it('keeps other sites out (404) and viewers from writing (403)', async () => {
    const a = (await inspector.post(url()).send(scan())).body;
    expect((await outsider.get(url())).status).toBe(404);
    expect((await outsider.get(`/api/evidence/${a.id}`)).status).toBe(404);
    expect((await outsider.patch(`/api/evidence/${a.id}`).send({ version: a.version, title: 'x' })).status).toBe(404);
    expect((await outsider.delete(`/api/evidence/${a.id}?version=${a.version}`)).status).toBe(404);
    expect((await outsider.post(url()).send(scan())).status).toBe(404);
    const v = await viewer.post(url()).send(scan());
    expect(v.status).toBe(403);
    expect((await viewer.get(`/api/evidence/${a.id}`)).status).toBe(200);
  });

  it('answers 400 naming the field for bad data, and stores nothing', async () => {
    const before = (await viewer.get(url())).body.items.length;
    const s1 = scan();
    s1.data.lines[0]!.points[1]!.value = -4;
    const r1 = await inspector.post(url()).send(s1);
    expect(r1.status).toBe(400);
    expect(r1.body.details).toContainEqual({ path: 'data.lines.0.points.1.value', message: 'must be >= 0' });
    const s2 = scan();
    s2.data.datum.tray = 25;
    const r2 = await inspector.post(url()).send(s2);
    expect(r2.status).toBe(400);
    expect(r2.body.details).toEqual([{ path: 'data.datum.tray', message: 'tray 25 is outside the column (trays 1–20)' }]);
    const s3 = scan();
    const r3 = await inspector
      .post(url())
      .send({ ...s3, data: { ...s3.data, lines: [{ ...s3.data.lines[0], measure: 'count-rate' }] } });
    expect(r3.status).toBe(400);
    expect(r3.body.details[0].path).toBe('data.lines.0.calibration');
    const r4 = await inspector
      .post(url())
      .send({ ...dpSurvey, data: { ...dpSurvey.data, readings: [{ ...dpSurvey.data.readings[0], lowerElevation_m: 31 }] } });
    expect(r4.status).toBe(400);
    expect(r4.body.details).toEqual([{ path: 'data.readings.0.upperElevation_m', message: 'must be above the lower tapping' }]);
    const both = { ...dpSurvey.data.readings[0], section: 'Top' };
    const r4b = await inspector.post(url()).send({ ...dpSurvey, data: { ...dpSurvey.data, readings: [both] } });
    expect(r4b.body.details).toEqual([
      { path: 'data.readings.0.section', message: 'give either both tapping elevations or a section, not both or neither' },
    ]);
    const unknown = { ...dpSurvey.data.readings[0], upperElevation_m: null, lowerElevation_m: null, section: 'Nowhere' };
    const r4c = await inspector.post(url()).send({ ...dpSurvey, data: { ...dpSurvey.data, readings: [unknown] } });
    expect(r4c.body.details).toEqual([
      { path: 'data.readings.0.section', message: '"Nowhere" is not a tray section of this column (none)' },
    ]);
    const r5 = await inspector.post(url()).send({ ...tempSurvey, kind: 'sound-survey' });
    expect(r5.status).toBe(400);
    expect(r5.body.details.map((d: { path: string }) => d.path)).toContain('kind');
    const r6 = await inspector.post(url()).send({ ...tempSurvey, data: { ...tempSurvey.data, extra: 1 } });
    expect(r6.status).toBe(400);
    expect(r6.body.details).toContainEqual({ path: 'data.extra', message: 'is not an allowed field' });
    const dup = {
      ...tempSurvey,
      data: {
        ...tempSurvey.data,
        readings: [
          { tray: 3, temperature_C: 1 },
          { tray: 3, temperature_C: 2 },
        ],
      },
    };
    const r7 = await inspector.post(url()).send(dup);
    expect(r7.status).toBe(400);
    expect(r7.body.details).toEqual([{ path: 'data.readings.1.tray', message: 'tray 3 is listed twice' }]);
    expect((await viewer.get(url())).body.items.length).toBe(before);
  });

  it('deletes with the version seen; a temperature survey has no datum to nudge', async () => {
    const t = (await inspector.post(url()).send(tempSurvey)).body;
    const n = await inspector.patch(`/api/evidence/${t.id}`).send({ version: t.version, nudge_m: 0.1 });
    expect(n.status).toBe(400);
    expect(n.body.details).toEqual([{ path: 'nudge_m', message: 'a temperature survey has no datum' }]);
    expect((await inspector.delete(`/api/evidence/${t.id}?version=${t.version + 1}`)).status).toBe(409);
    expect((await inspector.delete(`/api/evidence/${t.id}?version=${t.version}`)).status).toBe(204);
    expect((await viewer.get(`/api/evidence/${t.id}`)).status).toBe(404);
  });
});
