import { describe, expect, it } from 'vitest';
import { decimalsFor, formatSig, roundSig } from '../../shared/numberFormat.js';
import {
  G_HEAD,
  convert,
  defaultPressureDropUnit,
  formatPressureDrop,
  formatQuantity,
  pressureDropIn,
  pressureDropShownUnit,
} from '../../shared/units.js';

describe('significant-figure formatting (shared/numberFormat.ts)', () => {
  it('a converted density reads at four figures, not 499.4237', () => {
    const lbft3 = convert('density', 8000, 'kg/m3', 'lb/ft3'); // 499.4237… lb/ft³
    expect(formatSig(lbft3)).toBe('499.4');
    expect(formatQuantity('density', 8000, 'US')).toBe('499.4');
    expect(formatQuantity('density', 800, 'US')).toBe('49.94');
    expect(roundSig(lbft3, 5)).toBe(499.42);
  });

  it('keeps every digit left of the point and groups thousands', () => {
    expect(formatSig(123456.7)).toBe('123,457');
    expect(formatSig(123456.7, { grouping: false })).toBe('123457');
    expect(formatSig(9999.96)).toBe('10,000');
    expect(decimalsFor(12345)).toBe(0);
  });

  it('small values keep their figures up to six decimals; missing values read –', () => {
    expect(formatSig(0.012345, { sig: 3 })).toBe('0.0123');
    expect(formatSig(0.00000012)).toBe('0.000000');
    expect(formatSig(-0.00001, { sig: 1, maxDecimals: 2 })).toBe('0.00');
    expect(formatSig(NaN)).toBe('–');
    expect(formatSig(null)).toBe('–');
    expect(formatSig(Infinity)).toBe('–');
  });

  it('a quantity never shows more decimals than it usually does (mass flow stays whole)', () => {
    expect(formatQuantity('massFlow', 1234.56, 'SI')).toBe('1,235');
    expect(formatQuantity('percent', 85.34, 'SI')).toBe('85.3');
  });
});

describe('tray ΔP in the chosen unit (shared/units.ts)', () => {
  it('turns Pa back into the head the engine made it from, with the engine’s own g', async () => {
    const { G } = await import('../../server/engine/units.js');
    const { headToPascal } = await import('../../server/engine/pressureDrop.js');
    expect(G_HEAD).toBe(G);
    const pa = headToPascal(85, 700); // 85 mm of a 700 kg/m³ liquid
    expect(pressureDropIn(pa, 'mm-liquid', 700)).toBeCloseTo(85, 9);
    expect(pressureDropIn(pa, 'in-liquid', 700)).toBeCloseTo(85 / 25.4, 9);
    expect(formatPressureDrop(pa, 'mm-liquid', 700)).toBe('85.0');
    expect(formatPressureDrop(pa, 'in-liquid', 700)).toBe('3.35');
  });

  it('mbar and psi from Pa (1 mbar = 100 Pa; 1 psi = 6 894.757 Pa, NIST SP 811 B.9)', () => {
    expect(pressureDropIn(583.7, 'mbar')).toBeCloseTo(5.837, 9);
    expect(formatPressureDrop(583.7, 'mbar')).toBe('5.84');
    expect(pressureDropIn(6894.757, 'psi')).toBeCloseTo(1, 6);
    expect(formatPressureDrop(583.7, 'psi')).toBe('0.0847');
  });

  it('a head without a liquid density falls back to mbar and says so', () => {
    expect(pressureDropShownUnit('mm-liquid')).toBe('mbar');
    expect(pressureDropShownUnit('mm-liquid', 0)).toBe('mbar');
    expect(pressureDropShownUnit('in-liquid', 650)).toBe('in-liquid');
    expect(pressureDropIn(583.7, 'mm-liquid')).toBeCloseTo(5.837, 9);
    expect(defaultPressureDropUnit('SI')).toBe('mm-liquid');
    expect(defaultPressureDropUnit('US')).toBe('in-liquid');
  });
});
