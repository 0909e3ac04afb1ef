import { describe, expect, it } from 'vitest';
import { studyBody, studyFormFrom } from '../../src/composables/useStudyForm';
import { baseAboveSuggested, dryTraysAbove, noteInPageWords, overLimits, trayList } from '../../src/composables/useStudyFindings';
import { lowestLiquidAbove, percentGrid, trayWindow } from '../../src/composables/useStudyPlot';
import { watchedChecks } from '../../server/engine/pumpAround/checks';
import { rateTray } from '../../server/engine/rateTray';
import { isWatched } from '../../shared/studyWatched';
import { inventedRequest } from './engine/fixtures';
import type { CheckName } from '../../shared/types/rating';
import { fromDisplay, toDisplay, unitLabel, type QuantityId } from '../../shared/units';
import type { SlimStudyPoint, SlimStudyResult, SlimTrayPoint, StudyRecord } from '../../shared/types/studies';

const tray = (t: number, region: SlimTrayPoint['region'], L: number, percent: number[]): SlimTrayPoint => ({
  tray: t,
  region,
  vapourMassFlow_kg_h: 1000,
  liquidMassFlow_kg_h: L,
  dry: L === 0,
  percent,
  status: percent.map(() => 'ok'),
  controllingCheck: 'jetFlood',
});
const point = (duty: number, trays: SlimTrayPoint[]): SlimStudyPoint => ({
  duty_kW: duty,
  condenserDutyChange_kW: 0,
  reflux_kg_h: 0,
  heatRecovered_kW: 0,
  liquidToVapourAboveZone: 0,
  circulation_kg_h: 0,
  returnTemperatureDrop_K: 0,
  dryTrays: [],
  trays,
});
const result = {
  checkNames: ['jetFlood', 'weeping'],
  points: [
    point(100, [
      tray(1, 'above', 50, [40, 90]),
      tray(2, 'above', 30, [70, 20]),
      tray(3, 'zone', 900, [80, 10]),
      tray(4, 'below', 500, [10, 10]),
    ]),
    point(200, [
      tray(1, 'above', 20, [30, 95]),
      tray(2, 'above', 0, [60, 105]),
      tray(3, 'zone', 950, [85, 10]),
      tray(4, 'below', 500, [10, 10]),
    ]),
  ],
} as unknown as SlimStudyResult;

describe('study page helpers (client side, from the stored points)', () => {
  it('lowest liquid above the zone per duty, and on which tray', () => {
    expect(lowestLiquidAbove(result)).toEqual({ duty: [100, 200], liquid: [30, 0], tray: [2, 2] });
  });

  it('percent grid: the highest check per tray, or the chosen one', () => {
    const all = percentGrid(result, null);
    expect(all.trays).toEqual([1, 2, 3, 4]);
    expect(all.z[1]).toEqual([70, 105]);
    expect(all.text[1]).toEqual(['jetFlood', 'weeping']);
    expect(percentGrid(result, 1).z[0]).toEqual([90, 95]);
  });

  it('tray window: the trays above, the zone and n trays below the draw', () => {
    expect(trayWindow(result.points[0]!, 1)).toEqual([0.5, 4.5]);
    expect(trayWindow(result.points[0]!, 0)).toEqual([0.5, 3.5]);
  });
});

describe('new-study form: display units in, SI out', () => {
  const us = {
    show: (q: QuantityId, si: number) => toDisplay(q, si, 'US'),
    enter: (q: QuantityId, v: number) => fromDisplay(q, v, 'US'),
    label: (q: QuantityId) => unitLabel(q, 'US'),
  };
  const record = {
    label: 'A',
    inputs: {
      source: {
        request: {
          loadCaseId: 'l',
          pumpAroundId: 'p',
          latentHeat_kJ_kg: 250,
          liquidHeatCapacity_kJ_kgK: 2.5,
          circulation_kg_h: 90000,
          baseDuty_kW: 5000,
          sweep: { fromDuty_kW: 5000, toDuty_kW: 9000, steps: 20 },
          margin: 0.6,
          zoneLiquidIncludesCirculation: true,
        },
      },
      input: { pumpAround: { baseDuty_kW: 5000 } },
    },
  } as unknown as StudyRecord;

  it('a copy of a study gives back the same request in SI (round trip through US units)', () => {
    const f = studyFormFrom(record, us);
    expect(f.mode).toBe('circulation');
    expect(f.baseDuty).not.toBe(5000); // shown in MMBtu/h
    const body = studyBody(f, us);
    expect(body.baseDuty_kW).toBeCloseTo(5000, 6);
    expect(body.circulation_kg_h).toBeCloseTo(90000, 6);
    expect(body.sweep.toDuty_kW).toBeCloseTo(9000, 6);
    expect(body.returnTemperatureDrop_K).toBeUndefined();
    expect(body.zoneLiquidIncludesCirculation).toBe(true);
    expect(body.label).toBe('A (copy)');
  });

  it('empty fields are left out so that the server names them', () => {
    const body = studyBody(studyFormFrom(null, us), us) as unknown as Record<string, unknown>;
    expect(body).not.toHaveProperty('latentHeat_kJ_kg');
    expect(body).not.toHaveProperty('loadCaseId');
    expect(body.sweep).toEqual({ steps: 40 });
  });
});

