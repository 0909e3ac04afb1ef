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
    expect(text).toContain('1/Vapour: Vapour: "lots" is not a number');
    expect(text.some((t) => t.startsWith('2/Liquid: Liquid -5 kg/h is outside'))).toBe(true);
    expect(text).toContain('2/Surface tension: Surface tension is missing');
    expect(text).toContain('2/Tray: Tray 1 also on row 1');
    expect(text).toContain('2/ρ vapour: Vapour density must be below the liquid density');
  });
});
