/**
 * A stored gamma scan read through the API against a stored rating run: the scan is synthetic, made by the
 * engine's generator from our own model with known froth heights (two flooded trays, one missing tray).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { predictTrays, syntheticGammaScan, trayDeckElevations } from '../../server/engine/fieldEvidence/index.js';
import type { EvidenceReading } from '../../shared/types/evidence.js';
import type { StudySection } from '../../shared/types/pumpAround.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let runId: string;
const DATUM = { tray: 16, elevation_m: 5 };
const RHO_L = 650;
const RHO_V = 3;

const studySections = (): StudySection[] =>
  [section(1, 8, 'Top'), section(9, 16, 'Bottom')].map((s) => ({
    ...s.geometry,
    name: s.name,
    fromTray: s.firstTray,
    toTray: s.lastTray,
  }));

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 16);
  const { agent: specialist } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
  engineer = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
  for (const s of [section(1, 8, 'Top'), section(9, 16, 'Bottom')])
    expect((await specialist.post(`/api/columns/${plant.columnId}/sections`).send(s)).status).toBe(201);
  const lc = await engineer
    .post(`/api/columns/${plant.columnId}/load-cases`)
    .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 16) });
  expect(lc.status).toBe(201);
  const run = await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc.body.id, label: 'Scan check' });
  expect(run.status).toBe(201);
  runId = run.body.id;
});
afterAll(() => ctx.close());

/** Trays 3–14 scanned every 25 mm: trays 5 and 6 flooded, tray 11 without froth (missing), the rest as predicted. */
function syntheticScan() {
  const decks = trayDeckElevations(studySections(), 'top-down', DATUM);
  const deck = (t: number) => decks.find((d) => d.tray === t)!;
  const predicted = predictTrays(studySections(), loads(1, 16));
  const frothHeights = [...predicted.values()].map((p) => ({
    tray: p.tray,
    frothHeight_mm: p.tray === 5 || p.tray === 6 ? 2000 : p.tray === 11 ? 0 : p.frothHeight_mm,
  }));
  return syntheticGammaScan({
    decks,
    frothHeights,
    defaultFrothHeight_mm: 150,
    vapourDensity_kg_m3: RHO_V,
    liquidDensity_kg_m3: RHO_L,
    frothDensity_kg_m3: 0.35 * RHO_L,
    from_m: deck(14).deckElevation_m - 0.1,
    to_m: deck(3).deckElevation_m + deck(3).traySpacing_mm / 1000 + 0.1,
    step_m: 0.025,
    noise_kg_m3: 10,
    seed: 7,
  }).map((p) => ({ elevation_m: p.elevation_m, value: Math.max(0, p.density_kg_m3!) }));
}

