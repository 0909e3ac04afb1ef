import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { rateTray } from '../../../server/engine/index.js';
import {
  minimumLiquidLines,
  netZoneLiquid,
  pointsAt,
  sectionForTray,
  validateStudyInput,
} from '../../../server/engine/pumpAround/index.js';
import type { StudyInput } from '../../../shared/types/pumpAround.js';

function example(): StudyInput {
  const v = validateStudyInput(JSON.parse(readFileSync('examples/pump-around-study.json', 'utf8')));
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

describe('netZoneLiquid: zone liquid without the base circulation', () => {
  const input = example(); // draw 9, return 7, top-down: trays 7–9 are the zone
  const zone = new Set([7, 8, 9]);

  it('takes a fixed circulation off every zone tray and leaves the others as they are', () => {
    const pa = { ...input.pumpAround, circulation_kg_h: 20000, returnTemperatureDrop_K: undefined };
    delete pa.returnTemperatureDrop_K;
    const net = netZoneLiquid(input.trays, pa, 'top-down');
    expect(net.m0).toBe(20000);
    expect(net.shortTrays).toEqual([]);
    for (const [i, t] of net.trays.entries()) {
      const before = input.trays[i]!;
      expect(t.liquidMassFlow_kg_h).toBe(before.liquidMassFlow_kg_h - (zone.has(t.tray) ? 20000 : 0));
      expect(t.vapourMassFlow_kg_h).toBe(before.vapourMassFlow_kg_h);
    }
  });

  it('with a return temperature drop the circulation is Q0/(c_p ΔT); zone trays below it are named, loads unchanged', () => {
    const net = netZoneLiquid(input.trays, input.pumpAround, 'top-down');
    const { baseDuty_kW, liquidHeatCapacity_kJ_kgK, returnTemperatureDrop_K } = input.pumpAround;
    // 5200 kW × 3600 s/h / (2.55 kJ/(kg K) × 65 K) = 112 941 kg/h, more than any zone tray of the example carries
    expect(net.m0).toBeCloseTo((baseDuty_kW * 3600) / (liquidHeatCapacity_kJ_kgK * returnTemperatureDrop_K!), 6);
    expect(net.shortTrays.map((t) => t.tray)).toEqual([7, 8, 9]);
    expect(net.trays).toBe(input.trays);
  });

  it('bottom-up numbering counts the zone from the other end', () => {
    const pa = { ...input.pumpAround, drawTray: 8, returnTray: 10, circulation_kg_h: 1000 };
    delete pa.returnTemperatureDrop_K;
    const net = netZoneLiquid(input.trays, pa, 'bottom-up');
    const changed = net.trays.filter((t, i) => t.liquidMassFlow_kg_h !== input.trays[i]!.liquidMassFlow_kg_h).map((t) => t.tray);
    expect(changed).toEqual([8, 9, 10]);
  });

  it('a pump-around with neither a temperature drop nor a circulation takes nothing off', () => {
    const pa = { ...input.pumpAround };
    delete pa.returnTemperatureDrop_K;
    expect(netZoneLiquid(input.trays, pa, 'top-down')).toEqual({ trays: input.trays, m0: 0, shortTrays: [] });
  });
});

describe('minimumLiquidLines', () => {
  it('each tray above the zone, rated at its line liquid, sits at the minimum crest (liquidLoad at 100 % of limit)', () => {
    const input = example();
    const [base] = pointsAt(input, [input.pumpAround.baseDuty_kW]);
    const lines = minimumLiquidLines(input, base!);
    expect(lines.map((l) => l.tray)).toEqual([1, 2, 3, 4, 5, 6]);
    for (const l of lines) {
      const load = input.trays.find((t) => t.tray === l.tray)!;
      const rated = rateTray(
        sectionForTray(input.sections, l.tray)!,
        { ...load, liquidMassFlow_kg_h: l.minimumLiquid_kg_h },
        input.methods,
      );
      expect(rated.checks.liquidLoad.percentOfLimit).toBeCloseTo(100, 6);
    }
  });
});
