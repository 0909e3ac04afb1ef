/**
 * Valve-tray wet pressure drop: h_t = h_d + β h_ds (Perry's 8th ed. eqs. 14-100 and 14-106; Ludwig, Applied
 * Process Design Vol. 2 3rd ed. eq. 8-318 after Klein 1982), h_ds = h_w + h_ow, β = (1 + φ)/2 with the
 * Bennett et al. froth density. Printed values checked: Seader & Henley (1998) solution 7.48 (φ_e), Ludwig
 * Example 8-41 (hole velocity 4.40 ft/s, crest form 0.48 (Q/L_w)^(2/3) in). Ludwig's printed total for that
 * example is not checked here: its β is read from a chart (Fig. 8-150) whose reading we do not have.
 */
import { describe, expect, it } from 'vitest';
import { aeratedLiquidHeadFair, aerationFactorFrothDensity, bubblingFFactor } from '../../../server/engine/aeration.js';
import { crestOverWeirFrancis } from '../../../server/engine/weir.js';
import { rateTray } from '../../../server/engine/rateTray.js';
import { M2_PER_FT2, M3_S_PER_USGPM } from '../../../shared/units.js';
import type { SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';
import { FT_S, IN, LB_FT3, inventedRequest, rel } from './fixtures.js';

const codes = (w: { code: string }[]): string[] => w.map((x) => x.code);

describe('aeration factor β = (1 + φ)/2', () => {
  it('uses the froth density printed in Seader & Henley (1998) solution 7.48, bottom tray', () => {
    // printed: U_a 7.5 ft/s, ρV 0.0408, ρL 59.5 lb/ft³ → K_s 0.196 ft/s, φ_e 0.381; β = (1 + 0.381)/2 = 0.6905 (derived)
    const beta = aerationFactorFrothDensity(7.5 * FT_S, 0.0408 * LB_FT3, 59.5 * LB_FT3);
    expect(Math.abs(rel(beta, (1 + 0.381) / 2))).toBeLessThan(0.005);
  });
  it('is 1 with no vapour and falls towards 0.5 as the vapour load rises (Hutchinson relation bounds)', () => {
    expect(aerationFactorFrothDensity(0, 3, 700)).toBe(1);
    let last = 1;
    for (const u of [0.2, 0.5, 1, 2, 4, 8]) {
      const b = aerationFactorFrothDensity(u, 3, 700);
      expect(b).toBeLessThan(last);
      expect(b).toBeGreaterThan(0.5);
      last = b;
    }
  });
  it('aerated liquid head is β (h_w + h_ow) (Perry 8th ed. eq. 14-106, gradient neglected)', () => {
    expect(aeratedLiquidHeadFair(0.69, 50.8, 20)).toBeCloseTo(0.69 * 70.8, 9);
  });
});

describe('Francis crest in Ludwig Vol. 2 3rd ed. form', () => {
  it('matches h_ow = 0.48 (Q/L_w)^(2/3) in (Q gpm, L_w in) for Example 8-41 (205 gpm, 55 in), F_w = 1', () => {
    const crest = crestOverWeirFrancis(205 * M3_S_PER_USGPM, (55 * IN) / 1000);
    // 0.48 × (205/55)^(2/3) = 1.154 in (computed from the printed form)
    expect(Math.abs(rel(crest / IN, 0.48 * Math.pow(205 / 55, 2 / 3)))).toBeLessThan(0.005);
  });
});

describe('moving-valve tray rated with the aerated liquid head', () => {
  // Ludwig Example 8-41 (venturi valves, 16 gauge, four legs R_vw 1.45, C_vw 1.3, ρ_M 490, ρV 1.91, ρL 31.0 lb/ft³,
  // G 50,000 lb/h, Q 205 gpm, h_w 3 in, L_w 55 in, hole area 1.65 ft² in the printed velocity); the active area,
  // column and downcomer sizes are invented (not printed in the part of the example we have).
  const section: SectionGeometry = {
    trayType: 'moving-valve',
    passes: 1,
    columnDiameter_m: 1.68,
    traySpacing_mm: 610,
    activeArea_m2: 12 * M2_PER_FT2,
    downcomerTopArea_m2: 0.2,
    downcomerBottomArea_m2: 0.2,
    outletWeirLength_m: (55 * IN) / 1000,
    weirHeight_mm: 3 * IN,
    downcomerClearance_mm: 50,
    holeArea_m2: 1.65 * M2_PER_FT2,
    holeDiameter_mm: 39,
    deckThickness_mm: 2.64,
    valves: {
      count: 128,
      orificeDiameter_mm: 39,
      valveThickness_mm: 0.06 * IN,
      materialDensity_kg_m3: 490 * LB_FT3,
      legFactor: 1.45,
      orificeShape: 'venturi',
    },
    slotArea_m2: 0.2,
  };
  const rhoL = 31.0 * LB_FT3;
  const load: TrayLoad = {
    tray: 1,
    vapourMassFlow_kg_h: 50000 * 0.45359237,
    liquidMassFlow_kg_h: 205 * M3_S_PER_USGPM * 3600 * rhoL,
    vapourDensity_kg_m3: 1.91 * LB_FT3,
    liquidDensity_kg_m3: rhoL,
    surfaceTension_mN_m: 8,
  };

  it('total head = Klein dry head + β (h_w + h_ow), no residual head, no Bennett warning', () => {
    const t = rateTray(section, load);
    const d = t.details;
    // printed actual hole velocity 4.40 ft/s
    expect(Math.abs(rel(d.holeVelocity_m_s / FT_S, 4.4))).toBeLessThan(0.01);
    // partly-open branch: C_vw R_vw t_v ρ_M/ρL = 1.788 in (computed from the printed inputs)
    expect(Math.abs(rel(d.dryPressureDrop_mm / IN, 1.788))).toBeLessThan(0.002);
    const beta = aerationFactorFrothDensity(d.bubblingAreaVelocity_m_s!, load.vapourDensity_kg_m3, rhoL);
    expect(d.aerationFactor).toBeCloseTo(beta, 12);
    expect(beta).toBeGreaterThan(0.5);
    expect(beta).toBeLessThan(1);
    expect(d.clearLiquidHeight_mm).toBeCloseTo(beta * (3 * IN + d.crestOverWeir_mm), 9);
    expect(d.residualHead_mm).toBe(0);
    expect(d.totalHead_mm).toBeCloseTo(d.dryPressureDrop_mm + d.clearLiquidHeight_mm, 9);
    expect(d.totalPressureDrop_Pa).toBeCloseTo((d.totalHead_mm! / 1000) * rhoL * 9.81, 6);
    expect(codes(t.warnings).filter((c) => c.includes('Bennett'))).toEqual([]);
    expect(t.checks.pressureDrop.method).toBe('dryTrayHeadKleinValve');
  });

  it("warns past the F-factor span of Fair's aeration chart (2.5 (ft/s)(lb/ft³)^0.5) and still reports the value", () => {
    const fast = { ...load, vapourMassFlow_kg_h: load.vapourMassFlow_kg_h * 5 };
    const t = rateTray(section, fast);
    const f = bubblingFFactor(t.details.bubblingAreaVelocity_m_s!, fast.vapourDensity_kg_m3);
    expect(f).toBeGreaterThan(2.5 * 0.3048 * Math.sqrt(16.0185));
    expect(codes(t.warnings)).toContain('range:aerationFactorFrothDensity:fFactorBubbling_Pa05');
    expect(t.details.clearLiquidHeight_mm).toBeGreaterThan(0);
    const slow = rateTray(section, load);
    expect(codes(slow.warnings)).not.toContain('range:aerationFactorFrothDensity:fFactorBubbling_Pa05');
  });

  it('a dry valve tray has no liquid head', () => {
    const t = rateTray(section, { ...load, liquidMassFlow_kg_h: 0 });
    expect(t.details.clearLiquidHeight_mm).toBe(0);
    expect(t.details.totalHead_mm).toBeCloseTo(t.details.dryPressureDrop_mm, 12);
  });
});

describe('Francis crest range as data (crest 6–67.2 mm)', () => {
  const req = inventedRequest();
  const section: SectionGeometry = { ...req.section, passes: 1 };
  const low = { ...req.trays[0]!, liquidMassFlow_kg_h: 3000 };
  it('stores the range in the metadata', () => {
    expect(crestOverWeirFrancis.meta.ranges.crest_mm).toEqual([6, 67.2]);
  });
  it('at the default limits the low-crest warning covers a low crest (no second warning)', () => {
    const t = rateTray(section, low);
    expect(t.details.crestOverWeir_mm).toBeLessThan(6);
    expect(codes(t.warnings)).toContain('low-crest');
    expect(codes(t.warnings)).not.toContain('range:crestOverWeirFrancis:crest_mm');
  });
  it('with the crest limit relaxed below the range, the range warning says so and the crest is not capped', () => {
    const t = rateTray(section, low, { limits: { liquidLoad: 2 } });
    expect(codes(t.warnings)).not.toContain('low-crest');
    expect(codes(t.warnings)).toContain('range:crestOverWeirFrancis:crest_mm');
    expect(t.details.crestOverWeir_mm).toBeCloseTo(crestOverWeirFrancis(3000 / 3600 / low.liquidDensity_kg_m3, 4.6), 9);
  });
  it('with the weir-loading limit relaxed, a crest above 67.2 mm is warned', () => {
    const high = { ...req.trays[0]!, liquidMassFlow_kg_h: 900000 };
    const t = rateTray(section, high, { limits: { weirLoading: 1000 } });
    expect(t.details.crestOverWeir_mm).toBeGreaterThan(67.2);
    expect(codes(t.warnings)).toContain('range:crestOverWeirFrancis:crest_mm');
  });
});

describe('aeration factor: its uncertainty stated once, in the methods list (issue 13)', () => {
  it('says the chart is not read, how β is computed and what it affects, in plain words', () => {
    const u = aerationFactorFrothDensity.meta.uncertainty ?? '';
    // no reading of Perry's 8th ed. Fig. 14-37 is at hand: the method must say so rather than claim a chart fit
    expect(u).toMatch(/chart is not read/);
    expect(u).toMatch(/\(1 \+ phi\)\/2/);
    expect(u).toMatch(/approximate/);
    expect(u).not.toMatch(/from memory|to confirm|recalled|\.md\b/i);
    expect(aerationFactorFrothDensity.meta.source).not.toMatch(/fitted to/i);
  });
  it('is not repeated as a warning on the trays of a valve-tray rating', () => {
    const req = inventedRequest();
    const t = rateTray(req.section, req.trays[0]!);
    expect(t.warnings.filter((w) => /aeration factor/i.test(w.message) && !w.code.startsWith('range:'))).toEqual([]);
  });
});
