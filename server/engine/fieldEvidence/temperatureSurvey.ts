/**
 * Temperature survey against the load case: measured tray temperatures against the case's
 * `temperature_C` per tray; deviation and a flag per tray, and a note when the measured profile is much
 * flatter than predicted. The input must have passed validateTemperatureSurveyInput.
 */
import type { TemperatureSurveyInput, TemperatureSurveyResult } from '../../../shared/types/fieldEvidence.js';

/** deviation counted as agreement [K] (common practice: thermocouple and model uncertainty of a few K) */
export const DEFAULT_TOLERANCE_K = 5;
/** measured span under this fraction of the predicted span over the same trays reads as a flattened profile (common practice) */
export const FLAT_PROFILE_FRACTION = 0.5;

const f1 = (x: number): string => x.toFixed(1);

export function runTemperatureSurvey(input: TemperatureSurveyInput): TemperatureSurveyResult {
  const tol = input.tolerance_K ?? DEFAULT_TOLERANCE_K;
  const predicted = new Map<number, number>();
  for (const t of input.trays) if (t.temperature_C !== undefined) predicted.set(t.tray, t.temperature_C);
  const rows = input.measurements.map((m) => {
    const p = predicted.get(m.tray);
    if (p === undefined)
      return {
        tray: m.tray,
        measured_C: m.temperature_C,
        predicted_C: null,
        deviation_K: null,
        flag: 'no-prediction' as const,
        reason: `The load case gives no temperature for tray ${m.tray}.`,
      };
    const dev = m.temperature_C - p;
    const flag = dev > tol ? ('hotter' as const) : dev < -tol ? ('colder' as const) : ('as-predicted' as const);
    const reason =
      flag === 'as-predicted'
        ? `${f1(m.temperature_C)} °C is within ±${f1(tol)} K of the case's ${f1(p)} °C (${dev >= 0 ? '+' : '−'}${f1(Math.abs(dev))} K).`
        : `${f1(m.temperature_C)} °C is ${f1(Math.abs(dev))} K ${flag === 'hotter' ? 'hotter' : 'colder'} than the case's ${f1(p)} °C (tolerance ±${f1(tol)} K).`;
    return { tray: m.tray, measured_C: m.temperature_C, predicted_C: p, deviation_K: dev, flag, reason };
  });
  const notes = [
    `Deviations beyond ±${f1(tol)} K are flagged (a screening tolerance of common practice). Draw-tray temperatures are bubble points at column conditions and do not match laboratory boiling ranges.`,
  ];
  const compared = rows.filter((r) => r.predicted_C !== null);
  if (compared.length >= 3) {
    const span = (xs: number[]): number => Math.max(...xs) - Math.min(...xs);
    const measuredSpan = span(compared.map((r) => r.measured_C));
    const predictedSpan = span(compared.map((r) => r.predicted_C));
    if (predictedSpan > tol && measuredSpan < FLAT_PROFILE_FRACTION * predictedSpan)
      notes.push(
        `The measured profile is flatter than the case (span ${f1(measuredSpan)} K against ${f1(predictedSpan)} K over the same trays): with off-specification product, a flattened profile is a sign of flooding or lost separation reported in the troubleshooting literature.`,
      );
  }
  return { tolerance_K: tol, rows, notes };
}
