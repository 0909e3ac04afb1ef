import { describe, expect, it } from 'vitest';
import {
  FIELD_EVIDENCE_METHODS,
  FIELD_EVIDENCE_REGISTRY,
  FIELD_EVIDENCE_USES,
  frothHeightFromClearLiquid,
  frothHeightsFromRating,
  predictTrays,
} from '../../../server/engine/fieldEvidence/index.js';
import { METHOD_REGISTRY } from '../../../server/engine/index.js';
import { loads, sections } from './fixtures.js';

describe('field-evidence methods', () => {
  it('each registry name maps to the function that computes it (spot values of the docblock examples)', () => {
    const call = (id: string, ...args: unknown[]) =>
      (FIELD_EVIDENCE_REGISTRY[id] as unknown as (...a: unknown[]) => number)(...args);
    expect(Object.keys(FIELD_EVIDENCE_REGISTRY).sort()).toEqual([
      'densityFromCountRateBeerLambert',
      'floodedTrayPressureDrop',
      'frothHeightFromClearLiquid',
      'vapourStaticHead',
    ]);
    expect(call('frothHeightFromClearLiquid', 30.9, 0.38)).toBeCloseTo(81.3, 1);
    expect(call('vapourStaticHead', 30, 6)).toBeCloseTo(1765.8, 1);
    expect(call('floodedTrayPressureDrop', 700, 4, 610, 0.5)).toBeCloseTo(2082.5, 1);
    expect(
      call('densityFromCountRateBeerLambert', Math.sqrt(1e7), {
        vapourCountRate: 1e4,
        liquidCountRate: 1e3,
        vapourDensity_kg_m3: 20,
        liquidDensity_kg_m3: 700,
      }),
    ).toBeCloseTo(360, 9);
  });

  it('metadata: label, source, provenance; the correlations used are rating registry ids', () => {
    for (const m of Object.values(FIELD_EVIDENCE_METHODS)) {
      expect(m.label.length).toBeGreaterThan(5);
      expect(m.source.length).toBeGreaterThan(10);
      expect(m.source).not.toMatch(/from memory|to confirm|\[S\d+\]|field-practice/);
    }
    for (const ids of Object.values(FIELD_EVIDENCE_USES)) for (const id of ids) expect(METHOD_REGISTRY[id], id).toBeDefined();
  });

  it('froth heights from the rating: prediction times the factor; flooded fills the spacing; missing is zero', () => {
    const pred = predictTrays(sections(), loads());
    const h = new Map(
      frothHeightsFromRating(sections(), loads(), { 2: 'flooded', 3: 'missing', 4: 2 }).map((x) => [x.tray, x.frothHeight_mm]),
    );
    expect(h.get(1)).toBeCloseTo(pred.get(1)!.frothHeight_mm, 9);
    expect(h.get(2)).toBeGreaterThanOrEqual(686);
    expect(h.get(3)).toBe(0);
    expect(h.get(4)).toBeCloseTo(2 * pred.get(4)!.frothHeight_mm, 9);
    // the prediction's froth height is its clear liquid over its froth density
    const p = pred.get(5)!;
    expect(p.frothHeight_mm).toBeCloseTo(frothHeightFromClearLiquid(p.clearLiquidHeight_mm, p.relativeFrothDensity), 9);
    expect(p.relativeFrothDensity).toBeGreaterThan(0.1);
    expect(p.relativeFrothDensity).toBeLessThan(1);
  });
});
