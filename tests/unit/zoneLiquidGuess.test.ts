import { describe, expect, it } from 'vitest';
import { baseCirculation, guessZoneLiquid } from '../../shared/zoneLiquidGuess';

// invented trays: 100 t/h of liquid above a zone on trays 4–6 (return 4, draw 6), numbered from the top
const loads = (zone: number) =>
  [1, 2, 3, 4, 5, 6, 7].map((tray) => ({ tray, liquidMassFlow_kg_h: tray >= 4 && tray <= 6 ? zone : 100000 }));
const pa = { returnTray: 4, drawTray: 6 };

describe('zone liquid against the liquid above the zone', () => {
  it('base circulation Q0/(c_p ΔT): 6000 kW, 2.6 kJ/(kg·K), 80 K → 103,846 kg/h', () => {
    expect(baseCirculation({ baseDuty_kW: 6000, cp_kJ_kgK: 2.6, returnDrop_K: 80, circulation_kg_h: null })).toBeCloseTo(
      103846,
      0,
    );
    expect(baseCirculation({ baseDuty_kW: 6000, cp_kJ_kgK: null, returnDrop_K: 80, circulation_kg_h: null })).toBeNull();
    expect(baseCirculation({ baseDuty_kW: null, cp_kJ_kgK: null, returnDrop_K: null, circulation_kg_h: 5e4 })).toBe(5e4);
  });
  it('a step close to the circulation reads as "includes", no step as "net"', () => {
    const inc = guessZoneLiquid(loads(195000), pa, 'top-down', 100000)!;
    expect([inc.aboveTray, inc.step_kg_h, inc.likely, inc.clearCut]).toEqual([3, 95000, 'includes', true]);
    const net = guessZoneLiquid(loads(104000), pa, 'top-down', 100000)!;
    expect([net.likely, net.clearCut]).toEqual(['net', true]);
    expect(guessZoneLiquid(loads(155000), pa, 'top-down', 100000)!.clearCut).toBe(false);
  });
  it('bottom-up numbering takes the tray above from the higher numbers; no circulation gives no answer', () => {
    const g = guessZoneLiquid(loads(195000), { returnTray: 6, drawTray: 4 }, 'bottom-up', null)!;
    expect([g.aboveTray, g.likely, g.ratio]).toEqual([7, null, null]);
    expect(guessZoneLiquid(loads(195000), { returnTray: 1, drawTray: 2 }, 'top-down', 1)).toBeNull();
  });
});
