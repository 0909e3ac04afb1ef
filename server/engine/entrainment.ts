/**
 * Fractional entrainment from Fair's chart (Perry 8th Fig. 14-34; Kister 1992 Fig. 6.16; Ludwig
 * Fig. 8-138; Sinnott Fig. 11.29). No published closed form is known, so this is our own fit.
 */
import { method } from './meta.js';

/** coefficients of our own fit (see fairEntrainmentOwnFit) */
export const FAIR_ENTRAINMENT_FIT = { a: -5.82, b: 5.661, d: 0.9989, m: 8, c: 27.48 } as const;
/** lowest chart curve (fraction of flood); below it ψ is taken proportional to the fraction of flood */
const LOWEST_CURVE = 0.3;
/** flow-parameter span supported by the readings the fit was made to */
export const FAIR_ENTRAINMENT_DATA_SPAN = [0.01, 0.2] as const;

function logitFit(flowParameter: number, fractionOfFlood: number): number {
  const { a, b, d, m, c } = FAIR_ENTRAINMENT_FIT;
  const z = a + b * fractionOfFlood + d * Math.pow(fractionOfFlood, m) - c * flowParameter;
  return 1 / (1 + Math.exp(-z));
}

/**
 * Fair's fractional entrainment ψ = e/(L + e) — OUR OWN FIT of published readings of Fair's chart.
 *
 * Fit form (logistic, monotone: ψ rises with fraction of flood p, falls with F_LV):
 *   logit ψ = −5.82 + 5.661 p + 0.9989 p^8 − 27.48 F_LV
 * Fitted by weighted least squares on ln ψ to the seven readings in
 * reference-tables/fair-entrainment-readings.json; error against each reading [fit/reading − 1]:
 *   Seader & Henley 7.48 (0.0192, 73 %, 0.11) −3.8 %; (0.0192, 95 %, 0.50) −15.2 %;
 *   Perry 8th Example 10 (0.021, 80 %, 0.15) +2.9 %; (0.021, 90 %, 0.24) +22.8 %;
 *   Seader & Henley (0.0473, 39 %, 0.0065) +12.4 %; (0.0473, 51 %, 0.017) −15.5 %;
 *   Sinnott Ex. 11.11 (0.14, 49 %, ≈0.001, from memory) +1.7 %.
 * The readings disagree among themselves by 20–30 % (different readers and reproductions of the
 * same log-scale chart), so ±35 % is the tolerance we test to.
 * Data span F_LV 0.019–0.14; used for 0.01–0.20. Outside it the caller evaluates at the span edge
 * (at high F_LV that overstates ψ, the conservative side) and warns. Below the lowest chart curve
 * (30 % of flood) ψ = ψ(30 %) · p/0.30, so that ψ = 0 with no vapour (our own choice).
 * @param flowParameter F_LV [-]; @param fractionOfFlood u_N/u_N,flood (Fair) [-]
 * @returns ψ [kg entrained per kg gross liquid downflow], < 1
 * Example: F_LV 0.021, 80 % of flood → 0.154 (Perry 8th Example 10 reads 0.15).
 */
export const fairEntrainmentOwnFit = method(
  'fairEntrainmentOwnFit',
  function fairEntrainmentOwnFit(flowParameter: number, fractionOfFlood: number): number {
    if (!(fractionOfFlood > 0)) return 0;
    if (fractionOfFlood < LOWEST_CURVE) return (logitFit(flowParameter, LOWEST_CURVE) * fractionOfFlood) / LOWEST_CURVE;
    return logitFit(flowParameter, fractionOfFlood);
  },
  {
    label: "Fair entrainment chart (Frothline's own fit)",
    source:
      "own fit to readings of Fair's chart (Perry's Chemical Engineers' Handbook 8th ed. Fig. 14-34): Seader & Henley (1998) solutions 7.48, Perry 8th Example 10, Sinnott Ex. 11.11 [from memory]",
    equation: 'logit psi = -5.82 + 5.661 p + 0.9989 p^8 - 27.48 F_LV',
    provenance: 'own-fit',
    ranges: { flowParameter: [0.01, 0.2], percentFlood: [30, 95] },
    uncertainty:
      "A fit to readings of Fair's log-scale chart; published readings of the chart differ by 20–30 % among themselves and the fit stays within about ±35 % of them. Read from the percent of flood of the method chosen for jet flood; not rated past flood.",
  },
);

/**
 * Entrained liquid rate e = ψ L/(1 − ψ) (Seader & Henley 1998 definition ψ = e/(L + e), seen).
 * ψ is limited to 0.999 to keep e finite (beyond flood the chart has no meaning anyway).
 * @param psi fractional entrainment [-]; @param liquid_kg_h liquid downflow [kg/h]
 * @returns e [kg/h]. Example: ψ 0.11, L 727 → 89.9 (Seader & Henley 7.48 top tray: 90 lbmol/h).
 */
export const entrainedLiquidRate = method(
  'entrainedLiquidRate',
  function entrainedLiquidRate(psi: number, liquid_kg_h: number): number {
    const p = psi > 0.999 ? 0.999 : psi;
    return (p * liquid_kg_h) / (1 - p);
  },
  {
    label: 'Entrained liquid from fractional entrainment',
    source: 'Seader & Henley, Separation Process Principles (1998), definition psi = e/(L + e)',
    equation: 'e = psi L/(1 - psi)',
    provenance: 'seen',
    ranges: { psi: [0, 0.999] },
  },
);