describe('study findings shown on the page (from the stored key points)', () => {
  const names = ['jetFlood', 'entrainment', 'weeping', 'pressureDrop'] as CheckName[];
  // percent per check in `names` order
  const at = point(1000, [
    tray(1, 'above', 50, [40, 130, 101, 20]),
    tray(5, 'above', 40, [40, 120, 50, 20]),
    tray(8, 'zone', 900, [105, 60, 10, 20]),
    tray(9, 'zone', 900, [100, 60, 10, 20]), // exactly at the limit: not over
    tray(12, 'below', 500, [10, 10, 10, 140]),
  ]);

  it('groups the checks over their limit by check, watched ones first, and says which are not watched', () => {
    expect(overLimits(names, at)).toEqual([
      { check: 'weeping', kind: 'watched', trays: [1] },
      { check: 'jetFlood', kind: 'watched', trays: [8] },
      { check: 'entrainment', kind: 'unwatched', trays: [1, 5] },
      { check: 'pressureDrop', kind: 'below', trays: [12] },
    ]);
    expect(overLimits(names, undefined)).toEqual([]);
  });

  it('the page calls watched what the engine guards: above the zone crest and weeping, in the zone flood, downcomer and weir loading', () => {
    // a real rated tray, so the weir-loading sense is the one the rating engine gives
    const req = inventedRequest();
    const rating = rateTray(req.section, req.trays[0]!);
    const names = Object.keys(rating.checks) as CheckName[];
    for (const region of ['above', 'zone', 'below'] as const)
      expect(names.filter((c) => isWatched(region, c)).sort()).toEqual(watchedChecks(region, rating).sort());
    expect(names.filter((c) => isWatched('above', c)).sort()).toEqual(['liquidLoad', 'weeping']);
    expect(names.filter((c) => isWatched('zone', c)).sort()).toEqual([
      'downcomerBackup',
      'downcomerInletVelocity',
      'jetFlood',
      'weirLoading',
    ]);
    expect(isWatched('below', 'jetFlood')).toBe(false);
  });

  it('flags a base duty above the suggested one, with the base as a share of dry-out', () => {
    const r = { baseDuty_kW: 21800, recommendedDuty_kW: 20274, dryOutDuty_kW: 28963 };
    const f = baseAboveSuggested(r)!;
    expect(f.by_kW).toBeCloseTo(1526, 6);
    expect(f.baseShareOfDryOut).toBeCloseTo(21800 / 28963, 9);
    expect(baseAboveSuggested({ ...r, recommendedDuty_kW: 23000 })).toBeNull();
    expect(baseAboveSuggested({ ...r, recommendedDuty_kW: null })).toBeNull();
    expect(baseAboveSuggested({ ...r, dryOutDuty_kW: null })!.baseShareOfDryOut).toBeNull();
  });

  it('dry trays above the return at a slider duty; tray lists in words with ranges', () => {
    expect(dryTraysAbove(result.points[1])).toEqual([2]);
    expect(dryTraysAbove(result.points[0])).toEqual([]);
    expect(dryTraysAbove(null)).toEqual([]);
    expect(trayList([4])).toBe('tray 4');
    expect(trayList([6, 1, 5])).toBe('trays 1, 5 and 6');
    expect(trayList([1, 5, 6, 7, 8, 16])).toBe('trays 1, 5–8 and 16');
  });

  it('engine notes are shown with the page word for the suggested duty', () => {
    expect(noteInPageWords('Checks over their limit at the recommended duty 20274 kW: tray 1 entrainment.')).toBe(
      'Checks over their limit at the suggested duty 20274 kW: tray 1 entrainment.',
    );
    expect(noteInPageWords('No duty is free of watched limits: no recommended duty.')).toBe(
      'No duty is free of watched limits: no suggested duty.',
    );
  });
});
