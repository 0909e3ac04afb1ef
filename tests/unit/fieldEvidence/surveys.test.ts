import { describe, expect, it } from 'vitest';
import {
  floodedTrayPressureDrop,
  predictTrays,
  runPressureDropSurvey,
  runTemperatureSurvey,
  trayDeckElevations,
  validatePressureDropSurveyInput,
  validateTemperatureSurveyInput,
  vapourStaticHead,
} from '../../../server/engine/fieldEvidence/index.js';
import type { PressureDropSurveyInput } from '../../../shared/types/fieldEvidence.js';
import { DATUM, loads, sections } from './fixtures.js';

const decks = trayDeckElevations(sections(), 'top-down', DATUM);
const z = (t: number): number => decks.find((d) => d.tray === t)!.deckElevation_m;
const predicted = predictTrays(sections(), loads());
/** predicted ΔP summed over trays a..b (top-down numbers, inclusive) */
const sumDp = (a: number, b: number): number => {
  let s = 0;
  for (let t = a; t <= b; t++) s += predicted.get(t)!.totalPressureDrop_Pa;
  return s;
};

function survey(measurements: PressureDropSurveyInput['measurements']): PressureDropSurveyInput {
  return { sections: sections(), numbering: 'top-down', datum: DATUM, trays: loads(), measurements };
}

describe('pressure-drop survey', () => {
  it('docblock examples of the static head and the flooded-tray ΔP (derived, hydrostatics)', () => {
    expect(vapourStaticHead(30, 6)).toBeCloseTo(1765.8, 1);
    expect(floodedTrayPressureDrop(700, 4, 610, 0.5)).toBeCloseTo(2082.5, 1);
  });

  it('trays between the taps; vapour head subtracted; ratio and flags', () => {
    // taps 0.1 m below tray 12's deck and 0.1 m above tray 10's deck: trays 10–12 between them
    const lower = z(12) - 0.1;
    const upper = z(10) + 0.1;
    const dz = upper - lower;
    const head = vapourStaticHead(3.6, dz);
    const pred = sumDp(10, 12);
    const r = runPressureDropSurvey(
      survey([
        { label: 'as predicted', lowerElevation_m: lower, upperElevation_m: upper, measured_Pa: pred + head },
        { label: 'low', lowerElevation_m: lower, upperElevation_m: upper, measured_Pa: 0.5 * pred + head },
        { label: 'high', lowerElevation_m: lower, upperElevation_m: upper, measured_Pa: 1.5 * pred, vapourHeadCorrected: true },
      ]),
    );
    const [ok, low, high] = r.rows;
    expect(ok!.trays).toEqual([10, 11, 12]);
    expect(ok!.vapourStaticHead_Pa).toBeCloseTo(head, 6);
    expect(ok!.corrected_Pa).toBeCloseTo(pred, 6);
    expect(ok!.ratio).toBeCloseTo(1, 9);
    expect(ok!.flag).toBe('as-predicted');
    expect(low!.ratio).toBeCloseTo(0.5, 9);
    expect(low!.flag).toBe('low');
    expect(low!.reason).toMatch(/missing trays/);
    expect(high!.corrected_Pa).toBe(1.5 * pred); // already corrected: nothing subtracted
    expect(high!.flag).toBe('high');
    expect(r.notes[0]).toMatch(/management-of-change/);
  });

  it('a section whose ΔP per tray reaches the flooded-tray value is flagged flooding', () => {
    // Lower section (trays 10–16, 610 mm, moderate foaming: aeration factor of the section)
    const base = runPressureDropSurvey(survey([{ section: 'Lower', measured_Pa: 1 }])).rows[0]!;
    expect(base.trays).toEqual([10, 11, 12, 13, 14, 15, 16]);
    const perTrayFlood = base.floodingPerTray_Pa;
    expect(perTrayFlood).toBeGreaterThan(1.5 * base.predictedPerTray_Pa);
    const n = 7;
    const head = base.vapourStaticHead_Pa;
    expect(head).toBeCloseTo(vapourStaticHead(3.6, 7 * 0.61), 6);
    const flooded = runPressureDropSurvey(survey([{ section: 'Lower', measured_Pa: 1.1 * perTrayFlood * n + head }])).rows[0]!;
    expect(flooded.flag).toBe('flooding');
    expect(flooded.measuredPerTray_Pa).toBeCloseTo(1.1 * perTrayFlood, 6);
    const below = runPressureDropSurvey(survey([{ section: 'Lower', measured_Pa: 0.9 * perTrayFlood * n + head }])).rows[0]!;
    expect(below.flag).toBe('high');
  });

  it('validation names the field: taps reversed, unknown section, no tray between, trays without loads', () => {
    const errs = (m: PressureDropSurveyInput['measurements'], trays = loads()) => {
      const v = validatePressureDropSurveyInput({ ...survey(m), trays });
      return v.ok ? [] : v.errors;
    };
    expect(errs([{ lowerElevation_m: 8, upperElevation_m: 7, measured_Pa: 100 }])[0]).toEqual({
      path: '/measurements/0/upperElevation_m',
      message: expect.stringMatching(/^upperElevation_m: must be above/),
    });
    expect(errs([{ section: 'Nowhere', measured_Pa: 100 }])[0]!.path).toBe('/measurements/0/section');
    expect(errs([{ lowerElevation_m: z(10) + 0.1, upperElevation_m: z(10) + 0.2, measured_Pa: 100 }])[0]).toEqual({
      path: '/measurements/0',
      message: expect.stringMatching(/^measurements\[0\]: no tray deck lies between/),
    });
    expect(errs([{ section: 'Lower', measured_Pa: 100 }], loads().slice(0, 12))[0]!.message).toMatch(
      /trays 13, 14, 15, 16 between/,
    );
    expect(errs([{ measured_Pa: 100 }])[0]!.path).toBe('/measurements/0/lowerElevation_m');
    expect(errs([{ section: 'Lower', lowerElevation_m: 1, measured_Pa: 100 }])[0]!.path).toBe('/measurements/0/section');
  });
});

