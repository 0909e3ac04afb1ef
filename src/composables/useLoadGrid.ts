import { computed, ref } from 'vue';
import { parseLoadNumber, trayLoadFaults } from '../../shared/trayLoadRules';
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

const COLUMN_OF = Object.fromEntries(GRID_COLUMNS.map((c, i) => [c.key, i])) as Record<keyof TrayLoad, number>;
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
      const n = parseLoadNumber(r[col] ?? '');
      if (n !== null) r[col] = fmt(convert(q, n, from, unit));
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

  /**
   * Loads in SI, and an error per bad cell (row, column, what is wrong): the numbers read by the shared
   * parser, then the per-tray load rules the loads API and the import apply (shared/trayLoadRules.ts).
   */
  function toLoads(): { loads: TrayLoad[]; errors: CellError[] } {
    const errors: CellError[] = [];
    const unreadable = new Set<string>();
    const loads = rows.value.map((cells, r) => {
      const out: Record<string, number> = {};
      GRID_COLUMNS.forEach((c, i) => {
        const text = (cells[i] ?? '').trim();
        if (text === '') return;
        const n = parseLoadNumber(text);
        if (n === null) {
          unreadable.add(`${r}:${c.key}`);
          return void errors.push({ row: r, col: i, message: `"${text}" is not a number` });
        }
        out[c.key] = c.quantity ? convert(c.quantity, n, units.value[i]!, QUANTITIES[c.quantity].siUnit) : n;
      });
      return out as unknown as TrayLoad;
    });
    for (const f of trayLoadFaults(loads))
      if (!unreadable.has(`${f.index}:${f.field}`)) errors.push({ row: f.index, col: COLUMN_OF[f.field], message: f.message });
    errors.sort((a, b) => a.row - b.row || a.col - b.col);
    return { loads: [...loads].sort((a, b) => a.tray - b.tray), errors };
  }

  return { units, rows, dirty, setLoads, setUnit, paste, addRow, removeRow, toLoads };
}
