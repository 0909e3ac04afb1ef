/**
 * Method registry, derived from the metadata each correlation function carries (meta.id = its export
 * name, checked here). `CheckResult.method` values are keys of this registry.
 */
import * as flooding from './flooding.js';
import * as entrainment from './entrainment.js';
import * as weeping from './weeping.js';
import * as pressureDrop from './pressureDrop.js';
import * as aeration from './aeration.js';
import * as weir from './weir.js';
import * as downcomer from './downcomer.js';
import type { MethodFn, MethodMeta } from './meta.js';

type AnyMethod = MethodFn<(...args: never[]) => unknown>;

function isMethod(x: unknown): x is AnyMethod {
  return typeof x === 'function' && typeof (x as { meta?: MethodMeta }).meta?.id === 'string';
}

function collect(...modules: Record<string, unknown>[]): Readonly<Record<string, AnyMethod>> {
  const out: Record<string, AnyMethod> = {};
  for (const mod of modules) {
    for (const [exportName, value] of Object.entries(mod)) {
      if (!isMethod(value)) continue;
      if (value.meta.id !== exportName) throw new Error(`method exported as ${exportName} carries id ${value.meta.id}`);
      if (out[exportName] && out[exportName] !== value) throw new Error(`duplicate method id ${exportName}`);
      out[exportName] = value;
    }
  }
  return Object.freeze(out);
}

/** id → correlation function (with `.meta`). */
export const METHOD_REGISTRY = collect(flooding, entrainment, weeping, pressureDrop, aeration, weir, downcomer);

/** id → metadata only (for the API and the client: labels, sources, validity ranges). */
export const METHOD_METADATA: Readonly<Record<string, MethodMeta>> = Object.freeze(
  Object.fromEntries(Object.entries(METHOD_REGISTRY).map(([id, fn]) => [id, fn.meta])),
);

const id = (m: AnyMethod): string => m.meta.id;

/**
 * Correlations that a check's method relies on, listed with it in reports (so the uncertainty of, e.g.,
 * the Kister & Haas transition height is stated once in the methods list). Keys and values are registry ids.
 */
export const METHOD_USES: Readonly<Record<string, readonly string[]>> = Object.freeze({
  [id(flooding.fairFloodCapacityLygerosMagoulas)]: [
    id(flooding.fairHoleAreaCorrection),
    id(flooding.fairSurfaceTensionCorrection),
    id(flooding.floodVelocitySoudersBrown),
  ],
  [id(flooding.kisterHaasFloodCapacity)]: [
    id(flooding.transitionClearLiquidHeightKisterHaas),
    id(flooding.floodVelocitySoudersBrown),
  ],
  [id(entrainment.fairEntrainmentOwnFit)]: [id(entrainment.entrainedLiquidRate)],
  [id(weeping.weepPointHoleVelocityEduljee)]: [id(weeping.eduljeeK2OwnFit)],
  [id(weeping.weepPointHoleVelocityFair)]: [id(pressureDrop.clearLiquidHeightBennett), id(pressureDrop.residualHeadBennett)],
  [id(weeping.weepPointFixedValveFair)]: [
    id(weeping.weepPointHoleVelocityFair),
    id(pressureDrop.kleinOpenValveK),
    id(pressureDrop.clearLiquidHeightBennett),
    id(pressureDrop.residualHeadBennett),
  ],
  [id(weeping.weepPointMovingValveClosedBalance)]: [
    id(pressureDrop.kleinClosedBalanceVelocity),
    id(pressureDrop.kleinClosedValveK),
    id(pressureDrop.kleinEddyLossCoefficient),
  ],
  [id(pressureDrop.dryTrayHeadOrifice)]: [
    id(pressureDrop.orificeCoefficientHughmarkOConnell),
    id(pressureDrop.clearLiquidHeightBennett),
    id(pressureDrop.residualHeadBennett),
  ],
  [id(pressureDrop.dryTrayHeadKleinValve)]: [
    id(pressureDrop.kleinClosedValveK),
    id(pressureDrop.kleinOpenValveK),
    id(pressureDrop.kleinBalanceHead),
    id(aeration.aerationFactorFrothDensity),
    id(aeration.aeratedLiquidHeadFair),
  ],
  [id(pressureDrop.dryTrayHeadK)]: [
    id(pressureDrop.kleinOpenValveK),
    id(aeration.aerationFactorFrothDensity),
    id(aeration.aeratedLiquidHeadFair),
  ],
  [id(downcomer.downcomerBackupClear)]: [id(downcomer.apronHeadLoss)],
});
