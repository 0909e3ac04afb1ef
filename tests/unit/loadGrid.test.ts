import { describe, expect, it } from 'vitest';
import { GRID_COLUMNS, useLoadGrid } from '../../src/composables/useLoadGrid.js';

const load = {
  tray: 3,
  vapourMassFlow_kg_h: 45359.237,
  liquidMassFlow_kg_h: 20000,
  vapourDensity_kg_m3: 3.2,
  liquidDensity_kg_m3: 700,
  surfaceTension_mN_m: 18,
};

describe('load grid (paste, units, cell errors)', () => {
  it('shows SI loads in US units for a US user and returns SI again', () => {
    const g = useLoadGrid('US');
    g.setLoads([load]);
    expect(g.rows.value[0]![1]).toBe('100000'); // 45 359.237 kg/h = 100 000 lb/h (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8)
    const { loads, errors } = g.toLoads();
    expect(errors).toEqual([]);
    expect(loads[0]!.vapourMassFlow_kg_h).toBeCloseTo(45359.237, 6);
    expect(loads[0]!.liquidDensity_kg_m3).toBeCloseTo(700, 2);
  });

  it('converts a column when its unit changes, so the stored value stays the same', () => {
    const g = useLoadGrid('SI');
    g.setLoads([load]);
    g.setUnit(1, 't/h');
    expect(g.rows.value[0]![1]).toBe('45.3592');
    expect(g.toLoads().loads[0]!.vapourMassFlow_kg_h).toBeCloseTo(45359.2, 1);
  });

  it('pastes a tab-separated block from its top-left cell, adding rows and dropping thousands separators', () => {
    const g = useLoadGrid('SI');
    g.setLoads([load]);
    const n = g.paste(0, 0, '1\t250,000\t140000\t3.1\t690\t19.5\r\n2\t249000\t139000\t3.15\t692\t19.4\r\n');
    expect(n).toBe(2);
    expect(g.rows.value).toHaveLength(2);
    expect(g.rows.value[0]!.slice(0, 3)).toEqual(['1', '250000', '140000']);
    expect(g.toLoads().errors).toEqual([]);
  });

  it('names the row, column and fault of every bad cell', () => {
    const g = useLoadGrid('SI');
    g.paste(0, 0, '1\tlots\t140000\t3.1\t690\t19.5\n1\t249000\t-5\t800\t692\t\n');
    const { errors } = g.toLoads();
    const text = errors.map((e) => `${e.row + 1}/${GRID_COLUMNS[e.col]!.label}: ${e.message}`);
    // the wording of the loads API and the import (shared/trayLoadRules.ts); a row with a bad field is not
    // checked across fields until the field is fixed
    expect(text).toEqual(['1/Vapour: "lots" is not a number', '2/Liquid: must be >= 0', '2/Surface tension: is required']);
    g.rows.value[0]![1] = '250000';
    g.rows.value[1]![2] = '139000';
    g.rows.value[1]![5] = '19';
    expect(g.toLoads().errors.map((e) => `${e.row + 1}/${GRID_COLUMNS[e.col]!.label}: ${e.message}`)).toEqual([
      '2/Tray: tray 1 appears twice (also in row 1)',
      '2/ρ vapour: vapour density (800 kg/m³) must be below the liquid density (692 kg/m³)',
    ]);
  });

  it('reads numbers as the import does: thousands commas with a decimal point, no guessing at "1 234,5"', () => {
    const g = useLoadGrid('SI');
    g.setLoads([load]);
    g.rows.value[0]![2] = '20,000.5';
    expect(g.toLoads().loads[0]!.liquidMassFlow_kg_h).toBe(20000.5);
    g.rows.value[0]![2] = '20000,5';
    expect(g.toLoads().errors).toEqual([{ row: 0, col: 2, message: '"20000,5" is not a number' }]);
  });
});
