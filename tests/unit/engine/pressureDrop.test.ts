import { describe, expect, it } from 'vitest';
import kTable from '../../../reference-tables/klein-valve-k.json' with { type: 'json' };
import {
  bennettEffectiveDensity,
  clearLiquidHeightBennett,
  dryTrayHeadKleinValve,
  dryTrayHeadOrifice,
  headToPascal,
  kleinBalanceHead,
  kleinClosedValveK,
  kleinOpenValveK,
  orificeCoefficientHughmarkOConnell,
  residualHeadBennett,
} from '../../../server/engine/pressureDrop.js';
import { rateTray } from '../../../server/engine/index.js';
import { IN, LB_FT3, inventedRequest, rel, seader748Bottom, seader749Top, seaderTray } from './fixtures.js';

const FT = 0.3048;

describe("orifice coefficient, Hughmark & O'Connell fit (from memory)", () => {
  it('matches chart readings', () => {
    // Sinnott C&R Vol. 6 Fig. 11.34 reading in Ex. 11.11 (from memory): A_h/A_p 0.10, t/d 1.0 → C_0 0.84
    expect(Math.abs(rel(orificeCoefficientHughmarkOConnell(0.1, 1.0), 0.84))).toBeLessThan(0.01);
    // Seader & Henley (1998) use C_o 0.73 for 3/16-in holes (seen); chart tolerance ±5 % at A_h/A_a 0.14, t/d 0.42
    expect(Math.abs(rel(orificeCoefficientHughmarkOConnell(0.14, 0.42), 0.73))).toBeLessThan(0.05);
  });
});

describe('dry-tray head of a sieve deck', () => {
  it('reproduces Seader & Henley (1998) solutions 7.48 and 7.49', () => {
    // 7.48 bottom tray: u_o 75.0 ft/s, C_o 0.73, ρV 0.0408, ρL 59.5 lb/ft³ → h_d = 1.35 in
    expect(Math.abs(rel(dryTrayHeadOrifice(75 * FT, 0.73, 0.0408, 59.5) / IN, 1.35))).toBeLessThan(0.01);
    // 7.49 top tray: u_o 105 ft/s, ρV 0.0703, ρL 47.2 lb/ft³ → h_d = 5.73 in
    expect(Math.abs(rel(dryTrayHeadOrifice(105 * FT, 0.73, 0.0703, 47.2) / IN, 5.73))).toBeLessThan(0.01);
    // Sinnott C&R Vol. 6 Ex. 11.11 (from memory): u_h 19.08 m/s, C_0 0.84, ρV 0.72, ρL 954 → "20 mm" (19.9 computed)
    expect(Math.abs(dryTrayHeadOrifice(19.08, 0.84, 0.72, 954) - 20)).toBeLessThan(0.5);
  });
});

describe('Bennett clear liquid height and residual head', () => {
  it('reproduces Seader & Henley (1998) solution 7.48, bottom tray', () => {
    const rhoV = 0.0408 * LB_FT3,
      rhoL = 59.5 * LB_FT3;
    // K_s = 0.196 ft/s → φ_e = 0.381 (solution)
    expect(Math.abs(rel(bennettEffectiveDensity(0.196 * FT), 0.381))).toBeLessThan(0.01);
    // U_a 7.5 ft/s, h_w 2 in, q 97.9 gpm, L_w 42.5 in → h_L = 1.22 in
    const hL = clearLiquidHeightBennett(7.5 * FT, rhoV, rhoL, 2 * IN, 97.9 * 6.30902e-5, (42.5 * IN) / 1000);
    expect(Math.abs(rel(hL / IN, 1.22))).toBeLessThan(0.01);
    // σ 58 mN/m, ρL 954 kg/m³, d_H 3/16 in → h_σ = 0.31 in
    expect(Math.abs(rel(residualHeadBennett(58, 954, 4.7625) / IN, 0.31))).toBeLessThan(0.01);
  });
  it('reproduces Seader & Henley (1998) solution 7.49, top tray', () => {
    // U_a 10.4 ft/s, ρV 0.0703, ρL 47.2 lb/ft³, 77.2 gpm → h_L = 0.61 in (printed to 2 figures: ±2 %)
    const hL = clearLiquidHeightBennett(10.4 * FT, 0.0703 * LB_FT3, 47.2 * LB_FT3, 2 * IN, 77.2 * 6.30902e-5, (42.5 * IN) / 1000);
    expect(Math.abs(rel(hL / IN, 0.61))).toBeLessThan(0.02);
    // σ 20 mN/m, ρL 756 → h_σ = 0.13 in (printed to 2 figures: ±0.005 in)
    expect(Math.abs(residualHeadBennett(20, 756, 4.7625) / IN - 0.13)).toBeLessThan(0.005);
  });
  it('totals Seader & Henley 7.48 bottom: h_t = 2.88 in, 0.098 psi', () => {
    const ht =
      dryTrayHeadOrifice(75 * FT, 0.73, 0.0408, 59.5) +
      clearLiquidHeightBennett(7.5 * FT, 0.0408 * LB_FT3, 59.5 * LB_FT3, 2 * IN, 97.9 * 6.30902e-5, (42.5 * IN) / 1000) +
      residualHeadBennett(58, 954, 4.7625);
    expect(Math.abs(rel(ht / IN, 2.88))).toBeLessThan(0.01);
    expect(Math.abs(rel(headToPascal(ht, 954) / 6894.76, 0.098))).toBeLessThan(0.015);
  });
});

