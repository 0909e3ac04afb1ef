import { describe, expect, it } from 'vitest';
import {
  KG_M3_PER_LB_FT3,
  M2_PER_FT2,
  M3_S_PER_USGPM,
  MM_PER_IN,
  QUANTITIES,
  convert,
  detectUnit,
  findUnit,
  formatQuantity,
  fromDisplay,
  toDisplay,
  unitLabel,
  type QuantityId,
} from '../../shared/units.js';

/**
 * Published factors. "exact" = exact by definition; the others are the rounded values printed in
 * NIST SP 811 (2008), Appendix B.8 (recalled from the table, 7 significant digits), so the tolerance is
 * half a unit in their last printed digit.
 */
describe('conversions against published factors', () => {
  const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

  it('mass flow', () => {
    expect(convert('massFlow', 1, 'lb/h', 'kg/h')).toBe(0.45359237); // exact: 1 lb = 0.45359237 kg (NIST SP 811 B.8)
    expect(convert('massFlow', 1, 't/h', 'kg/h')).toBe(1000); // exact: 1 t = 1000 kg (NIST SP 811 B.8, ton metric)
    expect(convert('massFlow', 1, 'klb/h', 'lb/h')).toBeCloseTo(1000, 9);
  });
  it('density', () => {
    // NIST SP 811 B.8: pound per cubic foot → kg/m³ 1.601 846 E+01
    expect(rel(convert('density', 1, 'lb/ft³', 'kg/m³'), 16.01846)).toBeLessThan(5e-7);
    // field-practice.md §7 [D]: 1 lb/ft³ = 16.018 kg/m³
    expect(convert('density', 1, 'lb/ft3', 'kg/m3')).toBeCloseTo(16.018, 3);
  });
  it('one table of factors: the constants the engine tests use are the ones conversions use', () => {
    expect(KG_M3_PER_LB_FT3).toBe(convert('density', 1, 'lb/ft³', 'kg/m³'));
    expect(MM_PER_IN).toBe(25.4); // exact: 1 in = 2.54 cm (NIST SP 811 B.8)
    expect(M2_PER_FT2).toBeCloseTo(0.09290304, 15); // exact: 1 ft² = 9.290 304 E−02 m² (NIST SP 811 B.8)
    // NIST SP 811 B.8: gallon (U.S.) per minute → m³/s 6.309 020 E−05
    expect(rel(M3_S_PER_USGPM, 6.30902e-5)).toBeLessThan(5e-7);
  });
  it('surface tension and viscosity are numerically equal between their systems', () => {
    expect(convert('surfaceTension', 21.7, 'dyn/cm', 'mN/m')).toBe(21.7); // exact: 1 dyn/cm = 1e-3 N/m (NIST SP 811 B.8)
    expect(convert('viscosity', 0.42, 'cP', 'mPa·s')).toBe(0.42); // exact: 1 cP = 1e-3 Pa·s (NIST SP 811 B.8)
  });
  it('temperature', () => {
    // exact: t/°C = (t/°F − 32)/1.8 (NIST SP 811 B.8, degree Fahrenheit)
    expect(convert('temperature', 212, '°F', '°C')).toBeCloseTo(100, 12);
    expect(convert('temperature', -40, 'degF', 'degC')).toBeCloseTo(-40, 12);
    expect(QUANTITIES.temperature.toUS(0)).toBeCloseTo(32, 12);
  });
  it('pressure', () => {
    // NIST SP 811 B.8: pound-force per square inch → Pa 6.894 757 E+03
    expect(rel(convert('pressure', 1, 'psia', 'kPa'), 6.894757)).toBeLessThan(1e-7);
    expect(convert('pressure', 1, 'bar', 'kPa')).toBeCloseTo(100, 10); // exact: 1 bar = 1e5 Pa (NIST SP 811 B.8)
    // field-practice.md §7 [D]: 1 psi = 68.95 mbar
    expect(convert('pressureDrop', 1, 'psi', 'mbar')).toBeCloseTo(68.95, 2);
  });
  it('length, area, velocity', () => {
    expect(convert('lengthSmall', 1, 'in', 'mm')).toBeCloseTo(25.4, 12); // exact (NIST SP 811 B.8, inch)
    expect(convert('lengthLarge', 1, 'ft', 'm')).toBeCloseTo(0.3048, 14); // exact (NIST SP 811 B.8, foot)
    expect(convert('area', 1, 'ft²', 'm²')).toBeCloseTo(0.09290304, 14); // exact: 9.290 304 E-02 (NIST SP 811 B.8)
    expect(convert('velocity', 1, 'ft/s', 'm/s')).toBeCloseTo(0.3048, 14); // exact (NIST SP 811 B.8)
  });
  it('weir loading and liquid volume flow', () => {
    // NIST SP 811 B.8: gallon (U.S.) per minute → m³/s 6.309 020 E-05
    expect(rel(convert('liquidVolumeFlow', 1, 'gpm', 'm³/h') / 3600, 6.30902e-5)).toBeLessThan(1e-6);
    // field-practice.md §7 [D]: 1 gpm = 0.2271 m³/h; 1 gpm/in = 8.942 m³/(h·m); 1 gpm/ft = 0.745 m³/(h·m)
    expect(convert('liquidVolumeFlow', 1, 'gpm', 'm3/h')).toBeCloseTo(0.2271, 4);
    expect(convert('weirLoading', 1, 'gpm/in', 'm³/(h·m)')).toBeCloseTo(8.942, 3);
    expect(convert('weirLoading', 1, 'gpm/ft', 'm3/(h m)')).toBeCloseTo(0.745, 3);
  });
  it('pressure drop and liquid head', () => {
    expect(convert('liquidHead', 1, 'in liquid', 'mm liquid')).toBeCloseTo(25.4, 12); // exact (inch)
    expect(rel(convert('pressureDrop', 1, 'psi', 'Pa'), 6894.757)).toBeLessThan(1e-7); // NIST SP 811 B.8
  });
  it('duty', () => {
    // NIST SP 811 B.8: British thermal unit_IT per hour → W 2.930 711 E-01
    expect(rel(convert('duty', 1e-6, 'MMBtu/h', 'kW') * 1000, 0.2930711)).toBeLessThan(2e-7);
    // field-practice.md §7 [D]: 1 MMBtu/h = 0.2931 MW; 1 MW = 3.412 MMBtu/h
    expect(convert('duty', 1, 'MMBtu/h', 'MW')).toBeCloseTo(0.2931, 4);
    expect(convert('duty', 1, 'MW', 'MMBtu/h')).toBeCloseTo(3.412, 3);
  });
  it('F-factor', () => {
    // field-practice.md §7 [D]: 1 (ft/s)(lb/ft³)^0.5 = 1.2199 Pa^0.5
    expect(convert('fFactor', 1, '(ft/s)(lb/ft³)^0.5', 'Pa^0.5')).toBeCloseTo(1.2199, 4);
  });
});

