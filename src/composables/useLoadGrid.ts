import { computed, ref } from 'vue';
import { trayLoadSchema } from '../../shared/schemas/ratingRequest';
import { QUANTITIES, convert, type QuantityId } from '../../shared/units';
import type { TrayLoad } from '../../shared/types/rating';
import type { UnitSystem } from '../../shared/types/api';

export interface GridColumn {
  key: keyof TrayLoad;
  label: string;
  quantity: QuantityId | null;
  optional: boolean;
}

export const GRID_COLUMNS: GridColumn[] = [
  { key: 'tray', label: 'Tray', quantity: null, optional: false },
  { key: 'vapourMassFlow_kg_h', label: 'Vapour', quantity: 'massFlow', optional: false },
  { key: 'liquidMassFlow_kg_h', label: 'Liquid', quantity: 'massFlow', optional: false },
  { key: 'vapourDensity_kg_m3', label: 'ρ vapour', quantity: 'density', optional: false },
  { key: 'liquidDensity_kg_m3', label: 'ρ liquid', quantity: 'density', optional: false },
  { key: 'surfaceTension_mN_m', label: 'Surface tension', quantity: 'surfaceTension', optional: false },
  { key: 'liquidViscosity_mPa_s', label: 'Viscosity', quantity: 'viscosity', optional: true },
  { key: 'temperature_C', label: 'Temperature', quantity: 'temperature', optional: true },
  { key: 'pressure_kPa', label: 'Pressure', quantity: 'pressure', optional: true },
];

export interface CellError {
  row: number;
  col: number;
  message: string;
}

type Bound = { minimum?: number; exclusiveMinimum?: number; maximum?: number };
const BOUNDS = trayLoadSchema.properties as unknown as Record<string, Bound>;
/** six significant digits: enough for loads and properties, and clean to read */
const fmt = (n: number) => String(Number(n.toPrecision(6)));

/** The editable per-tray grid: cells as text in each column's chosen unit; SI in and out. */
export function useLoadGrid(system: UnitSystem) {
  const units = ref<string[]>(
    GRID_COLUMNS.map((c) =>
      c.quantity ? (system === 'US' ? QUANTITIES[c.quantity].usUnitId : QUANTITIES[c.quantity].siUnitId) : '',
    ),
  );
  const rows = ref<string[][]>([]);
  /** the rows as last loaded or saved (converted along with them), to tell unsaved edits */
  const saved = ref<string[][]>([]);
  const dirty = computed(() => JSON.stringify(rows.value) !== JSON.stringify(saved.value));

  function setLoads(loads: TrayLoad[]): void {
    rows.value = loads.map((l) =>
      GRID_COLUMNS.map((c, i) => {
        const v = l[c.key];
        if (v === undefined) return '';
        return c.quantity ? fmt(convert(c.quantity, v, QUANTITIES[c.quantity].siUnit, units.value[i]!)) : String(v);
      }),
    );
    saved.value = rows.value.map((r) => [...r]);
  }

  /** Change a column's unit, converting the numbers already in it. */
  function setUnit(col: number, unit: string): void {
    const q = GRID_COLUMNS[col]?.quantity;
    const from = units.value[col];
    if (!q || !from) return;
    for (const r of [...rows.value, ...saved.value]) {
      const n = Number(r[col]);
      if (r[col] !== '' && Number.isFinite(n)) r[col] = fmt(convert(q, n, from, unit));
    }
    units.value[col] = unit;
  }

  /** Paste a tab-separated block (rows by newline) with its top-left cell at (row, col). */
  function paste(row: number, col: number, text: string): number {
    const block = text
      .replace(/\r/g, '')
      .replace(/\n+$/, '')
      .split('\n')
      .map((l) => l.split('\t'));
    block.forEach((cells, i) => {
      const r = row + i;
      while (rows.value.length <= r) rows.value.push(GRID_COLUMNS.map(() => ''));
      cells.forEach((cell, j) => {
        if (col + j < GRID_COLUMNS.length) rows.value[r]![col + j] = cell.trim().replace(/,(?=\d{3}\b)/g, '');
      });
    });
    return block.length;
  }

  function addRow(): void {
    const last = rows.value[rows.value.length - 1];
    const next = last && Number.isInteger(Number(last[0])) ? String(Number(last[0]) + 1) : String(rows.value.length + 1);
    rows.value.push(GRID_COLUMNS.map((_, i) => (i === 0 ? next : '')));
  }
  function removeRow(i: number): void {
    rows.value.splice(i, 1);
  }

  /** Loads in SI, and an error per bad cell (row, column, what is wrong). */
  function toLoads(): { loads: TrayLoad[]; errors: CellError[] } {
    const errors: CellError[] = [];
    const seen = new Map<number, number>();
    const loads = rows.value.map((cells, r) => {
      const out: Record<string, number> = {};
      GRID_COLUMNS.forEach((c, i) => {
        const text = (cells[i] ?? '').trim();
        if (text === '') {
          if (!c.optional) errors.push({ row: r, col: i, message: `${c.label} is missing` });
          return;
        }
        const n = Number(text);
        if (!Number.isFinite(n)) return void errors.push({ row: r, col: i, message: `${c.label}: "${text}" is not a number` });
        const si = c.quantity ? convert(c.quantity, n, units.value[i]!, QUANTITIES[c.quantity].siUnit) : n;
        const b = BOUNDS[c.key] ?? {};
        const lo = b.minimum ?? b.exclusiveMinimum;
        if (
          (lo !== undefined && (b.exclusiveMinimum !== undefined ? si <= lo : si < lo)) ||
          (b.maximum !== undefined && si > b.maximum)
        ) {
          const u = c.quantity ? units.value[i]! : '';
          const show = (x: number) => fmt(c.quantity ? convert(c.quantity, x, QUANTITIES[c.quantity].siUnit, u) : x);
          errors.push({
            row: r,
            col: i,
            message: `${c.label} ${text} ${u} is outside ${show(lo ?? 0)}…${show(b.maximum ?? Infinity)} ${u}`.trim(),
          });
        }
        if (c.key === 'tray' && !Number.isInteger(n)) errors.push({ row: r, col: i, message: 'Tray must be a whole number' });
        out[c.key] = si;
      });
      if (out.tray !== undefined) {
        const prev = seen.get(out.tray);
        if (prev !== undefined) errors.push({ row: r, col: 0, message: `Tray ${out.tray} also on row ${prev + 1}` });
        else seen.set(out.tray, r);
      }
      if (
        out.vapourDensity_kg_m3 !== undefined &&
        out.liquidDensity_kg_m3 !== undefined &&
        out.vapourDensity_kg_m3 >= out.liquidDensity_kg_m3
      )
        errors.push({ row: r, col: 3, message: 'Vapour density must be below the liquid density' });
      return out as unknown as TrayLoad;
    });
    return { loads: [...loads].sort((a, b) => a.tray - b.tray), errors };
  }

  return { units, rows, dirty, setLoads, setUnit, paste, addRow, removeRow, toLoads };
}
