/**
 * Number of liquid passes against column diameter (common practice): two-pass trays are unusual below
 * about 1.5 m (5 ft) and four-pass trays below about 3 m (10 ft); below these the flow paths get short.
 * A warning, never a block: the engine and the section form both say so.
 */
export const PASS_MIN_DIAMETER_M: Readonly<Record<1 | 2 | 4, number>> = Object.freeze({ 1: 0, 2: 1.5, 4: 3 });

/** Shortest flow path worth having [m]: about 18 in (Kister, Distillation Design, 1992, §6.5). */
export const MIN_FLOW_PATH_M = 0.46;

/** Why `passes` is unusual for a column of `diameter_m`, or undefined when it is not. */
export function passesWarning(passes: 1 | 2 | 4, diameter_m: number): string | undefined {
  const min = PASS_MIN_DIAMETER_M[passes];
  return diameter_m < min
    ? `${passes}-pass trays are unusual below about ${min} m column diameter (common practice): the flow paths get short`
    : undefined;
}
