/**
 * Jet-flood edges: Fair beyond the chart's F_LV 1, the high-pressure derating warning, Kister & Haas and
 * surface tension, range warnings of Fair's σ correction, vapour/liquid density ratio and apron loss,
 * and the valve-tray fractional open area (slot area, Perry's 8th ed. definition).
 */
import { describe, expect, it } from 'vitest';
import {
  fairFloodCapacityLygerosMagoulas,
  fairHoleAreaCorrection,
  fairSurfaceTensionCorrection,
  transitionClearLiquidHeightKisterHaas,
} from '../../../server/engine/flooding.js';
import { rateTray } from '../../../server/engine/index.js';
import type { SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';
import { inventedRequest, rel, seader748Bottom, seaderTray } from './fixtures.js';

const codes = (w: { code: string }[]) => w.map((x) => x.code);

describe('Fair beyond the chart edge F_LV = 1 (Perry 8th ed. eq. 14-90, Lygeros & Magoulas)', () => {
  // Seader & Henley 7.48 geometry with much more liquid: F_LV ≈ 1.6
  const heavy: TrayLoad = { ...seader748Bottom, liquidMassFlow_kg_h: seader748Bottom.liquidMassFlow_kg_h * 34 };
  const t = rateTray(seaderTray, heavy);
  it('follows the printed fit beyond F_LV 1 (lower capacity than the edge value: conservative)', () => {
    expect(t.details.flowParameter).toBeGreaterThan(1.2);
    const f = t.details.flowParameter;
    // C_sbf = 0.0105 + 8.127e-4 TS^0.755 exp(−1.463 F_LV^0.842), Perry 8th eq. (14-90), at the tray's own F_LV
    const printed = 0.0105 + 8.127e-4 * Math.pow(609.6, 0.755) * Math.exp(-1.463 * Math.pow(f, 0.842));
    const sigma = fairSurfaceTensionCorrection(heavy.surfaceTension_mN_m);
    expect(Math.abs(rel(t.details.floodCapacityFactor_m_s!, printed * fairHoleAreaCorrection(0.1) * sigma))).toBeLessThan(1e-9);
    // the chart-edge value it used to be held at is higher (non-conservative), here by more than 10 %
    expect(fairFloodCapacityLygerosMagoulas(1, 609.6)).toBeGreaterThan(1.1 * printed);
    // at F_LV 2 the edge value is 28 % above the fit's trend (TS 610 mm; derived from eq. 14-90)
    expect(rel(fairFloodCapacityLygerosMagoulas(1, 609.6), fairFloodCapacityLygerosMagoulas(2, 609.6))).toBeGreaterThan(0.25);
  });
  it('warns, saying the fit was extrapolated on the conservative side', () => {
    const w = t.warnings.find((x) => x.code === 'range:fairFloodCapacityLygerosMagoulas:flowParameter');
    expect(w?.message).toMatch(/extrapolated along the fit's trend/);
    expect(w?.message).toMatch(/conservative/);
  });
});

describe('high-pressure derating warning (Kister 1992 Table 6.7 and §6.5)', () => {
  // invented high-pressure tray: ρV 45 kg/m³ (> 28.8), low surface tension as at high pressure
  const req = inventedRequest();
  const hp: TrayLoad = { ...req.trays[0]!, vapourDensity_kg_m3: 45, liquidDensity_kg_m3: 480, surfaceTension_mN_m: 4 };
  it("is not given with Fair's correlation when its (σ/20)^0.2 term already derates (σ < 20 mN/m)", () => {
    // Kister 1992 §6.5 applied no derating with Fair because the σ term already derates high-pressure systems
    expect(codes(rateTray(req.section, hp).warnings)).not.toContain('system-factor-high-pressure');
  });
  it('is given with Kister & Haas, and with Fair when σ ≥ 20 mN/m', () => {
    expect(codes(rateTray(req.section, hp, { jetFlood: 'kister-haas' }).warnings)).toContain('system-factor-high-pressure');
    expect(codes(rateTray(req.section, { ...hp, surfaceTension_mN_m: 22 }).warnings)).toContain('system-factor-high-pressure');
    expect(codes(rateTray({ ...req.section, systemFactor: 0.9 }, { ...hp, surfaceTension_mN_m: 22 }).warnings)).not.toContain(
      'system-factor-high-pressure',
    );
  });
});

describe('range warnings that were missing', () => {
  it("Fair's σ correction outside 5–80 mN/m, vapour density approaching liquid density, fast apron underflow", () => {
    const t = rateTray(seaderTray, seader748Bottom);
    expect(codes(t.warnings)).not.toContain('range:fairSurfaceTensionCorrection:surfaceTension_mN_m');
    const hiSigma = rateTray(seaderTray, { ...seader748Bottom, surfaceTension_mN_m: 95 });
    expect(codes(hiSigma.warnings)).toContain('range:fairSurfaceTensionCorrection:surfaceTension_mN_m');
    // the value is still the printed power law, not capped
    expect(hiSigma.details.floodCapacityFactor_m_s! / t.details.floodCapacityFactor_m_s!).toBeCloseTo(Math.pow(95 / 58, 0.2), 9);
    const dense = rateTray(seaderTray, { ...seader748Bottom, vapourDensity_kg_m3: 0.2 * seader748Bottom.liquidDensity_kg_m3 });
    expect(codes(dense.warnings)).toContain('range:floodVelocitySoudersBrown:vapourToLiquidDensityRatio');
    const apron = rateTray({ ...seaderTray, downcomerClearance_mm: 8 }, seader748Bottom);
    expect(codes(apron.warnings)).toContain('range:apronHeadLoss:underflowVelocity_m_s');
    expect(codes(t.warnings)).not.toContain('range:apronHeadLoss:underflowVelocity_m_s');
  });
  it('Kister & Haas warns above 25 mN/m and rates with the surface tension given', () => {
    const kh = rateTray(seaderTray, seader748Bottom, { jetFlood: 'kister-haas' });
    expect(codes(kh.warnings)).toContain('kister-haas-surface-tension');
    const low = rateTray(seaderTray, { ...seader748Bottom, surfaceTension_mN_m: 20 }, { jetFlood: 'kister-haas' });
    expect(codes(low.warnings)).not.toContain('kister-haas-surface-tension');
    // σ enters as σ^0.125 (Perry 8th eq. 14-81): not capped at 25
    expect(kh.details.floodCapacityFactor_m_s! / low.details.floodCapacityFactor_m_s!).toBeCloseTo(Math.pow(58 / 20, 0.125), 9);
  });
});

describe("valve trays: fractional open area A_f = slot area / bubbling area (Perry's 8th ed. Sec. 14 definition)", () => {
  const base = inventedRequest();
  const load = base.trays[0]!;
  // invented valve tray, orifice area 0.78 m² on 5.9 m² (0.132); slot (curtain) area 0.472 m² (0.08)
  const slotted: SectionGeometry = { ...base.section, slotArea_m2: 0.08 * base.section.activeArea_m2 };
  it("Fair's hole-area correction reads the Ludwig table at the slot ratio: 0.90 at 0.08 (Ludwig Vol. 2 3rd ed. p. 189)", () => {
    const withSlot = rateTray(slotted, load);
    const orifice = rateTray(base.section, load);
    expect(withSlot.details.floodCapacityFactor_m_s! / orifice.details.floodCapacityFactor_m_s!).toBeCloseTo(0.9, 9);
    expect(codes(orifice.warnings)).toContain('valve-slot-area-missing');
    expect(codes(withSlot.warnings)).not.toContain('valve-slot-area-missing');
    expect(codes(rateTray(seaderTray, seader748Bottom).warnings)).not.toContain('valve-slot-area-missing');
  });
  it('Kister & Haas h_ct uses the slot ratio', () => {
    const a = rateTray(slotted, load, { jetFlood: 'kister-haas' });
    const b = rateTray({ ...slotted, slotArea_m2: 0.12 * base.section.activeArea_m2 }, load, { jetFlood: 'kister-haas' });
    const q = load.liquidMassFlow_kg_h / load.liquidDensity_kg_m3 / base.section.outletWeirLength_m;
    const h = (af: number) => transitionClearLiquidHeightKisterHaas(39, af, q, load.liquidDensity_kg_m3);
    // C_SB ∝ h_ct^−0.5 (Perry 8th eq. 14-81)
    expect(a.details.floodCapacityFactor_m_s! / b.details.floodCapacityFactor_m_s!).toBeCloseTo(Math.sqrt(h(0.12) / h(0.08)), 9);
  });
  it('the dry head and the weep point stay on the orifice area (Klein: hole velocity through the deck orifices)', () => {
    const withSlot = rateTray(slotted, load);
    const orifice = rateTray(base.section, load);
    expect(withSlot.details.dryPressureDrop_mm).toBe(orifice.details.dryPressureDrop_mm);
    expect(withSlot.details.weepPointHoleVelocity_m_s).toBe(orifice.details.weepPointHoleVelocity_m_s);
  });
});

describe('no silent cap on the entrained liquid', () => {
  it('warns when the fractional entrainment is past 0.999 and the entrained rate is computed at 0.999', () => {
    // Seader & Henley (1998) definition e = ψ L/(1 − ψ): unbounded as ψ → 1; far beyond flood the fit passes 0.999
    const t = rateTray(seaderTray, { ...seader748Bottom, vapourMassFlow_kg_h: seader748Bottom.vapourMassFlow_kg_h * 4 });
    expect(t.details.entrainmentFraction).toBeGreaterThan(0.999);
    expect(codes(t.warnings)).toContain('range:entrainedLiquidRate:psi');
    expect(t.details.entrainedLiquid_kg_h).toBeCloseTo((0.999 * seader748Bottom.liquidMassFlow_kg_h) / 0.001, 3);
    expect(codes(rateTray(seaderTray, seader748Bottom).warnings)).not.toContain('range:entrainedLiquidRate:psi');
  });
});
