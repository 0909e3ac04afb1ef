/**
 * Units: SI inside, SI or US customary on screen and in imported files.
 *
 * Every factor is an exact definition or taken from NIST Special Publication 811 (2008 edition),
 * "Guide for the Use of the International System of Units", Appendix B.8/B.9 (factors for units listed
 * alphabetically / by kind of quantity). Each constant names its source. A value in unit u converts to
 * SI as `si = value·factor + offset`.
 */
import { formatSig } from './numberFormat.js';
import type { UnitSystem } from './types/api.js';

// ---- exact definitions ----
/** 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959; NIST SP 811 B.9) */
export const M_PER_FT = 0.3048;
/** 1 in = 0.0254 m exactly (NIST SP 811 B.9) */
export const M_PER_IN = 0.0254;
/** 1 lb (avoirdupois) = 0.453 592 37 kg exactly (NIST SP 811 B.9) */
export const KG_PER_LB = 0.45359237;
/** 1 US liquid gallon = 231 in³ = 3.785 411 784 × 10⁻³ m³ exactly (NIST SP 811 B.9) */
export const M3_PER_USGAL = 3.785411784e-3;
/** 1 bar = 10⁵ Pa exactly (NIST SP 811 B.9) */
export const PA_PER_BAR = 1e5;
/**
 * Standard atmosphere, 101 325 Pa exactly (NIST SP 811 B.9): gauge pressures are made absolute with it. The
 * site's actual barometric pressure differs (about 1.2 kPa less per 100 m of altitude), which the import says.
 */
export const PA_STANDARD_ATMOSPHERE = 101325;
/** 1 Btu (International Table) = 1 055.055 852 62 J exactly (NIST SP 811 B.9, footnote on Btu_IT) */
export const J_PER_BTU_IT = 1055.05585262;
/** 1 lbf = 4.448 221 615 260 5 N exactly (lb × standard gravity 9.806 65 m/s², NIST SP 811 B.9) */
export const N_PER_LBF = 4.4482216152605;
/** 1 psi = 1 lbf/in² = 6 894.757 Pa (NIST SP 811 B.9 gives 6.894 757 E+03; derived from the exact lbf and in) */
export const PA_PER_PSI = N_PER_LBF / (M_PER_IN * M_PER_IN);
/** 1 lb/ft³ = 16.018 46 kg/m³ (NIST SP 811 B.9 gives 1.601 846 E+01; derived from the exact lb and ft) */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / M_PER_FT ** 3;
/** 1 in = 25.4 mm exactly */
export const MM_PER_IN = M_PER_IN * 1000;
/** 1 ft² = 0.092 903 04 m² exactly */
export const M2_PER_FT2 = M_PER_FT ** 2;
/** 1 US gal/min = 6.309 020 E−05 m³/s (NIST SP 811 B.9; derived from the exact US gallon) */
export const M3_S_PER_USGPM = M3_PER_USGAL / 60;

export type QuantityId =
  | 'massFlow'
  | 'density'
  | 'surfaceTension'
  | 'viscosity'
  | 'temperature'
  | 'pressure'
  | 'lengthSmall'
  | 'lengthLarge'
  | 'area'
  | 'velocity'
  | 'weirLoading'
  | 'pressureDrop'
  | 'liquidHead'
  | 'duty'
  | 'liquidVolumeFlow'
  | 'fFactor'
  | 'time'
  | 'ratio'
  | 'percent';

export interface UnitDef {
  id: string;
  label: string;
  /** SI = value·factor + offset */
  factor: number;
  offset?: number;
  /** spellings recognised in file headers (lower case, compared without spaces) */
  aliases: string[];
}

export interface Quantity {
  id: QuantityId;
  label: string;
  /** display labels of the SI and US units */
  siUnit: string;
  usUnit: string;
  /** ids of the SI and US units (as in `units`) */
  siUnitId: string;
  usUnitId: string;
  /** decimals shown for each system */
  decimals: Record<UnitSystem, number>;
  /** every unit accepted for this quantity; the SI unit first */
  units: UnitDef[];
  toUS: (si: number) => number;
  fromUS: (us: number) => number;
}

