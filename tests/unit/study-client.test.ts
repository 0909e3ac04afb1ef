import { describe, expect, it } from 'vitest';
import { studyBody, studyFormFrom } from '../../src/composables/useStudyForm';
import { lowestLiquidAbove, percentGrid, trayWindow } from '../../src/composables/useStudyPlot';
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
