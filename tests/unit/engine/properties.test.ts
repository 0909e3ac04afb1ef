import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rateSection, rateTray, validateRatingRequest } from '../../../server/engine/index.js';
import type { PassLayout, RatingRequest, SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';

/** Physically consistent section geometry over the schema's valid space (all tray types). */
const sectionArb: fc.Arbitrary<SectionGeometry> = fc
  .record({
    trayType: fc.constantFrom('sieve' as const, 'fixed-valve' as const, 'moving-valve' as const),
    passes: fc.constantFrom(1 as const, 2 as const, 4 as const),
    d: fc.double({ min: 0.3, max: 12, noNaN: true }),
    ts: fc.double({ min: 150, max: 1200, noNaN: true }),
    fTop: fc.double({ min: 0.03, max: 0.3, noNaN: true }),
    fBottom: fc.double({ min: 0.3, max: 1, noNaN: true }),
    fActive: fc.double({ min: 0.5, max: 0.99, noNaN: true }),
    fHole: fc.double({ min: 0.01, max: 0.3, noNaN: true }),
    fWeir: fc.double({ min: 0.4, max: 0.98, noNaN: true }),
    fHw: fc.double({ min: 0, max: 0.4, noNaN: true }),
    fClear: fc.double({ min: 0.01, max: 0.5, noNaN: true }),
    dh: fc.double({ min: 1, max: 50, noNaN: true }),
    deck: fc.double({ min: 0, max: 8, noNaN: true }),
    sf: fc.double({ min: 0.3, max: 1.2, noNaN: true }),
    foaming: fc.constantFrom('low' as const, 'moderate' as const, 'high' as const, 'very-high' as const),
    shape: fc.constantFrom('flat' as const, 'venturi' as const),
    // pass layout (two and four passes): fractions of the room left, so that every panel has deck
    layout: fc.option(
      fc.record({
        fSide: fc.double({ min: 0.05, max: 0.4, noNaN: true }),
        fCentre: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
        fOff: fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        fPos: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        split: fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 4, maxLength: 4 }),
        equal: fc.boolean(),
        odd: fc.constantFrom('side' as const, 'inner' as const),
      }),
      { nil: undefined },
    ),
  })
  .map((g) => {
    const at = (Math.PI / 4) * g.d * g.d;
    const top = g.fTop * at;
    const bottom = g.fBottom * top;
    const active = g.fActive * (at - top - bottom);
    const hw = Math.min(300, g.fHw * g.ts);
    return {
      trayType: g.trayType,
      passes: g.passes,
      columnDiameter_m: g.d,
      traySpacing_mm: g.ts,
      activeArea_m2: active,
      downcomerTopArea_m2: top,
      downcomerBottomArea_m2: bottom,
      outletWeirLength_m: g.fWeir * g.passes * g.d,
      weirHeight_mm: hw,
      downcomerClearance_mm: Math.max(1, g.fClear * g.ts),
      holeArea_m2: Math.max(1e-6, g.fHole * active),
      holeDiameter_mm: g.dh,
      deckThickness_mm: g.deck,
      systemFactor: g.sf,
      foaming: g.foaming,
      valves: {
        count: 100,
        orificeDiameter_mm: 39,
        valveThickness_mm: 1.5,
        materialDensity_kg_m3: 8000,
        legFactor: 1.2,
        orificeShape: g.shape,
      },
      ...(g.layout && g.passes > 1 ? { passLayout: layoutOf(g.layout, g.passes as 2 | 4, g.d) } : {}),
    };
  });

function layoutOf(
  l: { fSide: number; fCentre: number; fOff: number; fPos: number; split: number[]; equal: boolean; odd: 'side' | 'inner' },
  passes: 2 | 4,
  d: number,
): PassLayout {
  const r = d * 500;
  const ws = l.fSide * r;
  const xc = l.fCentre * (r - ws);
  const out: PassLayout = { sideDowncomerWidth_mm: ws, centreDowncomerWidth_mm: 2 * xc, oddTrayOutlets: l.odd };
  if (passes === 4) {
    const span = r - ws - xc;
    const wo = l.fOff * span;
    out.offCentreDowncomerWidth_mm = wo;
    out.offCentreDowncomerOffset_mm = xc + wo / 2 + l.fPos * (span - wo);
  }
  if (!l.equal) {
    const parts = l.split.slice(0, passes);
    const sum = parts.reduce((a, b) => a + b, 0);
    out.liquidSplit = parts.map((x) => x / sum);
  }
  return out;
}

const flowArb = fc.oneof(
  fc.constant(0),
  fc.double({ min: 0, max: 1e6, noNaN: true }),
  fc.double({ min: 0, max: 1e8, noNaN: true }),
);

