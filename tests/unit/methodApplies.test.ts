/** The section form checks a field against the ranges of the correlations rated on that kind of tray, read from their metadata. */
import { describe, expect, it } from 'vitest';
import { METHOD_METADATA } from '../../server/engine/index.js';
import { appliesToSection } from '../../shared/methodApplies.js';
import type { TrayType } from '../../shared/types/rating.js';

const infos = Object.values(METHOD_METADATA).map((m) => ({ id: m.id, trayTypes: m.trayTypes ?? null }));
const applying = (t: TrayType) => new Set(infos.filter((m) => appliesToSection(m, t)).map((m) => m.id));

describe('correlations rated on each kind of tray (from their tray types as data)', () => {
  it('sieve trays: the orifice coefficient fit, Eduljee and Fair weep, not the valve coefficients', () => {
    const s = applying('sieve');
    for (const id of [
      'orificeCoefficientHughmarkOConnell',
      'eduljeeK2OwnFit',
      'weepPointHoleVelocityFair',
      'fairFloodCapacityLygerosMagoulas',
    ])
      expect(s.has(id), id).toBe(true);
    for (const id of [
      'kleinOpenValveK',
      'kleinClosedBalanceVelocity',
      'weepPointFixedValveFair',
      'weepPointMovingValveClosedBalance',
    ])
      expect(s.has(id), id).toBe(false);
  });
  it('fixed valves: the open-valve coefficient and their own weep point; moving valves: the Klein balance', () => {
    const f = applying('fixed-valve');
    expect(f.has('kleinOpenValveK')).toBe(true);
    expect(f.has('weepPointFixedValveFair')).toBe(true);
    expect(f.has('eduljeeK2OwnFit')).toBe(false);
    expect(f.has('kleinClosedBalanceVelocity')).toBe(false);
    const m = applying('moving-valve');
    for (const id of ['kleinOpenValveK', 'kleinClosedValveK', 'kleinClosedBalanceVelocity', 'weepPointMovingValveClosedBalance'])
      expect(m.has(id), id).toBe(true);
    expect(m.has('weepPointHoleVelocityFair')).toBe(false);
  });
  it('Kister & Haas is a rating option, never checked on the section form', () => {
    for (const t of ['sieve', 'fixed-valve', 'moving-valve'] as const) {
      expect(applying(t).has('kisterHaasFloodCapacity')).toBe(false);
      expect(applying(t).has('transitionClearLiquidHeightKisterHaas')).toBe(false);
    }
  });
});
