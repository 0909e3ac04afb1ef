/**
 * CSV/XLSX tray-profile import: upload → preview (detected header, mapping, units, numbering, per-row
 * errors) → commit (all-or-nothing: one bad row stores nothing).
 */
import type { TrayNumbering } from './columns.js';
import type { LoadBasis, PumpAroundDutyTag, StageMapEntry } from './loads.js';
import type { TrayLoad } from './rating.js';

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

export interface ImportRowError {
  /** 1-based row number in the file (as a spreadsheet shows it) */
  row: number;
  /** header text of the file column, or the field name when the column is missing */
  column: string;
  message: string;
}

export interface ImportPreview {
  /** pass back to check and commit instead of re-sending the rows; valid for 30 minutes, same user and column */
  token: string;
  fileName: string;
  format: 'csv' | 'xlsx';
  sheet: string | null;
  /** 1-based row of the detected header */
  headerRow: number;
  headers: string[];
  /** the first data rows as read (cells as text, long ones clipped), after the header: IMPORT_LIMITS.previewRows */
  rows: string[][];
  /** data rows read (the token keeps them all) */
  rowCount: number;
  /** set when the file was cut at the row limit: the last row read (the file continues after it) */
  cutAfterRow: number | null;
  mapping: ImportMapping;
  units: ImportUnits;
  numbering: ImportNumbering;
  /** loads converted to SI with stored tray numbers (rows with errors left out) */
  loads: TrayLoad[];
  /** the first row errors (IMPORT_LIMITS.listedErrors) */
  errors: ImportRowError[];
  /** how many row errors there are */
  errorCount: number;
  /** notes on reading and detection (rows cut, unmapped columns, assumed units, guessed direction) */
  notes: string[];
}

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

/** Answer of the check: the converted loads (SI, stored tray numbers), the first row errors and their count. */
export interface ImportCheckResult {
  loads: TrayLoad[];
  errors: ImportRowError[];
  errorCount: number;
}