const loadArb: fc.Arbitrary<TrayLoad> = fc
  .record({
    v: flowArb,
    l: flowArb,
    rhoV: fc.double({ min: 0.001, max: 300, noNaN: true }),
    ratio: fc.double({ min: 1.05, max: 1000, noNaN: true }),
    sigma: fc.double({ min: 0.1, max: 100, noNaN: true }),
    p: fc.option(fc.double({ min: 1, max: 5000, noNaN: true }), { nil: undefined }),
  })
  .map((x) => {
    const rhoL = Math.min(3000, Math.max(50, x.rhoV * x.ratio));
    const rhoV = Math.min(x.rhoV, rhoL / 1.05);
    const t: TrayLoad = {
      tray: 1,
      vapourMassFlow_kg_h: x.v,
      liquidMassFlow_kg_h: x.l,
      vapourDensity_kg_m3: rhoV,
      liquidDensity_kg_m3: rhoL,
      surfaceTension_mN_m: x.sigma,
    };
    if (x.p !== undefined) t.pressure_kPa = x.p;
    return t;
  });

const methodArb = fc.constantFrom('fair' as const, 'kister-haas' as const);

function allNumbersFinite(x: unknown): boolean {
  if (typeof x === 'number') return Number.isFinite(x);
  if (Array.isArray(x)) return x.every(allNumbersFinite);
  if (x && typeof x === 'object') return Object.values(x).every(allNumbersFinite);
  return true;
}

const RUNS = { numRuns: 400 };

describe('property tests over the valid input space (fast-check)', () => {
  it('generated requests are valid requests', () => {
    fc.assert(
      fc.property(sectionArb, loadArb, (s, l) => {
        const v = validateRatingRequest({ section: s, trays: [l] });
        expect(v.ok ? [] : v.errors).toEqual([]);
      }),
      { numRuns: 200 },
    );
  });

  it('no NaN or Infinity anywhere in a result, including zero liquid and zero vapour', () => {
    fc.assert(
      fc.property(sectionArb, loadArb, methodArb, (s, l, m) => {
        const req: RatingRequest = {
          section: s,
          trays: [
            l,
            { ...l, tray: 2, vapourMassFlow_kg_h: 0 },
            { ...l, tray: 3, liquidMassFlow_kg_h: 0 },
            { ...l, tray: 4, vapourMassFlow_kg_h: 0, liquidMassFlow_kg_h: 0 },
          ],
          methods: { jetFlood: m },
        };
        expect(allNumbersFinite(rateSection(req))).toBe(true);
      }),
      RUNS,
    );
  });

  it('more vapour never lowers percent flood nor raises the weeping percent of limit', () => {
    fc.assert(
      fc.property(sectionArb, loadArb, methodArb, fc.double({ min: 1, max: 10, noNaN: true }), (s, l, m, k) => {
        const methods = { jetFlood: m };
        const a = rateTray(s, l, methods);
        const b = rateTray(s, { ...l, vapourMassFlow_kg_h: l.vapourMassFlow_kg_h * k + 1 }, methods);
        expect(b.checks.jetFlood.value).toBeGreaterThanOrEqual(a.checks.jetFlood.value * (1 - 1e-12));
        expect(b.checks.weeping.percentOfLimit).toBeLessThanOrEqual(a.checks.weeping.percentOfLimit * (1 + 1e-12) + 1e-12);
      }),
      RUNS,
    );
  });

  it('more liquid never lowers downcomer backup', () => {
    fc.assert(
      fc.property(sectionArb, loadArb, fc.double({ min: 1, max: 10, noNaN: true }), (s, l, k) => {
        const a = rateTray(s, l);
        const b = rateTray(s, { ...l, liquidMassFlow_kg_h: l.liquidMassFlow_kg_h * k + 1 });
        expect(b.checks.downcomerBackup.value).toBeGreaterThanOrEqual(a.checks.downcomerBackup.value * (1 - 1e-12));
      }),
      RUNS,
    );
  });

  it('status follows percent of limit (near at ≥ 90 %, over at ≥ 100 %); a check that does not apply is at 0 %', () => {
    fc.assert(
      fc.property(sectionArb, loadArb, (s, l) => {
        for (const c of Object.values(rateTray(s, l).checks)) {
          if (c.status === 'na') expect(c.percentOfLimit).toBe(0);
          else expect(c.status).toBe(c.percentOfLimit >= 100 ? 'over' : c.percentOfLimit >= 90 ? 'near' : 'ok');
        }
      }),
      { numRuns: 200 },
    );
  });
});
