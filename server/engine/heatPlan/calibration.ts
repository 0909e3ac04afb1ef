/**
 * Calibration of the shortcut traffic model against simulation cases tagged with their pump-around duties.
 *
 * Latent heat per zone: the model moves the traffic of tray t by −Σ_i s_i(t)·(Q_i − Q0_i)·u_i, u_i = 3600/λ_i,
 * on both the vapour and the net liquid (traffic.ts). Over every case c and every tray whose traffic
 * depends on a duty, the simulated changes from the base case, y = V_sim − V0 and L_sim − L0 (net liquid,
 * the pump-around as a side cooler), are fitted by linear least squares in u (leastSquares.ts): the model
 * stays anchored at the plan's base case. A duty that no case moves (by more than DUTY_MATCH_KW) keeps the
 * given λ. Property drift: per tray and property, p_sim − p0 = Σ_i g_i·(Q_i − Q0_i), least squares over
 * the cases on the duties the tray depends on. Fit quality: RMS of the flow residuals, their share of the
 * mean flow, R² of the traffic change, the worst flow and the largest difference in percent of limit
 * between the ratings of the simulated and the model's loads.
 */
import type { CheckName } from '../../../shared/types/rating.js';
import type {
  CalibrationResult,
  CaseComparison,
  FitQuality,
  HeatPlanInput,
  SimulationCase,
  TrayPropertyDrift,
} from '../../../shared/types/heatPlan.js';
import { NormalEquations } from './leastSquares.js';
import { planModel } from './model.js';
import { shiftPlanTraffic, trayRoles, zoneLatentHeat } from './traffic.js';
import { S_PER_H } from '../units.js';

/** duties within this of each other are the same duty [kW] (our choice: below a simulation's precision) */
export const DUTY_MATCH_KW = 0.5;
type Prop = 'vapourDensity_kg_m3' | 'liquidDensity_kg_m3' | 'surfaceTension_mN_m' | 'liquidViscosity_mPa_s';

export const caseName = (c: SimulationCase, i: number): string => c.name ?? `case ${i + 1}`;