/** A unit: ASCII id (as stored and sent by the API), display label, factor/offset to SI; the id and label are always aliases. */
const u = (id: string, factor: number, aliases: string[] = [], offset = 0, label = id): UnitDef => ({
  id,
  label,
  factor,
  offset,
  aliases: [id.toLowerCase(), label.toLowerCase(), ...aliases],
});

interface QuantitySpec {
  label: string;
  si: string;
  us: string;
  decimals: [number, number];
  units: UnitDef[];
}

const SPECS: Record<QuantityId, QuantitySpec> = {
  massFlow: {
    label: 'Mass flow',
    si: 'kg/h',
    us: 'lb/h',
    decimals: [0, 0],
    units: [
      u('kg/h', 1, ['kg/hr']),
      u('lb/h', KG_PER_LB, ['lb/hr', 'lbs/h', 'lbs/hr', '#/h']),
      u('t/h', 1000, ['te/h', 'tonne/h', 't/hr']),
      u('klb/h', 1000 * KG_PER_LB, ['klb/hr', 'mlb/h']),
    ],
  },
  density: {
    label: 'Density',
    si: 'kg/m³',
    us: 'lb/ft³',
    decimals: [2, 3],
    units: [u('kg/m3', 1, ['kg/m^3'], 0, 'kg/m³'), u('lb/ft3', KG_M3_PER_LB_FT3, ['lb/cuft', 'lb/ft^3', 'pcf'], 0, 'lb/ft³')],
  },
  surfaceTension: {
    label: 'Surface tension',
    si: 'mN/m',
    us: 'dyn/cm',
    decimals: [2, 2],
    units: [u('mN/m', 1, ['mn/m']), u('dyn/cm', 1, ['dyne/cm', 'dynes/cm'])],
  },
  viscosity: {
    label: 'Viscosity',
    si: 'mPa·s',
    us: 'cP',
    decimals: [3, 3],
    units: [u('mPa.s', 1, ['mpas', 'mpa s', 'mpa*s'], 0, 'mPa·s'), u('cP', 1, ['cp', 'centipoise'])],
  },
  temperature: {
    label: 'Temperature',
    si: '°C',
    us: '°F',
    decimals: [1, 1],
    units: [u('C', 1, ['degc', 'deg c', 'celsius'], 0, '°C'), u('F', 1 / 1.8, ['degf', 'deg f', 'fahrenheit'], -32 / 1.8, '°F')],
  },
  pressure: {
    label: 'Pressure',
    si: 'kPa',
    us: 'psia',
    decimals: [1, 2],
    units: [
      u('kPa', 1000, ['kpa', 'kpa(a)', 'kpaa']),
      u('psia', PA_PER_PSI, ['psi', 'psi(a)']),
      u('bar', PA_PER_BAR, ['bara', 'bar(a)']),
      u('kPag', 1000, ['kpa(g)', 'kpa g'], PA_STANDARD_ATMOSPHERE, 'kPa(g)'),
      u('barg', PA_PER_BAR, ['bar(g)', 'bar g'], PA_STANDARD_ATMOSPHERE, 'bar(g)'),
      u('psig', PA_PER_PSI, ['psi(g)', 'psi g'], PA_STANDARD_ATMOSPHERE),
    ],
  },
  lengthSmall: {
    label: 'Length',
    si: 'mm',
    us: 'in',
    decimals: [1, 2],
    units: [u('mm', 1e-3), u('in', M_PER_IN, ['inch', 'inches', '"'])],
  },
  lengthLarge: { label: 'Length', si: 'm', us: 'ft', decimals: [3, 2], units: [u('m', 1), u('ft', M_PER_FT, ['feet', "'"])] },
  area: {
    label: 'Area',
    si: 'm²',
    us: 'ft²',
    decimals: [3, 2],
    units: [u('m2', 1, ['m^2', 'sq m'], 0, 'm²'), u('ft2', M_PER_FT * M_PER_FT, ['ft^2', 'sq ft', 'sqft'], 0, 'ft²')],
  },
  velocity: { label: 'Velocity', si: 'm/s', us: 'ft/s', decimals: [3, 2], units: [u('m/s', 1), u('ft/s', M_PER_FT, ['fps'])] },
  // gpm/in: (US gal/min)/in → m³/(h·m): 3.785411784e-3·60 / 0.0254 = 8.9419 (field-practice §7 quotes 8.942)
  weirLoading: {
    label: 'Weir loading',
    si: 'm³/(h·m)',
    us: 'gpm/in',
    decimals: [1, 2],
    units: [
      u('m3/(h m)', 1 / 3600, ['m3/h/m', 'm3/hm', 'm³/h/m'], 0, 'm³/(h·m)'),
      u('gpm/in', M3_PER_USGAL / 60 / M_PER_IN, ['gpm/inch']),
      u('gpm/ft', M3_PER_USGAL / 60 / M_PER_FT),
    ],
  },
  pressureDrop: {
    label: 'Pressure drop',
    si: 'Pa',
    us: 'psi',
    decimals: [0, 4],
    units: [u('Pa', 1, ['pa']), u('psi', PA_PER_PSI), u('mbar', 100)],
  },
  liquidHead: {
    label: 'Liquid head',
    si: 'mm liquid',
    us: 'in liquid',
    decimals: [1, 2],
    units: [u('mm liquid', 1e-3, ['mm liq', 'mmliq']), u('in liquid', M_PER_IN, ['in liq', 'inliq'])],
  },
  // MMBtu/h → W: 10⁶ · 1055.05585262 J / 3600 s = 293 071.07 W
  duty: {
    label: 'Duty',
    si: 'kW',
    us: 'MMBtu/h',
    decimals: [0, 3],
    units: [u('kW', 1000), u('MMBtu/h', (1e6 * J_PER_BTU_IT) / 3600, ['mmbtu/hr']), u('MW', 1e6)],
  },
  liquidVolumeFlow: {
    label: 'Liquid volume flow',
    si: 'm³/h',
    us: 'gpm',
    decimals: [2, 1],
    units: [u('m3/h', 1 / 3600, ['m3/hr'], 0, 'm³/h'), u('gpm', M3_PER_USGAL / 60, ['usgpm'])],
  },
  // (ft/s)(lb/ft³)^0.5 → Pa^0.5: 0.3048 · √16.01846 = 1.2199
  fFactor: {
    label: 'F-factor',
    si: 'Pa^0.5',
    us: '(ft/s)(lb/ft³)^0.5',
    decimals: [2, 2],
    units: [u('Pa^0.5', 1), u('(ft/s)(lb/ft3)^0.5', M_PER_FT * Math.sqrt(KG_M3_PER_LB_FT3), [], 0, '(ft/s)(lb/ft³)^0.5')],
  },
  time: { label: 'Time', si: 's', us: 's', decimals: [1, 1], units: [u('s', 1)] },
  ratio: { label: 'Ratio', si: '-', us: '-', decimals: [3, 3], units: [u('-', 1)] },
  percent: { label: 'Percent', si: '%', us: '%', decimals: [1, 1], units: [u('%', 1)] },
};

