import { describe, expect, it } from 'vitest';
import * as flooding from '../../../server/engine/flooding.js';
import * as entrainment from '../../../server/engine/entrainment.js';
import * as weeping from '../../../server/engine/weeping.js';
import * as pressureDrop from '../../../server/engine/pressureDrop.js';
import * as aeration from '../../../server/engine/aeration.js';
import * as weir from '../../../server/engine/weir.js';
import * as downcomer from '../../../server/engine/downcomer.js';
import { METHOD_METADATA, METHOD_REGISTRY, rateSection } from '../../../server/engine/index.js';
import { inventedRequest, seaderRequest } from './fixtures.js';

const modules: Record<string, Record<string, unknown>> = {
  flooding,
  entrainment,
  weeping,
  pressureDrop,
  aeration,
  weir,
  downcomer,
};

describe('method registry', () => {
  it('each registry name maps to the function exported under that name', () => {
    const ids = Object.keys(METHOD_REGISTRY);
    expect(ids.length).toBeGreaterThanOrEqual(20);
    for (const id of ids) {
      const owners = Object.values(modules).filter((m) => m[id] !== undefined);
      expect(owners, id).toHaveLength(1);
      expect(owners[0]![id]).toBe(METHOD_REGISTRY[id]);
      expect(METHOD_REGISTRY[id]!.meta.id).toBe(id);
    }
  });

  it('registry functions compute what their names say (spot values)', () => {
    const call = (id: string, ...args: unknown[]) => (METHOD_REGISTRY[id] as unknown as (...a: unknown[]) => number)(...args);
    expect(call('crestOverWeirFrancis', 3.09 / 3600, 1)).toBeCloseTo(6, 1);
    expect(call('fairHoleAreaCorrection', 0.08)).toBeCloseTo(0.9, 6);
    expect(call('residualHeadBennett', 58, 954, 4.7625)).toBeCloseTo(7.8, 1);
    expect(call('apronHeadLoss', 1, 1)).toBeCloseTo(165.2, 6);
  });

  it('every method has a label, a source and ranges as data', () => {
    for (const m of Object.values(METHOD_METADATA)) {
      expect(m.label.length).toBeGreaterThan(3);
      expect(m.source.length).toBeGreaterThan(10);
      for (const [lo, hi] of Object.values(m.ranges)) expect(lo).toBeLessThanOrEqual(hi);
    }
  });

  it('every CheckResult.method is a registry key', () => {
    for (const req of [
      seaderRequest(),
      inventedRequest(),
      { ...seaderRequest(), methods: { jetFlood: 'kister-haas' as const } },
    ]) {
      for (const t of rateSection(req).trays) {
        for (const c of Object.values(t.checks)) expect(Object.keys(METHOD_REGISTRY)).toContain(c.method);
      }
    }
  });
});
