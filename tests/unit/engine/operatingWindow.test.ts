import { describe, expect, it } from 'vitest';
import { brent, operatingWindow, rateTray, solveIncreasing } from '../../../server/engine/index.js';
import { seader748Bottom, seaderTray } from './fixtures.js';

describe('shared solver', () => {
  it('finds roots and reports a missing bracket', () => {
    expect(brent((x) => x * x - 2, 0, 2).root).toBeCloseTo(Math.SQRT2, 10);
    expect(brent((x) => x * x + 1, 0, 2).converged).toBe(false);
    expect(solveIncreasing((x) => x - 1234.5, 0, 1).root).toBeCloseTo(1234.5, 6);
  });
});

describe('operating window', () => {
  const w = operatingWindow(seaderTray, seader748Bottom);
  const curve = (name: string) => w.curves.find((c) => c.limit === name)!;

  it('has every limit curve, finite points and the operating point', () => {
    for (const name of [
      'flood',
      'floodDesign',
      'entrainment',
      'downcomerBackup',
      'downcomerInletVelocity',
      'weep',
      'minWeirLoading',
      'maxWeirLoading',
    ]) {
      const c = curve(name);
      expect(c, name).toBeDefined();
      expect(c.liquid_kg_h.length).toBe(c.vapour_kg_h.length);
      for (const x of [...c.liquid_kg_h, ...c.vapour_kg_h]) expect(Number.isFinite(x)).toBe(true);
    }
    expect(curve('flood').liquid_kg_h.length).toBeGreaterThan(5);
    expect(w.operatingPoint.vapour_kg_h).toBe(seader748Bottom.vapourMassFlow_kg_h);
  });

  it('curve points sit on their limits when rated', () => {
    const f = curve('flood');
    const d = curve('floodDesign');
    const wp = curve('weep');
    for (const i of [1, 5, 10]) {
      const at = (v: number, l: number) =>
        rateTray(seaderTray, { ...seader748Bottom, vapourMassFlow_kg_h: v, liquidMassFlow_kg_h: l });
      expect(at(f.vapour_kg_h[i]!, f.liquid_kg_h[i]!).checks.jetFlood.value).toBeCloseTo(100, 3);
      expect(at(d.vapour_kg_h[i]!, d.liquid_kg_h[i]!).checks.jetFlood.value).toBeCloseTo(80, 3);
      expect(at(wp.vapour_kg_h[i]!, wp.liquid_kg_h[i]!).checks.weeping.value).toBeCloseTo(1, 6);
      expect(f.vapour_kg_h[i]!).toBeGreaterThan(d.vapour_kg_h[i]!);
    }
  });
});