describe('Klein moving-valve dry pressure drop', () => {
  it('K values equal the Ludwig Table 8-23 English values × 273.4 (s²·in/ft² → s²·mm/m²)', () => {
    // Ludwig, Applied Process Design Vol. 2 3rd ed. Table 8-23 (from Klein 1982)
    // (the eddy loss coefficient row is dimensionless, the same in both unit systems)
    for (const r of kTable.filter((x) => x.coefficient !== 'eddy'))
      expect(Math.abs(rel(r.K_si, (r.K_english * 25.4) / 0.3048 ** 2))).toBeLessThan(0.005);
    expect(kleinClosedValveK('flat')).toBe(1682);
    expect(kleinClosedValveK('venturi')).toBe(841);
    expect(kleinOpenValveK('flat', 2.64)).toBe(254);
    expect(kleinOpenValveK('flat', 3.02)).toBeCloseTo(239, 0);
    expect(kleinOpenValveK('venturi', 2)).toBe(122);
  });
  it('has closed, balance and open branches, continuous (reference sheet §5.6 example, derived)', () => {
    // The reference sheet's 21.4 mm example omits Klein's eddy loss coefficient; with C_vw = 1.3
    // (Ludwig Vol. 2 3rd ed. Example 8-41) the partly-open head is 1.3 × 21.4 = 27.9 mm (derived).
    const bal = kleinBalanceHead(1.25, 1.5, 8000, 700, 1.3);
    expect(Math.abs(rel(bal, 1.3 * 21.43))).toBeLessThan(0.01);
    const h = (u: number) => dryTrayHeadKleinValve(u, 3, 700, 1682, 254, bal);
    expect(h(1)).toBeCloseTo((1682 * 3) / 700, 6);
    expect(h(3)).toBeCloseTo(bal, 6);
    expect(h(6)).toBeCloseTo((254 * 3 * 36) / 700, 6);
    // balance points 1.72 × 1.3^0.5 = 1.965 m/s and 4.43 × 1.3^0.5 = 5.047 m/s (derived)
    expect(Math.abs(h(1.9646) - h(1.9644))).toBeLessThan(0.05);
    expect(Math.abs(h(5.0473) - h(5.0471))).toBeLessThan(0.05);
  });
});

describe('Bennett validity: froth regime, sieve trays (Kister, Distillation Design 1992 Ch. 6)', () => {
  const codes = (w: { code: string }[]) => w.map((x) => x.code);
  it('no range warning on the printed froth-regime cases (Seader & Henley 1998, 7.48 bottom and 7.49 top)', () => {
    for (const load of [seader748Bottom, seader749Top]) {
      const t = rateTray(seaderTray, load);
      expect(codes(t.warnings)).not.toContain('range:clearLiquidHeightBennett:transitionOverClearLiquid');
      expect(codes(t.warnings)).not.toContain('range:clearLiquidHeightBennett:trayType');
    }
  });
  it('warns in the spray regime (clear liquid below the Kister & Haas transition height) and where a valve tray relies on it', () => {
    // same tray, a tenth of the liquid and 1.6 × the vapour: clear liquid falls below h_ct
    const spray = rateTray(seaderTray, {
      ...seader749Top,
      liquidMassFlow_kg_h: seader749Top.liquidMassFlow_kg_h / 10,
      vapourMassFlow_kg_h: seader749Top.vapourMassFlow_kg_h * 1.6,
    });
    expect(codes(spray.warnings)).toContain('range:clearLiquidHeightBennett:transitionOverClearLiquid');
    expect(spray.details.clearLiquidHeight_mm).toBeGreaterThan(0); // the value is still reported
    // tray types as data: moving valves no longer use Bennett (aerated liquid head instead); the Fair weep
    // criterion of fixed valves still compares with Bennett's clear liquid, and the section says so
    expect(clearLiquidHeightBennett.meta.trayTypes).toEqual(['sieve']);
    const valve = inventedRequest();
    const moving = codes(rateTray(valve.section, valve.trays[0]!).warnings);
    expect(moving.filter((c) => c.includes('Bennett'))).toEqual([]);
    const fixed = codes(rateTray({ ...valve.section, trayType: 'fixed-valve' }, valve.trays[0]!).warnings);
    expect(fixed).toContain('range:clearLiquidHeightBennett:trayType');
  });
});
