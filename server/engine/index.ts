/**
 * Frothline tray rating engine — public API. Pure TypeScript, SI units, no I/O.
 * Results are screening estimates: operating changes need management-of-change review and
 * confirmation by the internals vendor and licensed engineers; site permits and local codes govern.
 */
export { rateSection, summarise } from './rateSection.js';
export { rateTray, rateTrayPrepared } from './rateTray.js';
export { prepareSection, type PreparedSection } from './prepare.js';
export { operatingWindow, type OperatingWindowOptions } from './operatingWindow.js';
export { validateRatingRequest, physicsErrors, type FieldError, type ValidationResult } from './validate.js';
export { brent, solveIncreasing, type SolveOptions, type SolveResult } from './solve.js';
export { METHOD_REGISTRY, METHOD_METADATA, METHOD_USES } from './registry.js';
export { DEFAULT_LIMITS, FOAMING_CLASSES, resolveLimits, type ResolvedLimits } from './limits.js';
export { WARNING_CODES } from './validity.js';
export { ENGINE_VERSION } from './version.js';
export {
  areaBetweenChords,
  chordLength,
  passImbalancePercent,
  passTray,
  preparePasses,
  PASS_DETAIL_FIELDS,
  DOWNCOMER_KINDS,
} from './multipass.js';
export type { MethodMeta, Provenance, Range } from './meta.js';
export * from './flooding.js';
export * from './entrainment.js';
export * from './weeping.js';
export * from './pressureDrop.js';
export * from './aeration.js';
export * from './weir.js';
export * from './downcomer.js';