function build(id: QuantityId, s: QuantitySpec): Quantity {
  const si = s.units[0]!;
  const us = s.units.find((x) => x.label === s.us) ?? si;
  // SI-base value of one display SI unit; US conversions go through it
  const toBase = (x: UnitDef, v: number) => v * x.factor + (x.offset ?? 0);
  const fromBase = (x: UnitDef, b: number) => (b - (x.offset ?? 0)) / x.factor;
  return {
    id,
    label: s.label,
    siUnit: s.si,
    usUnit: s.us,
    siUnitId: si.id,
    usUnitId: us.id,
    decimals: { SI: s.decimals[0], US: s.decimals[1] },
    units: s.units,
    toUS: (v) => fromBase(us, toBase(si, v)),
    fromUS: (v) => fromBase(si, toBase(us, v)),
  };
}

/** The quantity registry. Values held in SI are in each quantity's `siUnit`. */
export const QUANTITIES: Readonly<Record<QuantityId, Quantity>> = Object.freeze(
  Object.fromEntries(Object.entries(SPECS).map(([id, s]) => [id, build(id as QuantityId, s)])) as Record<QuantityId, Quantity>,
);

/** Convert a value between two units of one quantity (unit ids or aliases). Throws on an unknown unit. */
export function convert(q: QuantityId, value: number, from: string, to: string): number {
  const a = findUnit(q, from);
  const b = findUnit(q, to);
  if (!a) throw new Error(`unknown unit "${from}" for ${QUANTITIES[q].label.toLowerCase()}`);
  if (!b) throw new Error(`unknown unit "${to}" for ${QUANTITIES[q].label.toLowerCase()}`);
  return (value * a.factor + (a.offset ?? 0) - (b.offset ?? 0)) / b.factor;
}