describe('quantity registry', () => {
  const ids = Object.keys(QUANTITIES) as QuantityId[];
  const samples = [-40, 0, 0.013, 1, 37.5, 812.4, 123456.7];

  it('round-trips every quantity SI → US → SI', () => {
    for (const id of ids) {
      for (const v of samples) {
        const back = QUANTITIES[id].fromUS(QUANTITIES[id].toUS(v));
        expect(Math.abs(back - v), `${id} at ${v}`).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(v)));
      }
    }
  });
  it('round-trips every unit of every quantity through its SI unit', () => {
    for (const id of ids) {
      const q = QUANTITIES[id];
      for (const unit of q.units) {
        const v = convert(id, 12.34, q.siUnit, unit.id);
        expect(convert(id, v, unit.id, q.siUnit)).toBeCloseTo(12.34, 9);
      }
    }
  });
  it('has an SI and a US unit that it can find, and decimals for both systems', () => {
    for (const id of ids) {
      const q = QUANTITIES[id];
      expect(findUnit(id, q.siUnit)?.id, id).toBe(q.siUnitId);
      expect(findUnit(id, q.usUnit)?.id, id).toBe(q.usUnitId);
      expect(q.units[0]!.id, id).toBe(q.siUnitId);
      expect(Number.isInteger(q.decimals.SI) && Number.isInteger(q.decimals.US)).toBe(true);
    }
  });
  it('display helpers follow the unit system', () => {
    expect(unitLabel('massFlow', 'US')).toBe('lb/h');
    expect(toDisplay('lengthSmall', 50.8, 'US')).toBeCloseTo(2, 12);
    expect(fromDisplay('lengthSmall', 2, 'US')).toBeCloseTo(50.8, 12);
    expect(toDisplay('lengthSmall', 50.8, 'SI')).toBe(50.8);
    expect(formatQuantity('massFlow', 45359.237, 'US')).toBe('100,000');
    expect(formatQuantity('density', Number.NaN, 'SI')).toBe('–');
  });
});

describe('unit recognition in file headers', () => {
  it('recognises the spellings used in simulation exports', () => {
    expect(findUnit('massFlow', 'LB/HR')?.id).toBe('lb/h');
    expect(findUnit('density', '(kg/m3)')?.id).toBe('kg/m3');
    expect(findUnit('density', 'lb/ft³')?.id).toBe('lb/ft3');
    expect(findUnit('surfaceTension', 'dyne/cm')?.id).toBe('dyn/cm');
    expect(findUnit('viscosity', 'mPa·s')?.id).toBe('mPa.s');
    expect(findUnit('temperature', '[degF]')?.id).toBe('F');
    expect(findUnit('temperature', '°C')?.label).toBe('°C');
    expect(findUnit('pressure', 'bara')?.id).toBe('bar');
    expect(detectUnit('psia', ['temperature', 'pressure'])?.quantity).toBe('pressure');
  });
  it('refuses an unknown unit with a message naming it', () => {
    expect(findUnit('massFlow', 'furlong/fortnight')).toBeUndefined();
    expect(() => convert('density', 1, 'g/l', 'kg/m³')).toThrow(/unknown unit "g\/l" for density/);
  });
});
