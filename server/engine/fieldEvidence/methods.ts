/**
 * The field-evidence methods and their metadata (label, source, equation, provenance, uncertainty), derived
 * from the functions' `.meta` like the rating's METHOD_REGISTRY, for reports that state each method's source
 * once. The rating's correlations the prediction relies on are listed in FIELD_EVIDENCE_USES.
 */
import type { MethodFn, MethodMeta } from '../meta.js';
import { clearLiquidHeightBennett } from '../pressureDrop.js';
import { downcomerBackupClear } from '../downcomer.js';
import * as prediction from './prediction.js';
import * as pressureSurvey from './pressureSurvey.js';
import * as scanDensity from './scanDensity.js';

type AnyMethod = MethodFn<(...args: never[]) => unknown>;

const isMethod = (x: unknown): x is AnyMethod =>
  typeof x === 'function' && typeof (x as { meta?: MethodMeta }).meta?.id === 'string';

function collect(...modules: Record<string, unknown>[]): Readonly<Record<string, AnyMethod>> {
  const out: Record<string, AnyMethod> = {};
  for (const mod of modules)
    for (const [name, value] of Object.entries(mod)) {
      if (!isMethod(value)) continue;
      if (value.meta.id !== name) throw new Error(`method exported as ${name} carries id ${value.meta.id}`);
      out[name] = value;
    }
  return Object.freeze(out);
}

/** id → function (with `.meta`). */
export const FIELD_EVIDENCE_REGISTRY = collect(scanDensity, prediction, pressureSurvey);

/** id → metadata. */
export const FIELD_EVIDENCE_METHODS: Readonly<Record<string, MethodMeta>> = Object.freeze(
  Object.fromEntries(Object.entries(FIELD_EVIDENCE_REGISTRY).map(([id, fn]) => [id, fn.meta])),
);

/** Rating correlations (METHOD_REGISTRY ids) each field-evidence method relies on. */
export const FIELD_EVIDENCE_USES: Readonly<Record<string, readonly string[]>> = Object.freeze({
  [prediction.frothHeightFromClearLiquid.meta.id]: [clearLiquidHeightBennett.meta.id, downcomerBackupClear.meta.id],
});