const compact = (s: string) => s.trim().toLowerCase().replace(/\s+/g, '');

/** The unit of quantity q written as `text` (id or alias, case- and space-insensitive, optionally in brackets), or undefined. */
export function findUnit(q: QuantityId, text: string): UnitDef | undefined {
  const raw = compact(text);
  const bare = raw.replace(/^[[(](.*)[\])]$/, '$1');
  return QUANTITIES[q].units.find((x) => x.aliases.some((a) => compact(a) === raw || compact(a) === bare));
}

/** Value in the quantity's SI unit → value in the given unit (id or alias). */
export const fromSI = (q: QuantityId, si: number, unit: string): number => convert(q, si, QUANTITIES[q].siUnit, unit);
/** Value in the given unit (id or alias) → the quantity's SI unit. */
export const toSI = (q: QuantityId, v: number, unit: string): number => convert(q, v, unit, QUANTITIES[q].siUnit);

/** Unit label shown for quantity q in a unit system. */
export const unitLabel = (q: QuantityId, system: UnitSystem): string =>
  system === 'US' ? QUANTITIES[q].usUnit : QUANTITIES[q].siUnit;

/** SI value → value shown in the unit system. */
export const toDisplay = (q: QuantityId, si: number, system: UnitSystem): number =>
  system === 'US' ? QUANTITIES[q].toUS(si) : si;
/** Value entered in the unit system → SI. */
export const fromDisplay = (q: QuantityId, v: number, system: UnitSystem): number =>
  system === 'US' ? QUANTITIES[q].fromUS(v) : v;

/**
 * SI value formatted in the unit system (no unit); '–' for a missing value. Four significant figures
 * (shared/numberFormat.ts), never more decimals than the quantity's usual ones; `decimals` fixes them instead.
 */
export function formatQuantity(q: QuantityId, si: number | null | undefined, system: UnitSystem, decimals?: number): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '–';
  const v = toDisplay(q, si, system);
  if (decimals !== undefined)
    return v.toLocaleString('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
  return formatSig(v, { sig: 4, maxDecimals: QUANTITIES[q].decimals[system] });
}

// ---- tray pressure drop as people read it ----
/** Units a tray ΔP is shown in: head of the tray's own liquid (mm or in), or pressure (mbar, psi). */
export const PRESSURE_DROP_UNITS = ['mm-liquid', 'in-liquid', 'mbar', 'psi'] as const;
export type PressureDropUnit = (typeof PRESSURE_DROP_UNITS)[number];
export const PRESSURE_DROP_UNIT_LABELS: Readonly<Record<PressureDropUnit, string>> = {
  'mm-liquid': 'mm liquid',
  'in-liquid': 'in liquid',
  mbar: 'mbar',
  psi: 'psi',
};
/**
 * Gravity used to turn a ΔP back into a head: the engine's own 9.81 m/s² (server/engine/units.ts `G`, which made
 * the ΔP from the head), so the head shown is the engine's head; standard gravity is 9.806 65 m/s² (0.04 % less).
 */
export const G_HEAD = 9.81;
/** A head of liquid [mm] of density ρL as a pressure drop [Pa]: ΔP = ρL g h (the engine's g, see G_HEAD). */
export const headToPressureDrop = (head_mm: number, liquidDensity_kg_m3: number): number =>
  (head_mm / 1000) * liquidDensity_kg_m3 * G_HEAD;
