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

/** A tray section's span and its number of liquid passes. */
export interface SectionPasses {
  firstTray: number;
  lastTray: number;
  passes: number;
}

/** Passes of a tray: those of the section that holds it; a tray outside every section has one. */
export function trayPassCount(sections: readonly SectionPasses[], tray: number): number {
  const s = sections.find((x) => tray >= Math.min(x.firstTray, x.lastTray) && tray <= Math.max(x.firstTray, x.lastTray));
  return s?.passes ?? 1;
}

/** The pass numbers a tray has: 1…n. */
export const passNumbers = (n: number): number[] => Array.from({ length: Math.max(1, n) }, (_, i) => i + 1);

/**
 * Why `pass` is not a pass of `tray`, or undefined when it is. Without a tray, the pass must exist on some tray
 * of the column (at most the largest number of passes of its sections).
 */
export function passFault(sections: readonly SectionPasses[], tray: number | null, pass: number): string | undefined {
  const n = tray === null ? Math.max(1, ...sections.map((s) => s.passes)) : trayPassCount(sections, tray);
  if (Number.isInteger(pass) && pass >= 1 && pass <= n) return undefined;
  const has = n === 1 ? 'one pass' : `${n} passes`;
  const give = n === 1 ? 'the pass is 1' : `give a pass from 1 to ${n}`;
  return tray === null ? `no tray of this column has more than ${has}: ${give}` : `tray ${tray} has ${has}: ${give}`;
}