const store = async (extra: object = {}) => {
  const res = await engineer.post(`/api/columns/${plant.columnId}/evidence`).send({
    kind: 'gamma-scan',
    title: 'Synthetic scan',
    takenOn: '2026-11-20',
    operatingCase: 'Normal',
    data: {
      datum: DATUM,
      liquidDensity_kg_m3: RHO_L,
      vapourDensity_kg_m3: RHO_V,
      lines: [
        {
          label: 'Line A',
          chord: 'active area',
          orientation_deg: null,
          pass: null,
          takenOn: '2026-11-20',
          operatingCase: 'Normal',
          measure: 'density',
          calibration: null,
          points: syntheticScan(),
        },
      ],
    },
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
  return res.body as { id: string; version: number };
};

describe('reading a stored gamma scan', () => {
  it('finds the flooded region and the missing tray, with the run prediction beside the reading', async () => {
    const ev = await store();
    const res = await engineer.get(`/api/evidence/${ev.id}/reading?runId=${runId}`);
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(200);
    const r = res.body as EvidenceReading;
    expect(r).toMatchObject({ runId, runLabel: 'Scan check (Normal)', numbering: 'top-down', trayCount: 16 });
    expect(r.decks).toHaveLength(16);
    const line = r.lines[0]!;
    expect(line.errors).toEqual([]);
    const finding = (t: number) => line.result!.trays.find((x) => x.tray === t)?.finding;
    expect(finding(5)).toBe('flooded');
    expect(finding(6)).toBe('flooded');
    expect(finding(11)).toBe('missing-tray');
    expect(finding(9)).toBe('normal');
    expect(line.result!.floodedRegions).toEqual([expect.objectContaining({ topTray: 5, bottomTray: 6 })]);
    expect(line.result!.trays.every((t) => typeof t.predictedFrothHeight_mm === 'number')).toBe(true);
  });

  it('without a run reads the scan against the column alone; the nudge moves every deck', async () => {
    const ev = await store();
    const plain = (await engineer.get(`/api/evidence/${ev.id}/reading`)).body as EvidenceReading;
    expect(plain.runId).toBeNull();
    expect(plain.lines[0]!.result!.trays[0]!.predictedFrothHeight_mm).toBeUndefined();
    const p = await engineer.patch(`/api/evidence/${ev.id}`).send({ version: ev.version, nudge_m: 0.2 });
    expect(p.status).toBe(200);
    const moved = (await engineer.get(`/api/evidence/${ev.id}/reading`)).body as EvidenceReading;
    const deck = (r: EvidenceReading, t: number) => r.decks.find((d) => d.tray === t)!.deckElevation_m;
    expect(deck(moved, 10) - deck(plain, 10)).toBeCloseTo(0.2, 9);
  });

  it('answers 400 naming the field for a run of another column; a survey without a run says a run is needed', async () => {
    const ev = await store();
    const other = await makePlant(ctx.ds, 16);
    const { agent: otherSpecialist } = await signedIn(ctx, 'internals-specialist', [other.siteId]);
    expect((await otherSpecialist.post(`/api/columns/${other.columnId}/sections`).send(section(1, 8))).status).toBe(201);
    const lc = await otherSpecialist
      .post(`/api/columns/${other.columnId}/load-cases`)
      .send({ name: 'Other', basis: 'normal', source: 'typed', loads: loads(1, 8) });
    const foreign = await otherSpecialist
      .post('/api/runs')
      .send({ columnId: other.columnId, loadCaseId: lc.body.id, label: 'Other' });
    expect(foreign.status).toBe(201);
    const res0 = await engineer.get(`/api/evidence/${ev.id}/reading?runId=${foreign.body.id}`);
    expect(res0.status).toBe(400);
    expect(res0.body.details).toEqual([{ path: 'runId', message: 'is not a rating run of this column' }]);
    const t = await engineer.post(`/api/columns/${plant.columnId}/evidence`).send({
      kind: 'temperature-survey',
      title: 'T',
      takenOn: '2026-11-20',
      operatingCase: 'Normal',
      data: { instrument: 'shell', readings: [{ tray: 3, temperature_C: 120 }] },
    });
    const noRun = await engineer.get(`/api/evidence/${t.body.id}/reading`);
    expect(noRun.status).toBe(200);
    expect(noRun.body.temperature.errors[0].path).toBe('runId');
    expect((await engineer.get(`/api/evidence/${ev.id}/reading?runId=nope`)).status).toBe(400);
  });

  it('reads a ΔP survey and a temperature survey against the run', async () => {
    const decks = trayDeckElevations(studySections(), 'top-down', DATUM);
    const deck = (t: number) => decks.find((d) => d.tray === t)!.deckElevation_m;
    const dp = await engineer.post(`/api/columns/${plant.columnId}/evidence`).send({
      kind: 'dp-survey',
      title: 'ΔP',
      takenOn: '2026-11-20',
      operatingCase: 'Normal',
      runId,
      data: {
        datum: DATUM,
        gauge: 'one gauge',
        vapourHeadCorrected: false,
        readings: [
          { label: 'Top section', upperElevation_m: null, lowerElevation_m: null, section: 'Top', measured_Pa: 6000 },
          { label: 'Taps', upperElevation_m: deck(9) + 0.1, lowerElevation_m: deck(12) - 0.1, section: null, measured_Pa: 3000 },
        ],
      },
    });
    expect(dp.status, JSON.stringify(dp.body)).toBe(201);
    const r = (await engineer.get(`/api/evidence/${dp.body.id}/reading`)).body as EvidenceReading;
    expect(r.pressureDrop!.errors).toEqual([]);
    expect(r.pressureDrop!.result!.rows.map((x) => x.trays)).toEqual([
      [1, 2, 3, 4, 5, 6, 7, 8],
      [9, 10, 11, 12],
    ]);
    const t = await engineer.post(`/api/columns/${plant.columnId}/evidence`).send({
      kind: 'temperature-survey',
      title: 'T',
      takenOn: '2026-11-20',
      operatingCase: 'Normal',
      data: { instrument: 'shell', readings: [{ tray: 3, temperature_C: 400 }] },
    });
    const tr = (await engineer.get(`/api/evidence/${t.body.id}/reading?runId=${runId}`)).body as EvidenceReading;
    expect(tr.temperature!.result!.rows[0]).toMatchObject({ tray: 3, measured_C: 400, flag: 'hotter' });
  });
});
