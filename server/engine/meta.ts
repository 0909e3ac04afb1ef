/**
 * Correlation metadata: every published correlation in the engine is a plain function carrying a
 * `meta` record (id = its export name, label, source, provenance, validity ranges as data).
 * The method registry (registry.ts) is derived from these records, never typed by hand.
 */

/** Where a number or formula comes from (tags of the reference sheet). */
export type Provenance = 'seen' | 'recalled' | 'derived' | 'common-practice' | 'own-fit';

/** Closed interval [min, max] in the unit named by the key. */
export type Range = readonly [number, number];

export interface MethodMeta {
  /** equals the export name of the function; used as `CheckResult.method` */
  readonly id: string;
  readonly label: string;
  readonly source: string;
  readonly equation: string;
  readonly provenance: Provenance;
  /** validity ranges, keyed by input name with its unit in the key */
  readonly ranges: Readonly<Record<string, Range>>;
  /** tray types the correlation was developed for (absent: any); other types get a warning */
  readonly trayTypes?: readonly ('sieve' | 'fixed-valve' | 'moving-valve')[];
  /** the uncertainty reports state once for this correlation, in plain words (default: by provenance) */
  readonly uncertainty?: string;
}

export type MethodFn<F> = F & { readonly meta: MethodMeta };

/**
 * Attach metadata to a correlation function. The id must equal the name the function is exported
 * under (registry.ts enforces it; bundlers may rename function objects, so `fn.name` is not relied on).
 */
export function method<F extends (...args: never[]) => unknown>(id: string, fn: F, meta: Omit<MethodMeta, 'id'>): MethodFn<F> {
  return Object.assign(fn, { meta: Object.freeze({ id, ...meta }) });
}
