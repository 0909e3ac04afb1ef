/**
 * Loads at any duties on a calibrated plan: a simulated case where the duties match one (within
 * DUTY_MATCH_KW on every pump-around), a straight-line interpolation between two cases whose duties
 * bracket them on the segment joining the two (the closest such pair), otherwise the calibrated model.
 * Loads are given in the load case's convention: net liquid on the pump-around zone trays (no circulation).
 */
import type { CalibratedLoads, HeatPlanInput, SimulationCase } from '../../../shared/types/heatPlan.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import { caseName, DUTY_MATCH_KW } from './calibration.js';
import { planModel } from './model.js';
import { shiftPlanTraffic } from './traffic.js';

const FIELDS = [
  'vapourMassFlow_kg_h',
  'liquidMassFlow_kg_h',
  'vapourDensity_kg_m3',
  'liquidDensity_kg_m3',
  'surfaceTension_mN_m',
  'liquidViscosity_mPa_s',
  'temperature_C',
  'pressure_kPa',
] as const;

const gap = (a: readonly number[], b: readonly number[]): number => Math.max(...a.map((x, i) => Math.abs(x - b[i]!)));

/** Tray by tray a + f·(b − a) over every numeric field both have. */
export function interpolateLoads(a: readonly TrayLoad[], b: readonly TrayLoad[], f: number): TrayLoad[] {
  const byTray = new Map(b.map((t) => [t.tray, t]));
  return a.map((ta) => {
    const tb = byTray.get(ta.tray)!;
    const out: TrayLoad = { ...ta };
    for (const key of FIELDS) {
      const x = ta[key];
      const y = tb[key];
      if (x !== undefined && y !== undefined) out[key] = x + f * (y - x);
      else delete out[key];
    }
    return out;
  });
}

/**
 * The simulated loads at some duties, or null where no case gives them: a case whose duties match (within
 * DUTY_MATCH_KW on every pump-around), else the straight-line interpolation between the two closest cases
 * whose segment passes through the duties (within DUTY_MATCH_KW). Trays as in the cases (net zone liquid).
 */
export function simulatedLoadsAt(cases: readonly SimulationCase[], duties_kW: readonly number[]): CalibratedLoads | null {
  const matched = cases.findIndex((c) => gap(c.duties_kW, duties_kW) <= DUTY_MATCH_KW);
  if (matched >= 0)
    return {
      source: 'case',
      cases: [caseName(cases[matched]!, matched)],
      fraction: null,
      trays: cases[matched]!.trays.map((t) => ({ ...t })),
    };
  let best: { a: number; b: number; f: number; span: number } | null = null;
  cases.forEach((ca, a) =>
    cases.forEach((cb, b) => {
      if (b <= a) return;
      const d = cb.duties_kW.map((q, i) => q - ca.duties_kW[i]!);
      const dd = d.reduce((s, x) => s + x * x, 0);
      if (dd === 0) return;
      const f = d.reduce((s, x, i) => s + x * (duties_kW[i]! - ca.duties_kW[i]!), 0) / dd;
      if (f < 0 || f > 1) return;
      if (
        gap(
          ca.duties_kW.map((q, i) => q + f * d[i]!),
          duties_kW,
        ) > DUTY_MATCH_KW
      )
        return;
      if (!best || dd < best.span) best = { a, b, f, span: dd };
    }),
  );
  if (!best) return null;
  const { a, b, f } = best;
  return {
    source: 'interpolated',
    cases: [caseName(cases[a]!, a), caseName(cases[b]!, b)],
    fraction: f,
    trays: interpolateLoads(cases[a]!.trays, cases[b]!.trays, f),
  };
}

/**
 * @param calibrated the calibrated plan input (CalibrationResult.calibratedInput)
 * @param cases the simulation cases it was fitted to
 */
export function calibratedLoadsAt(
  calibrated: HeatPlanInput,
  cases: readonly SimulationCase[],
  duties_kW: readonly number[],
): CalibratedLoads {
  const simulated = simulatedLoadsAt(cases, duties_kW);
  if (simulated) return simulated;
  const m = planModel(calibrated);
  const model = shiftPlanTraffic(
    calibrated.trays,
    calibrated.pumpArounds,
    duties_kW,
    calibrated.latentHeat_kJ_kg,
    m.numbering,
    calibrated.propertyDrift,
  );
  const trays = model.trays.map((t, k) => {
    const zone = m.roles[k]!.zone;
    const { rawLiquid_kg_h: raw, rawVapour_kg_h: _v, dry: _d, ...load } = t;
    if (zone >= 0) load.liquidMassFlow_kg_h = Math.max(0, raw - model.states[zone]!.circulation_kg_h);
    return load;
  });
  return { source: 'model', cases: [], fraction: null, trays };
}
