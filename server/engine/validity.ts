/**
 * One out-of-range policy for the whole engine: a correlation used outside the range stored in its
 * metadata still returns its value, and a structured warning is added for the UI. Where the engine
 * evaluates a chart fit at its edge instead of extrapolating, the warning says so (never silently).
 */
import type { EngineWarning } from '../../shared/types/rating.js';
import type { MethodMeta } from './meta.js';

/** Stable warning codes other than range warnings (`range:<methodId>:<input>`). */
export const WARNING_CODES = {
  dryTray: 'dry-tray',
  lowCrest: 'low-crest',
  noVapour: 'no-vapour',
  beyondFlood: 'beyond-flood',
  downcomerUnsealed: 'downcomer-unsealed',
  valveAreaMismatch: 'valve-area-mismatch',
  highPressureDerating: 'system-factor-high-pressure',
  foamingDerating: 'system-factor-foaming',
  fairRestriction: 'fair-restriction',
  downcomerBottomLarger: 'downcomer-bottom-larger',
  weirLoadingHigh: 'weir-loading-high',
  valveSlotAreaMissing: 'valve-slot-area-missing',
  kisterHaasSurfaceTension: 'kister-haas-surface-tension',
  kisterHaasValveTray: 'kister-haas-valve-tray',
  passesForDiameter: 'passes-for-diameter',
  passImbalance: 'pass-imbalance',
  passFlowPathShort: 'pass-flow-path-short',
  passLayoutMismatch: 'pass-layout-mismatch',
} as const;

/** Three significant figures for messages; exponent form outside 0.001–10,000 (toPrecision only where rounding is close to a tie). */
export function formatNumber(x: number): string {
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e4 || a < 1e-3) return x.toExponential(2);
  // scaled rounding is cheaper than toPrecision (warnings are built on hot paths); near a tie it defers to it
  const e = Math.floor(Math.log10(a));
  const step = 10 ** Math.abs(e - 2); // an exact integer power of ten
  const scaled = e >= 2 ? x / step : x * step;
  if (Math.abs(Math.abs(scaled % 1) - 0.5) < 1e-6) return String(Number(x.toPrecision(3)));
  return String(e >= 2 ? Math.round(scaled) * step : Math.round(scaled) / step);
}

/** True when value lies in [min, max] of the method's range for `input` (or no range is stored). */
export function inRange(meta: MethodMeta, input: string, value: number): boolean {
  const r = meta.ranges[input];
  return r === undefined || (value >= r[0] && value <= r[1]);
}

/** How range inputs are named in warnings (the code keeps the field name). */
const INPUT_LABELS: Record<string, string> = {
  flowParameter: 'flow parameter',
  percentFlood: 'percent of jet flood',
  holeAreaRatio: 'hole area / active area',
  fractionalHoleArea: 'hole area / active area',
  thicknessOverDiameter: 'deck thickness / hole diameter',
  weirHeightOverTraySpacing: 'weir height / tray spacing',
  traySpacing_mm: 'tray spacing (mm)',
  holeDiameter_mm: 'hole diameter (mm)',
  deckThickness_mm: 'deck thickness (mm)',
  weirHeight_mm: 'weir height (mm)',
  weirLoad_m3_h_m: 'weir loading (m³/(h·m))',
  vapourDensity_kg_m3: 'vapour density (kg/m³)',
  liquidDensity_kg_m3: 'liquid density (kg/m³)',
  surfaceTension_mN_m: 'surface tension (mN/m)',
  pressure_kPa: 'pressure (kPa)',
  liquidViscosity_mPa_s: 'liquid viscosity (mPa·s)',
  headAboveDeck_mm: 'head above the deck (mm)',
  vapourToLiquidDensityRatio: 'vapour / liquid density',
  underflowVelocity_m_s: 'velocity under the downcomer apron (m/s)',
  psi: 'fractional entrainment',
  transitionOverClearLiquid: 'froth-to-spray transition height / clear liquid height',
  crest_mm: 'crest over the weir (mm)',
  fFactorBubbling_Pa05: 'F-factor on the bubbling area ((m/s)(kg/m³)^0.5)',
};

/**
 * Push a range warning when `value` is outside the method's stored range for `input`.
 * `action` says what the engine did about it (e.g. "evaluated at the chart edge 0.01").
 */
export function checkRange(
  out: EngineWarning[],
  meta: MethodMeta,
  input: string,
  value: number,
  tray: number | undefined,
  action = 'value extrapolated',
): boolean {
  const r = meta.ranges[input];
  if (r === undefined || (value >= r[0] && value <= r[1])) return true;
  const w: EngineWarning = {
    code: `range:${meta.id}:${input}`,
    // the method's source is listed with the methods of every report, not repeated in each warning
    message:
      `${meta.label}: ${INPUT_LABELS[input] ?? input} ${formatNumber(value)} is outside its range ` +
      `${formatNumber(r[0])}–${formatNumber(r[1])}; ${action}.`,
  };
  if (tray !== undefined) w.tray = tray;
  out.push(w);
  return false;
}

const TRAY_TYPE_LABELS: Record<string, string> = {
  sieve: 'sieve',
  'fixed-valve': 'fixed-valve',
  'moving-valve': 'moving-valve',
};

/**
 * Warn (code `range:<methodId>:trayType`) when a correlation is applied to a tray type outside those
 * stored in its metadata (`meta.trayTypes`); `use` says what the engine uses it for.
 */
export function checkTrayType(out: EngineWarning[], meta: MethodMeta, trayType: string, use: string, tray?: number): boolean {
  const types = meta.trayTypes;
  if (types === undefined || (types as readonly string[]).includes(trayType)) return true;
  out.push(
    warning(
      `range:${meta.id}:trayType`,
      `${meta.label}: developed for ${types.map((t) => TRAY_TYPE_LABELS[t] ?? t).join(' and ')} trays, used here on a ${TRAY_TYPE_LABELS[trayType] ?? trayType} tray ${use}.`,
      tray,
    ),
  );
  return false;
}

export function warning(code: string, message: string, tray?: number): EngineWarning {
  return tray === undefined ? { code, message } : { code, message, tray };
}
