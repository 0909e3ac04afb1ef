/**
 * CSV/XLSX tray-profile import: upload → preview (detected header, mapping, units, numbering, per-row
 * errors) → commit (all-or-nothing: one bad row stores nothing).
 */

/** Fields an import column can map to. */
export const IMPORT_FIELDS = [
  'tray',
  'stage',
  'vapourMassFlow',
  'liquidMassFlow',
  'vapourDensity',
  'liquidDensity',
  'surfaceTension',
  'liquidViscosity',
  'temperature',
  'pressure',
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** Unit ids accepted per field: the ids of shared/units.ts (SI unit first). */
export const MASS_FLOW_UNITS = ['kg/h', 'lb/h', 't/h', 'klb/h'] as const;
export const DENSITY_UNITS = ['kg/m3', 'lb/ft3'] as const;
export const SURFACE_TENSION_UNITS = ['mN/m', 'dyn/cm'] as const;
export const VISCOSITY_UNITS = ['mPa.s', 'cP'] as const;
export const TEMPERATURE_UNITS = ['C', 'F'] as const;
/** absolute, then gauge (made absolute with the standard atmosphere) */
export const PRESSURE_UNITS = ['kPa', 'bar', 'psia', 'kPag', 'barg', 'psig'] as const;
export const GAUGE_PRESSURE_UNITS: readonly ImportUnit[] = ['kPag', 'barg', 'psig'];
export type ImportUnit =
  | (typeof MASS_FLOW_UNITS)[number]
  | (typeof DENSITY_UNITS)[number]
  | (typeof SURFACE_TENSION_UNITS)[number]
  | (typeof VISCOSITY_UNITS)[number]
  | (typeof TEMPERATURE_UNITS)[number]
  | (typeof PRESSURE_UNITS)[number];

export type {
  ImportCheckBody,
  ImportCommitBody,
  ImportMapping,
  ImportNumbering,
  ImportUnits,
} from '../contract/importPayloads.js';
export type { ImportCheckResult, ImportPreview } from '../contract/imports.js';
export type { ImportRowError } from '../contract/importRows.js';