export function calibrateHeatPlan(input: HeatPlanInput, cases: readonly SimulationCase[]): CalibrationResult {
  const pas = input.pumpArounds;
  const numbering = input.numbering ?? 'top-down';
  const roles = trayRoles(input.trays, pas, numbering);
  const watched = input.trays.flatMap((t, k) => (roles[k]!.dependsOn.length ? [k] : []));
  const dq = cases.map((c) => pas.map((pa, i) => c.duties_kW[i]! - pa.baseDuty_kW));
  const varying = pas.flatMap((_, i) => (dq.some((d) => Math.abs(d[i]!) > DUTY_MATCH_KW) ? [i] : []));
  const simTray = cases.map((c) => new Map(c.trays.map((t) => [t.tray, t])));

  // latent heats: rows −s_i·ΔQ_i (varying duties); the others at the given λ are moved to the right side
  const ne = new NormalEquations(varying.length);
  const rows: { k: number; c: number; flow: 'vapour' | 'liquid'; x: number[]; y: number }[] = [];
  for (const k of watched) {
    const base = input.trays[k]!;
    const role = roles[k]!;
    cases.forEach((_, c) => {
      const sim = simTray[c]!.get(base.tray)!;
      let fixed = 0;
      pas.forEach((pa, i) => {
        if (!varying.includes(i))
          fixed -= (role.fractions[i]! * dq[c]![i]! * S_PER_H) / zoneLatentHeat(pa, input.latentHeat_kJ_kg);
      });
      const x = varying.map((i) => -role.fractions[i]! * dq[c]![i]!);
      for (const [flow, y] of [
        ['vapour', sim.vapourMassFlow_kg_h - base.vapourMassFlow_kg_h - fixed],
        ['liquid', sim.liquidMassFlow_kg_h - base.liquidMassFlow_kg_h - fixed],
      ] as const) {
        ne.add(x, y);
        rows.push({ k, c, flow, x, y });
      }
    });
  }
  const u = ne.solve();
  const fitted = pas.map((_, i) => {
    const j = varying.indexOf(i);
    return j >= 0 && u[j]! > 0 ? S_PER_H / u[j]! : null;
  });
  const drift = fitDrift(input, cases, watched, roles, dq, varying);
  const calibratedInput: HeatPlanInput = {
    ...input,
    pumpArounds: pas.map((pa, i) => (fitted[i] ? { ...pa, latentHeat_kJ_kg: fitted[i] } : { ...pa })),
    propertyDrift: drift,
  };

  const uUsed = varying.map((i, j) => (fitted[i] ? u[j]! : S_PER_H / zoneLatentHeat(pas[i]!, input.latentHeat_kJ_kg)));
  let ssRes = 0;
  let ssTot = 0;
  let flowSum = 0;
  let worstFlow: FitQuality['worstFlow'] = null;
  for (const r of rows) {
    const res = r.y - r.x.reduce((s, x, j) => s + x * uUsed[j]!, 0);
    ssRes += res * res;
    ssTot += r.y * r.y;
    const sim = simTray[r.c]!.get(input.trays[r.k]!.tray)!;
    flowSum += r.flow === 'vapour' ? sim.vapourMassFlow_kg_h : sim.liquidMassFlow_kg_h;
    if (!worstFlow || Math.abs(res) > Math.abs(worstFlow.residual_kg_h))
      worstFlow = { tray: input.trays[r.k]!.tray, case: caseName(cases[r.c]!, r.c), flow: r.flow, residual_kg_h: res };
  }
  const rms = rows.length ? Math.sqrt(ssRes / rows.length) : 0;
  const { comparisons, worstRating } = compareCases(calibratedInput, cases, watched);
  const fit: FitQuality = {
    cases: cases.length,
    flows: rows.length,
    rmsResidual_kg_h: rms,
    rmsResidual_percent: flowSum > 0 ? (100 * rms * rows.length) / flowSum : 0,
    rSquared: ssTot > 0 ? 1 - ssRes / ssTot : null,
    worstFlow,
    worstRating,
  };
  const zones = pas.map((pa, i) => ({
    pumpAround: pa.name,
    given_kJ_kg: zoneLatentHeat(pa, input.latentHeat_kJ_kg),
    fitted_kJ_kg: fitted[i]!,
  }));
  return { zones, drift, fit, comparisons, calibratedInput, notes: calibrationNotes(zones, varying, fit, u) };
}

function fitDrift(
  input: HeatPlanInput,
  cases: readonly SimulationCase[],
  watched: readonly number[],
  roles: ReturnType<typeof trayRoles>,
  dq: readonly number[][],
  varying: readonly number[],
): TrayPropertyDrift[] {
  const n = input.pumpArounds.length;
  return watched.map((k) => {
    const base = input.trays[k]!;
    const on = roles[k]!.dependsOn.filter((i) => varying.includes(i));
    const perKW = (prop: Prop): number[] | undefined => {
      const p0 = base[prop];
      const sims = cases.map((c) => c.trays.find((t) => t.tray === base.tray)![prop]);
      if (p0 === undefined || sims.some((v) => v === undefined)) return undefined;
      const ne = new NormalEquations(on.length);
      sims.forEach((v, c) =>
        ne.add(
          on.map((i) => dq[c]![i]!),
          v! - p0,
        ),
      );
      const g = on.length ? ne.solve() : [];
      const out = new Array<number>(n).fill(0);
      on.forEach((i, j) => (out[i] = Number.isFinite(g[j]!) ? g[j]! : 0));
      return out;
    };
    const d: TrayPropertyDrift = {
      tray: base.tray,
      vapourDensity_kg_m3_per_kW: perKW('vapourDensity_kg_m3')!,
      liquidDensity_kg_m3_per_kW: perKW('liquidDensity_kg_m3')!,
      surfaceTension_mN_m_per_kW: perKW('surfaceTension_mN_m')!,
    };
    const mu = perKW('liquidViscosity_mPa_s');
    if (mu) d.liquidViscosity_mPa_s_per_kW = mu;
    return d;
  });
}

