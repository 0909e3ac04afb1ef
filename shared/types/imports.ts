/**
 * CSV/XLSX tray-profile import: upload → preview (detected header, mapping, units, numbering, per-row
 * errors) → commit (all-or-nothing: one bad row stores nothing).
 */
import type { TrayNumbering } from './columns.js';
import type { LoadBasis, PumpAroundDutyTag, StageMapEntry } from './loads.js';

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

/** field → index of the file column (0-based) holding it */
export type ImportMapping = Partial<Record<ImportField, number>>;
/** field → unit of that file column (only fields with a physical unit) */
export type ImportUnits = Partial<Record<ImportField, ImportUnit>>;

/**
 * How the file numbers its rows: by actual tray or by simulation stage, and in which direction.
 * Stored tray numbers always follow the column's direction: a file numbered the other way is flipped
 * (tray → trayCount + 1 − tray). Stages map to trays through stageMap when given, else tray = stage − stageOffset.
 */
export interface ImportNumbering {
  key: 'tray' | 'stage';
  direction: TrayNumbering;
  /** e.g. 1 when stage 1 is the condenser (default 0) */
  stageOffset?: number;
  stageMap?: StageMapEntry[];
}

export type { ImportCheckResult, ImportPreview } from '../contract/imports.js';
export type { ImportRowError } from '../contract/importRows.js';

/** POST /columns/:id/imports/commit */
export interface ImportCommitBody {
  /** from the preview; or send headers + rows instead */
  token?: string;
  headers?: string[];
  rows?: string[][];
  /** 1-based file row of the first data row (for error row numbers; default 2) */
  firstDataRow?: number;
  mapping: ImportMapping;
  units: ImportUnits;
  numbering: ImportNumbering;
  name: string;
  basis: LoadBasis;
  fileName: string;
  notes?: string;
  /** the pump-around duties a simulation case was made at (optional; heat-recovery plans calibrate against them) */
  pumpAroundDuties?: PumpAroundDutyTag[];
}

/** POST /columns/:id/imports/check: the commit body without name, basis, file name, notes and duty tags; stores nothing. */
export type ImportCheckBody = Omit<ImportCommitBody, 'name' | 'basis' | 'fileName' | 'notes' | 'pumpAroundDuties'>;
