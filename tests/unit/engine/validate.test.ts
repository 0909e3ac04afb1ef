import { describe, expect, it } from 'vitest';
import { validateRatingRequest } from '../../../server/engine/index.js';
import { inventedRequest } from './fixtures.js';

function errorsOf(json: unknown) {
  const r = validateRatingRequest(json);
  if (r.ok) throw new Error('expected validation errors');
  return r.errors;
}

describe('validateRatingRequest', () => {
  it('accepts a valid request, fills defaults and does not mutate its input', () => {
    const req = inventedRequest();
    const before = JSON.stringify(req);
    const r = validateRatingRequest(req);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.section.systemFactor).toBe(1);
    expect(r.value.section.foaming).toBe('moderate');
    expect(r.value.methods?.jetFlood).toBe('fair');
    expect(JSON.stringify(req)).toBe(before);
  });

  it('vapour density not below liquid density: names tray and field', () => {
    const req = inventedRequest();
    req.trays[1]!.vapourDensity_kg_m3 = 700;
    const [e] = errorsOf(req);
    expect(e!.path).toBe('/trays/1/vapourDensity_kg_m3');
    expect(e!.message).toMatch(/tray 12/);
    expect(e!.message).toMatch(/vapourDensity_kg_m3/);
  });

  it('negative flow: names tray and field', () => {
    const req = inventedRequest();
    req.trays[0]!.liquidMassFlow_kg_h = -5;
    const errors = errorsOf(req);
    expect(errors).toContainEqual({
      path: '/trays/0/liquidMassFlow_kg_h',
      message: 'tray 11, liquidMassFlow_kg_h: must be >= 0',
    });
  });

  it('areas that do not fit in the column, hole area above active area, weir height not below tray spacing', () => {
    const req = inventedRequest();
    req.section.activeArea_m2 = 9;
    req.section.holeArea_m2 = 9.5;
    req.section.traySpacing_mm = 250;
    req.section.weirHeight_mm = 260;
    const paths = errorsOf(req).map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['/section/activeArea_m2', '/section/holeArea_m2', '/section/weirHeight_mm']));
  });

  it('slot area: valve trays only, below the active area', () => {
    const req = inventedRequest();
    req.section.slotArea_m2 = 0.5;
    expect(validateRatingRequest(req).ok).toBe(true);
    req.section.slotArea_m2 = 6;
    expect(errorsOf(req).map((e) => e.path)).toContain('/section/slotArea_m2');
    const sieve = inventedRequest();
    sieve.section = { ...sieve.section, trayType: 'sieve', slotArea_m2: 0.5 };
    delete sieve.section.valves;
    expect(errorsOf(sieve)).toContainEqual(expect.objectContaining({ path: '/section/slotArea_m2' }));
  });

  it('moving valves need valve data; unknown fields and bad enums are rejected with the field named', () => {
    const req = inventedRequest();
    delete req.section.valves;
    expect(errorsOf(req).map((e) => e.path)).toContain('/section/valves');
    const extra = { ...inventedRequest(), colour: 'blue' };
    expect(errorsOf(extra)).toContainEqual({ path: '/colour', message: 'colour: is not an allowed field' });
    const bad = inventedRequest() as unknown as { section: { trayType: string } };
    bad.section.trayType = 'bubble-cap';
    expect(errorsOf(bad)[0]!.message).toMatch(/trayType: must be one of/);
  });

  it('duplicate tray numbers and missing fields are named', () => {
    const req = inventedRequest();
    req.trays[1]!.tray = 11;
    // the wording of the load grid, the loads API and the import (shared/trayLoadRules.ts)
    expect(errorsOf(req)[0]).toEqual({ path: '/trays/1/tray', message: 'tray 11, tray: tray 11 appears twice (also in row 1)' });
    const missing = inventedRequest() as unknown as { trays: Record<string, unknown>[] };
    delete missing.trays[0]!.surfaceTension_mN_m;
    expect(errorsOf(missing)).toContainEqual({
      path: '/trays/0/surfaceTension_mN_m',
      message: 'tray 11, surfaceTension_mN_m: is required',
    });
    expect(errorsOf(null)[0]!.path).toBe('/');
  });
});
