import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../../server/engine/validity.js';

// Messages show three significant figures, and the exponent form outside 0.001–10,000.
describe('formatNumber (numbers in warning messages)', () => {
  it.each([
    [0, '0'],
    [0.12345, '0.123'],
    [-0.12355, '-0.124'],
    [1.005, '1'], // 1.005 is stored just below the tie: toPrecision's exact decimal rounding decides
    [2.5, '2.5'],
    [99.95, '100'],
    [999.5, '1000'],
    [1234.5, '1230'],
    [9999.4, '10000'],
    [12345, '1.23e+4'],
    [0.00098765, '9.88e-4'],
    [0.001, '0.001'],
    [-47.25, '-47.3'],
  ])('%s → %s', (x, text) => {
    expect(formatNumber(x)).toBe(text);
  });

  it('agrees with toPrecision(3) across magnitudes and signs', () => {
    const ref = (x: number) => String(Number(x.toPrecision(3)));
    for (let i = 1; i < 20000; i++) {
      for (const x of [i * 0.00137, -i * 0.0413, i * 0.4999, i / 7]) {
        if (Math.abs(x) >= 1e-3 && Math.abs(x) < 1e4) expect(formatNumber(x)).toBe(ref(x));
      }
    }
  });
});
