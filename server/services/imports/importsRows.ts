/**
 * Convert confirmed import rows to SI TrayLoad rows with stored tray numbers, collecting every fault as
 * { row, column, message }: numbers and units (shared/units.ts), then the per-tray load rules
 * (shared/trayLoadRules.ts, as the grid and the loads API word them): bounds, vapour density below liquid
 * density, tray range and duplicates.
 */
import { fieldFault, densityFault, parseLoadNumber, trayGivenTwice, trayOutsideColumn } from '../../../shared/trayLoadRules.js';
import { toSI } from '../../../shared/units.js';
import { FIELD_QUANTITY, defaultUnit } from './importsDetect.js';
import type { TrayNumbering } from '../../../shared/types/columns.js';
import type { ImportField, ImportMapping, ImportNumbering, ImportRowError, ImportUnits } from '../../../shared/types/imports.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

const TARGET: Partial<Record<ImportField, keyof TrayLoad>> = {
  vapourMassFlow: 'vapourMassFlow_kg_h',
  liquidMassFlow: 'liquidMassFlow_kg_h',
  vapourDensity: 'vapourDensity_kg_m3',
  liquidDensity: 'liquidDensity_kg_m3',
  surfaceTension: 'surfaceTension_mN_m',
  liquidViscosity: 'liquidViscosity_mPa_s',
  temperature: 'temperature_C',
  pressure: 'pressure_kPa',
};
const REQUIRED: ImportField[] = ['vapourMassFlow', 'liquidMassFlow', 'vapourDensity', 'liquidDensity', 'surfaceTension'];

export interface ConvertInput {
  headers: string[];
  rows: string[][];
  /** 1-based file row of rows[0] */
  firstDataRow: number;
  mapping: ImportMapping;
  units: ImportUnits;
  numbering: ImportNumbering;
  trayCount: number;
  columnDirection: TrayNumbering;
}

export function convertRows(inp: ConvertInput): { loads: TrayLoad[]; errors: ImportRowError[] } {
  /** a bound is in SI: say so when the file's unit is another */
  const convertedFrom = (f: ImportField, si: number | undefined): string => {
    const unit = inp.units[f] ?? defaultUnit(f);
    return FIELD_QUANTITY[f] && unit !== defaultUnit(f) && si !== undefined
      ? ` (in SI, after conversion from ${unit}: ${Number(si.toPrecision(6))})`
      : '';
  };
  const errors: ImportRowError[] = [];
  const loads: TrayLoad[] = [];
  const colName = (f: ImportField): string => {
    const c = inp.mapping[f];
    return c !== undefined ? (inp.headers[c] ?? `column ${c + 1}`) : f;
  };
  const key = inp.numbering.key;
  for (const f of [key, ...REQUIRED])
    if (inp.mapping[f] === undefined)
      errors.push({ row: inp.firstDataRow - 1, column: f, message: `no file column is mapped to ${f} (required)` });
  if (errors.length) return { loads, errors };
  const flip = inp.numbering.direction !== inp.columnDirection;
  const firstRowOfTray = new Map<number, number>();
  inp.rows.forEach((cells, i) => {
    const row = inp.firstDataRow + i;
    if (cells.every((c) => !c || !c.trim())) return;
    const rowErrors: ImportRowError[] = [];
    const values: Partial<Record<ImportField, number>> = {};
    for (const [f, c] of Object.entries(inp.mapping) as [ImportField, number][]) {
      const text = (cells[c] ?? '').trim();
      if (!text) {
        if (REQUIRED.includes(f) || f === key) rowErrors.push({ row, column: colName(f), message: 'is required' });
        continue;
      }
      const n = parseLoadNumber(text);
      if (n === null) {
        rowErrors.push({ row, column: colName(f), message: `"${text}" is not a number` });
        continue;
      }
      const q = FIELD_QUANTITY[f];
      values[f] = q ? toSI(q, n, inp.units[f] ?? defaultUnit(f)) : n;
    }
    const id = values[key];
    let trays: number[] = [];
    if (id !== undefined && !Number.isInteger(id))
      rowErrors.push({ row, column: colName(key), message: `${key} number ${id} is not a whole number` });
    else if (id !== undefined) {
      if (key === 'stage' && inp.numbering.stageMap?.length) {
        const m = inp.numbering.stageMap.find((s) => s.stage === id);
        if (!m) rowErrors.push({ row, column: colName(key), message: `stage ${id} is not in the stage-to-tray map` });
        else for (let t = m.firstTray; t <= m.lastTray; t++) trays.push(t);
      } else {
        const t = key === 'stage' ? id - (inp.numbering.stageOffset ?? 0) : id;
        trays = [flip ? inp.trayCount + 1 - t : t];
      }
    }
    for (const tray of trays) {
      const outside = trayOutsideColumn(tray, inp.trayCount);
      if (outside) {
        rowErrors.push({ row, column: colName(key), message: outside });
        continue;
      }
      const prev = firstRowOfTray.get(tray);
      if (prev !== undefined) rowErrors.push({ row, column: colName(key), message: trayGivenTwice(tray, prev) });
      else firstRowOfTray.set(tray, row);
    }
    if (rowErrors.length === 0) {
      const base: Record<string, number> = {};
      for (const [f, k] of Object.entries(TARGET))
        if (values[f as ImportField] !== undefined) base[k] = values[f as ImportField]!;
      // the per-tray rules on the SI values; the tray itself was checked above
      for (const [f, k] of Object.entries(TARGET) as [ImportField, keyof TrayLoad][]) {
        const message = fieldFault(k, base[k]);
        if (message) rowErrors.push({ row, column: colName(f), message: message + convertedFrom(f, base[k]) });
      }
      const density = rowErrors.length ? null : densityFault(base);
      if (density) rowErrors.push({ row, column: colName('vapourDensity'), message: density });
      if (rowErrors.length === 0) for (const tray of trays) loads.push({ tray, ...base } as unknown as TrayLoad);
    }
    errors.push(...rowErrors);
  });
  if (loads.length === 0 && errors.length === 0)
    errors.push({ row: inp.firstDataRow, column: '(file)', message: 'has no data rows' });
  loads.sort((a, b) => a.tray - b.tray);
  return { loads, errors };
}
