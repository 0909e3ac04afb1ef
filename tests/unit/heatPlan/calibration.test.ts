import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { HeatPlanInput, SimulationCase, TrayPropertyDrift } from '../../../shared/types/heatPlan.js';
import {
  calibrateHeatPlan,
  calibratedLoadsAt,
  shiftPlanTraffic,
  trayRoles,
  validateHeatPlanInput,
  validateSimulationCases,
} from '../../../server/engine/heatPlan/index.js';

function example(): HeatPlanInput {
  const v = validateHeatPlanInput(JSON.parse(readFileSync('examples/heat-plan.json', 'utf8')));
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

/** The invented example with "true" zone latent heats and drift; cases made from it (net zone liquid). */
const TRUE_LAMBDA = [310, 255];
function truth(input: HeatPlanInput): { pas: HeatPlanInput['pumpArounds']; drift: TrayPropertyDrift[] } {
  const roles = trayRoles(input.trays, input.pumpArounds, 'top-down');
  const drift = input.trays
    .filter((_, k) => roles[k]!.dependsOn.length > 0)
    .map((t) => ({
      tray: t.tray,
      vapourDensity_kg_m3_per_kW: [2e-5, 1e-5],
      liquidDensity_kg_m3_per_kW: [-1e-3, 5e-4],
      surfaceTension_mN_m_per_kW: [1e-5, -2e-5],
      liquidViscosity_mPa_s_per_kW: [1e-6, 0],
    }));
  return { pas: input.pumpArounds.map((pa, i) => ({ ...pa, latentHeat_kJ_kg: TRUE_LAMBDA[i] })), drift };
}
function synthetic(input: HeatPlanInput, duties: number[], name: string, noise = 0): SimulationCase {
  const { pas, drift } = truth(input);
  const roles = trayRoles(input.trays, pas, 'top-down');
  const r = shiftPlanTraffic(input.trays, pas, duties, input.latentHeat_kJ_kg, 'top-down', drift);
  const trays = r.trays.map((t, k) => {
    const { rawLiquid_kg_h: raw, rawVapour_kg_h: _v, dry: _d, ...load } = t;
    const zone = roles[k]!.zone;
    const wobble = 1 + noise * Math.sin(7 * t.tray + duties[0]! / 100);
    load.liquidMassFlow_kg_h = (zone >= 0 ? raw - r.states[zone]!.circulation_kg_h : raw) * wobble;
    load.vapourMassFlow_kg_h *= wobble;
    return load;
  });
  return { name, duties_kW: duties, trays };
}

describe('calibration against simulation cases', () => {
  const input = example();
  const cases = [synthetic(input, [3500, 6400], 'A'), synthetic(input, [5500, 8000], 'B'), synthetic(input, [4400, 5000], 'C')];
  const cal = calibrateHeatPlan(input, cases);

  it('recovers the latent heat of each zone used to make the cases', () => {
    expect(cal.zones.map((z) => z.given_kJ_kg)).toEqual([285, 285]);
    expect(cal.zones[0]!.fitted_kJ_kg).toBeCloseTo(310, 6);
    expect(cal.zones[1]!.fitted_kJ_kg).toBeCloseTo(255, 6);
    expect(cal.fit.rmsResidual_kg_h).toBeLessThan(1e-6);
    expect(cal.fit.rSquared).toBeCloseTo(1, 9);
  });

  it('recovers the property drift and reproduces the cases tray by tray, ratings included', () => {
    const d = cal.drift.find((x) => x.tray === 5)!;
    expect(d.vapourDensity_kg_m3_per_kW[0]).toBeCloseTo(2e-5, 12);
    expect(d.liquidDensity_kg_m3_per_kW[1]).toBeCloseTo(5e-4, 10);
    expect(cal.drift.find((x) => x.tray === 12)!.surfaceTension_mN_m_per_kW[0]).toBe(0); // below the upper draw
    for (const c of cal.comparisons)
      for (const t of c.trays) {
        expect(t.modelVapour_kg_h).toBeCloseTo(t.simulatedVapour_kg_h, 5);
        expect(t.modelLiquid_kg_h).toBeCloseTo(t.simulatedLiquid_kg_h, 5);
      }
    expect(Math.abs(cal.fit.worstRating!.difference_percent)).toBeLessThan(1e-6);
    expect(validateHeatPlanInput(cal.calibratedInput).ok).toBe(true);
  });

  it('uses a case where the duties match, interpolates between bracketing cases, else the calibrated model', () => {
    const exact = calibratedLoadsAt(cal.calibratedInput, cases, [5500.2, 8000]);
    expect(exact.source).toBe('case');
    expect(exact.cases).toEqual(['B']);
    const mid = calibratedLoadsAt(cal.calibratedInput, cases, [4500, 7200]);
    expect(mid.source).toBe('interpolated');
    expect(mid.cases).toEqual(['A', 'B']);
    expect(mid.fraction).toBeCloseTo(0.5, 12);
    expect(mid.trays[3]!.vapourMassFlow_kg_h).toBeCloseTo(
      (cases[0]!.trays[3]!.vapourMassFlow_kg_h + cases[1]!.trays[3]!.vapourMassFlow_kg_h) / 2,
      6,
    );
    // an unseen duty pair: the calibrated model gives the synthetic truth
    const off = calibratedLoadsAt(cal.calibratedInput, cases, [6000, 4200]);
    expect(off.source).toBe('model');
    const want = synthetic(input, [6000, 4200], 'D');
    off.trays.forEach((t, i) => {
      expect(t.vapourMassFlow_kg_h).toBeCloseTo(want.trays[i]!.vapourMassFlow_kg_h, 5);
      expect(t.liquidMassFlow_kg_h).toBeCloseTo(want.trays[i]!.liquidMassFlow_kg_h, 5);
      expect(t.vapourDensity_kg_m3).toBeCloseTo(want.trays[i]!.vapourDensity_kg_m3, 9);
    });
  });

  it('with scattered cases the fit is close and its residuals say so', () => {
    const noisy = [
      synthetic(input, [3500, 6400], 'A', 0.01),
      synthetic(input, [5500, 8000], 'B', 0.01),
      synthetic(input, [4400, 5000], 'C', 0.01),
    ];
    const c = calibrateHeatPlan(input, noisy);
    expect(c.fit.rmsResidual_kg_h).toBeGreaterThan(10);
    expect(c.fit.rSquared!).toBeLessThan(1);
    expect(Math.abs(c.zones[0]!.fitted_kJ_kg! / 310 - 1)).toBeLessThan(0.25);
    expect(c.notes.join(' ')).toMatch(/RMS flow residual/);
  });

  it('a duty no case moves keeps its given latent heat, with a note', () => {
    const c = calibrateHeatPlan(input, [synthetic(input, [3500, 6400], 'A'), synthetic(input, [5500, 6400], 'B')]);
    expect(c.zones[0]!.fitted_kJ_kg).toBeCloseTo(310, 6);
    expect(c.zones[1]!.fitted_kJ_kg).toBeNull();
    expect(c.calibratedInput.pumpArounds[1]!.latentHeat_kJ_kg).toBeUndefined();
    expect(c.notes.join(' ')).toMatch(/do not vary its duty/);
  });

  it('refuses unusable cases, naming the field', () => {
    const one = validateSimulationCases(input, [cases[0]]);
    expect(one).toEqual({ ok: false, errors: [{ path: '/cases', message: 'cases: at least two simulation cases are needed' }] });
    const broken = structuredClone(cases);
    broken[1]!.trays.splice(4, 1);
    broken[0]!.duties_kW = [3500];
    const r = validateSimulationCases(input, broken);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toContainEqual({ path: '/cases/1/trays', message: 'trays: case 2 has no load for tray 5 of the base case' });
    expect(r.errors).toContainEqual(expect.objectContaining({ path: '/cases/0/duties_kW' }));
    const still = structuredClone(cases).map((c) => ({ ...c, duties_kW: [4400, 6400] }));
    expect(validateSimulationCases(input, still)).toEqual({
      ok: false,
      errors: [{ path: '/cases', message: 'cases: no case moves a pump-around duty from its base value: nothing to fit' }],
    });
    expect(validateSimulationCases(input, cases).ok).toBe(true);
  });
});
