/**
 * Convert confirmed import rows to SI TrayLoad rows with stored tray numbers, collecting every fault as
 * { row, column, message }: numbers, units (shared/units.ts), the engine's per-tray schema (ajv), tray range,
 * duplicates and vapour density below liquid density.
 */
import { Ajv } from 'ajv';
import { trayLoadSchema } from '../../../shared/schemas/ratingRequest.js';
import { toSI } from '../../../shared/units.js';
import { FIELD_QUANTITY, defaultUnit } from './importsDetect.js';
import type { TrayNumbering } from '../../../shared/types/columns.js';
import type { ImportField, ImportMapping, ImportNumbering, ImportRowError, ImportUnits } from '../../../shared/types/imports.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

const ajv = new Ajv({ allErrors: true, strict: false });
const validateLoad = ajv.compile<TrayLoad>(trayLoadSchema);

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
const FIELD_OF = Object.fromEntries(Object.entries(TARGET).map(([f, k]) => [k, f])) as Record<string, ImportField>;
const REQUIRED: ImportField[] = ['vapourMassFlow', 'liquidMassFlow', 'vapourDensity', 'liquidDensity', 'surfaceTension'];

/** "1 234.5", "1,234.5" and "1234,5" are not guessed at: only plain numbers, optional thousands commas with a decimal point. */
export function parseNumber(text: string): number | null {
  const t = text.trim().replace(/\s+/g, '');
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) return Number(t.replace(/,/g, ''));
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) return null;
  return Number(t);
}

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
        if (REQUIRED.includes(f) || f === key) rowErrors.push({ row, column: colName(f), message: 'is empty' });
        continue;
      }
      const n = parseNumber(text);
      if (n === null || !Number.isFinite(n)) {
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
      if (tray < 1 || tray > inp.trayCount) {
        rowErrors.push({
          row,
          column: colName(key),
          message: `gives tray ${tray}, outside the column (trays 1–${inp.trayCount})`,
        });
        continue;
      }
      const prev = firstRowOfTray.get(tray);
      if (prev !== undefined) rowErrors.push({ row, column: colName(key), message: `tray ${tray} already given in row ${prev}` });
      else firstRowOfTray.set(tray, row);
    }
    if (rowErrors.length === 0) {
      const base: Record<string, number> = {};
      for (const [f, k] of Object.entries(TARGET))
        if (values[f as ImportField] !== undefined) base[k] = values[f as ImportField]!;
      for (const tray of trays) {
        const load = { tray, ...base } as unknown as TrayLoad;
        if (!validateLoad(load)) {
          for (const e of validateLoad.errors ?? []) {
            const k = e.instancePath.replace(/^\//, '');
            const f = FIELD_OF[k];
            rowErrors.push({
              row,
              column: f ? colName(f) : k || '(row)',
              message: `${e.message ?? 'is invalid'} (in SI${f && FIELD_QUANTITY[f] ? `, after conversion from ${inp.units[f] ?? defaultUnit(f)}` : ''}; value ${base[k]?.toPrecision(4) ?? '?'})`,
            });
          }
          break;
        }
        if (!(load.vapourDensity_kg_m3 < load.liquidDensity_kg_m3)) {
          rowErrors.push({
            row,
            column: colName('vapourDensity'),
            message: `vapour density (${load.vapourDensity_kg_m3.toPrecision(4)} kg/m³) must be below the liquid density (${load.liquidDensity_kg_m3.toPrecision(4)} kg/m³)`,
          });
          break;
        }
        loads.push(load);
      }
    }
    errors.push(...rowErrors);
  });
  if (loads.length === 0 && errors.length === 0)
    errors.push({ row: inp.firstDataRow, column: '(file)', message: 'has no data rows' });
  loads.sort((a, b) => a.tray - b.tray);
  return { loads, errors };
}
