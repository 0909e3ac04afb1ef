/**
 * The per-tray load rules, written once for the load grid (src/composables/useLoadGrid.ts), the loads API
 * (server/services/loads/), the tray-profile import (server/services/imports/importsRows.ts) and the
 * engine's request check (server/engine/validate.ts): one number parser, the bounds of trayLoadSchema in
 * the wording of the API's schema errors (shared/contract/fieldErrors.ts: 'is required', 'must be >= 0'),
 * vapour lighter than liquid, trays inside the column and given once. Plain code, no ajv: the browser runs it
 * too. tests/api/loadRulesParity.test.ts checks that the three entry points give the same error.
 */
import { trayLoadSchema } from './schemas/ratingRequest.js';
import type { TrayLoad } from './types/rating.js';

export type TrayLoadField = keyof TrayLoad;
export interface TrayLoadFault {
  /** index of the row in the list checked */
  index: number;
  field: TrayLoadField;
  message: string;
}

/**
 * A number as typed or read from a file: plain decimals with an optional exponent, or thousands separated
 * by commas with a decimal point ("1,234.5"). "1 234.5" and "1234,5" are not guessed at. Null if not a number.
 */
export function parseLoadNumber(text: string): number | null {
  const t = text.trim().replace(/\s+/g, '');
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) return Number(t.replace(/,/g, ''));
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

/** six significant digits, as the grid shows numbers: converted values read cleanly */
const sig = (x: number): string => String(Number(x.toPrecision(6)));

type Bound = { type: string; minimum?: number; exclusiveMinimum?: number; maximum?: number };
const BOUNDS = trayLoadSchema.properties as unknown as Record<TrayLoadField, Bound>;
export const TRAY_LOAD_FIELDS = Object.keys(BOUNDS) as TrayLoadField[];
export const REQUIRED_TRAY_LOAD_FIELDS: readonly TrayLoadField[] = trayLoadSchema.required;

/** One field's fault against trayLoadSchema, worded as the API's schema errors are; null when it passes. */
export function fieldFault(field: TrayLoadField, value: unknown): string | null {
  const b = BOUNDS[field];
  if (value === undefined || value === null) return REQUIRED_TRAY_LOAD_FIELDS.includes(field) ? 'is required' : null;
  if (typeof value !== 'number' || !Number.isFinite(value)) return 'must be number';
  if (b.type === 'integer' && !Number.isInteger(value)) return 'must be integer';
  if (b.minimum !== undefined && value < b.minimum) return `must be >= ${b.minimum}`;
  if (b.exclusiveMinimum !== undefined && value <= b.exclusiveMinimum) return `must be > ${b.exclusiveMinimum}`;
  if (b.maximum !== undefined && value > b.maximum) return `must be <= ${b.maximum}`;
  return null;
}

/** Vapour must be lighter than the liquid (on vapourDensity_kg_m3); null when it is, or a density is missing. */
export function densityFault(load: Partial<TrayLoad>): string | null {
  const v = load.vapourDensity_kg_m3;
  const l = load.liquidDensity_kg_m3;
  if (v === undefined || l === undefined || v < l) return null;
  return `vapour density (${sig(v)} kg/m³) must be below the liquid density (${sig(l)} kg/m³)`;
}

export const trayOutsideColumn = (tray: number, trayCount: number): string | null =>
  tray < 1 || tray > trayCount ? `tray ${tray} is outside the column (trays 1–${trayCount})` : null;

/** A tray given a second time; `firstRow` is the 1-based row (of the grid, the file or the request's trays) that gave it first. */
export const trayGivenTwice = (tray: number, firstRow: number): string => `tray ${tray} appears twice (also in row ${firstRow})`;

/**
 * Every fault of a list of per-tray rows (fields absent where not given): each field against its bounds,
 * vapour lighter than liquid, then, across rows, the tray inside the column (when trayCount is given) and
 * each tray given once. `checkFields: false` skips the per-field bounds (already checked by the API schema).
 */
export function trayLoadFaults(
  rows: readonly Partial<Record<TrayLoadField, unknown>>[],
  opts: { trayCount?: number; checkFields?: boolean } = {},
): TrayLoadFault[] {
  const faults: TrayLoadFault[] = [];
  const firstRowOf = new Map<number, number>();
  rows.forEach((row, index) => {
    let fieldsOk = true;
    if (opts.checkFields !== false)
      for (const field of TRAY_LOAD_FIELDS) {
        const message = fieldFault(field, row[field]);
        if (message) {
          faults.push({ index, field, message });
          fieldsOk = false;
        }
      }
    if (!fieldsOk) return;
    const load = row as Partial<TrayLoad>;
    const density = densityFault(load);
    if (density) faults.push({ index, field: 'vapourDensity_kg_m3', message: density });
    if (load.tray === undefined) return;
    const outside = opts.trayCount !== undefined ? trayOutsideColumn(load.tray, opts.trayCount) : null;
    if (outside) faults.push({ index, field: 'tray', message: outside });
    const first = firstRowOf.get(load.tray);
    if (first !== undefined) faults.push({ index, field: 'tray', message: trayGivenTwice(load.tray, first + 1) });
    else firstRowOf.set(load.tray, index);
  });
  return faults;
}