/** Head of liquid unless the user chose otherwise: mm in SI, inches in US customary. */
export const defaultPressureDropUnit = (system: UnitSystem): PressureDropUnit => (system === 'US' ? 'in-liquid' : 'mm-liquid');

/**
 * A tray ΔP in Pa in the chosen unit. Liquid head uses the tray's liquid density (h = ΔP/(ρL g)); without a
 * density the value is given in mbar (the caller's label must then say mbar: see pressureDropShownUnit).
 */
export function pressureDropIn(pa: number, unit: PressureDropUnit, liquidDensity_kg_m3?: number): number {
  const u = pressureDropShownUnit(unit, liquidDensity_kg_m3);
  if (u === 'mm-liquid') return (pa / (liquidDensity_kg_m3! * G_HEAD)) * 1000;
  if (u === 'in-liquid') return pa / (liquidDensity_kg_m3! * G_HEAD) / M_PER_IN;
  if (u === 'psi') return pa / PA_PER_PSI;
  return pa / 100;
}
/** The unit a ΔP is actually shown in: a head needs a liquid density, else mbar. */
export function pressureDropShownUnit(unit: PressureDropUnit, liquidDensity_kg_m3?: number): PressureDropUnit {
  const head = unit === 'mm-liquid' || unit === 'in-liquid';
  return head && !(liquidDensity_kg_m3 !== undefined && liquidDensity_kg_m3 > 0) ? 'mbar' : unit;
}
/** A tray ΔP in Pa as text in the chosen unit, three significant figures (no unit). */
export function formatPressureDrop(pa: number | null | undefined, unit: PressureDropUnit, liquidDensity_kg_m3?: number): string {
  if (pa === null || pa === undefined || !Number.isFinite(pa)) return '–';
  return formatSig(pressureDropIn(pa, unit, liquidDensity_kg_m3), { sig: 3 });
}

/** The quantity behind a unit string reported by the engine in `CheckResult.unit`. */
export function quantityOfEngineUnit(unit: string): QuantityId {
  switch (unit) {
    case 'Pa':
      return 'pressureDrop';
    case 'mm':
      return 'lengthSmall';
    case 'm/s':
      return 'velocity';
    case 'm3/(h m)':
      return 'weirLoading';
    case 's':
      return 'time';
    case 'kg/kg':
    case '-':
      return 'ratio';
    default:
      return 'percent';
  }
}

/** Which quantity a header's unit text belongs to, among the given candidates; undefined if none. */
export function detectUnit(text: string, candidates: QuantityId[]): { quantity: QuantityId; unit: UnitDef } | undefined {
  for (const q of candidates) {
    const unit = findUnit(q, text);
    if (unit) return { quantity: q, unit };
  }
  return undefined;
}

/**
 * A check's value and limit as people read them: a tray ΔP (engine unit Pa) in the chosen ΔP unit with the
 * tray's liquid density, other checks by their quantity in the unit system; `unit` is '' for a plain ratio.
 */
export function checkDisplay(
  c: { unit: string; value: number; limit: number },
  system: UnitSystem,
  dpUnit: PressureDropUnit,
  liquidDensity_kg_m3?: number,
): { value: string; limit: string; unit: string } {
  if (c.unit === 'Pa')
    return {
      value: formatPressureDrop(c.value, dpUnit, liquidDensity_kg_m3),
      limit: formatPressureDrop(c.limit, dpUnit, liquidDensity_kg_m3),
      unit: PRESSURE_DROP_UNIT_LABELS[pressureDropShownUnit(dpUnit, liquidDensity_kg_m3)],
    };
  const q = quantityOfEngineUnit(c.unit);
  const unit = q === 'percent' ? (c.unit === '%' ? '%' : c.unit) : q === 'ratio' ? '' : unitLabel(q, system);
  return { value: formatQuantity(q, c.value, system), limit: formatQuantity(q, c.limit, system), unit };
}