describe('temperature survey', () => {
  it('deviations and flags against the load case temperatures', () => {
    const trays = loads(); // 118 + 6 (n − 1) °C
    const r = runTemperatureSurvey({
      trays,
      measurements: [
        { tray: 1, temperature_C: 120 },
        { tray: 2, temperature_C: 131.5 },
        { tray: 3, temperature_C: 120 },
        { tray: 40, temperature_C: 200 },
      ],
    });
    expect(r.tolerance_K).toBe(5);
    expect(r.rows.map((x) => x.flag)).toEqual(['as-predicted', 'hotter', 'colder', 'no-prediction']);
    expect(r.rows[1]!.deviation_K).toBeCloseTo(7.5, 9);
    expect(r.rows[2]!.deviation_K).toBeCloseTo(-10, 9);
    expect(r.rows[1]!.reason).toBe("131.5 °C is 7.5 K hotter than the case's 124.0 °C (tolerance ±5.0 K).");
    expect(r.rows[3]!.predicted_C).toBeNull();
    const tight = runTemperatureSurvey({ trays, measurements: [{ tray: 1, temperature_C: 120 }], tolerance_K: 1 });
    expect(tight.rows[0]!.flag).toBe('hotter');
  });

  it('a flattened measured profile gets a note; a matching one does not', () => {
    const trays = loads();
    const flat = runTemperatureSurvey({
      trays,
      measurements: [1, 5, 9, 13].map((t) => ({ tray: t, temperature_C: 150 + t * 0.5 })),
    });
    expect(flat.notes.join(' ')).toMatch(/flatter than the case/);
    const match = runTemperatureSurvey({
      trays,
      measurements: [1, 5, 9, 13].map((t) => ({ tray: t, temperature_C: 118 + 6 * (t - 1) })),
    });
    expect(match.notes.join(' ')).not.toMatch(/flatter/);
  });

  it('validation: a tray measured twice, an unknown field', () => {
    const v = validateTemperatureSurveyInput({
      trays: loads(),
      measurements: [
        { tray: 2, temperature_C: 100 },
        { tray: 2, temperature_C: 101 },
      ],
    });
    expect(v.ok).toBe(false);
    if (!v.ok) expect(v.errors[0]).toEqual({ path: '/measurements/1/tray', message: 'tray: tray 2 is measured twice' });
    const u = validateTemperatureSurveyInput({ trays: loads(), measurements: [{ tray: 2, temperature_C: 100, unit: 'F' }] });
    expect(u.ok).toBe(false);
    if (!u.ok) expect(u.errors[0]!.path).toBe('/measurements/0/unit');
  });
});