/** Model against simulation, tray by tray: traffic (net liquid) and the ratings of both (circulation added). */
function compareCases(
  calibrated: HeatPlanInput,
  cases: readonly SimulationCase[],
  watched: readonly number[],
): { comparisons: CaseComparison[]; worstRating: FitQuality['worstRating'] } {
  const m = planModel(calibrated);
  const isWatched = new Set(watched);
  let worstRating: FitQuality['worstRating'] = null;
  const comparisons = cases.map((c, ci) => {
    const model = shiftPlanTraffic(
      calibrated.trays,
      calibrated.pumpArounds,
      c.duties_kW,
      calibrated.latentHeat_kJ_kg,
      m.numbering,
      calibrated.propertyDrift,
    );
    const sims = new Map(c.trays.map((t) => [t.tray, t]));
    const trays = model.trays.map((mt, k) => {
      const zone = m.roles[k]!.zone;
      const circ = zone >= 0 ? model.states[zone]!.circulation_kg_h : 0;
      const sim = sims.get(mt.tray)!;
      const simRated = m.rate(k, { ...sim, liquidMassFlow_kg_h: sim.liquidMassFlow_kg_h + circ });
      const modelRated = m.rate(k, mt);
      const simulatedPercent: Partial<Record<CheckName, number>> = {};
      const modelPercent: Partial<Record<CheckName, number>> = {};
      for (const [name, chk] of Object.entries(simRated.checks) as [CheckName, (typeof simRated.checks)[CheckName]][]) {
        const mc = modelRated.checks[name];
        simulatedPercent[name] = chk.percentOfLimit;
        modelPercent[name] = mc.percentOfLimit;
        if (!isWatched.has(k) || chk.status === 'na' || mc.status === 'na') continue;
        const diff = mc.percentOfLimit - chk.percentOfLimit;
        if (!worstRating || Math.abs(diff) > Math.abs(worstRating.difference_percent))
          worstRating = { tray: mt.tray, case: caseName(c, ci), check: name, difference_percent: diff };
      }
      return {
        tray: mt.tray,
        simulatedVapour_kg_h: sim.vapourMassFlow_kg_h,
        modelVapour_kg_h: mt.vapourMassFlow_kg_h,
        simulatedLiquid_kg_h: sim.liquidMassFlow_kg_h,
        modelLiquid_kg_h: Math.max(0, mt.rawLiquid_kg_h - circ),
        simulatedPercent,
        modelPercent,
      };
    });
    return { name: caseName(c, ci), duties_kW: [...c.duties_kW], trays };
  });
  return { comparisons, worstRating };
}

function calibrationNotes(
  zones: CalibrationResult['zones'],
  varying: readonly number[],
  fit: FitQuality,
  u: readonly number[],
): string[] {
  const notes = [
    `Latent heat of each pump-around zone fitted by least squares to the tray traffic of ${fit.cases} simulation cases, the model anchored at the base case; properties drift linearly with the duties, fitted tray by tray.`,
    `Fit: RMS flow residual ${Math.round(fit.rmsResidual_kg_h)} kg/h (${fit.rmsResidual_percent.toFixed(1)} % of the mean flow)${fit.rSquared === null ? '' : `, R² of the traffic change ${fit.rSquared.toFixed(3)}`}.`,
  ];
  zones.forEach((z, i) => {
    const j = varying.indexOf(i);
    if (j < 0)
      notes.push(`${z.pumpAround}: the cases do not vary its duty; its latent heat stays at ${z.given_kJ_kg.toFixed(0)} kJ/kg.`);
    else if (z.fitted_kJ_kg === null)
      notes.push(
        `${z.pumpAround}: the fit gave no positive latent heat (${u[j]!.toExponential(2)} kg/h per kW); its latent heat stays at ${z.given_kJ_kg.toFixed(0)} kJ/kg. Check the duty tags of the cases.`,
      );
  });
  return notes;
}
