import { describe, expect, it } from 'vitest';
import { percentOfLimit } from '../../server/engine/checks.js';
import { formatPercentOfLimit, PERCENT_CAP } from '../../shared/labels.js';

describe('percent of limit as users read it', () => {
  it('a value the engine held at its cap is shown as "at least", never as a plain number', () => {
    // A 'min' check at zero value has no finite percent: the engine holds it at the cap.
    const held = percentOfLimit(0, 3, 'min');
    expect(held).toBe(PERCENT_CAP);
    expect(formatPercentOfLimit(held)).toBe(`≥ ${PERCENT_CAP}`);
    // A large finite value beyond the cap is held there too and said so.
    expect(formatPercentOfLimit(percentOfLimit(50, 1, 'max'))).toBe(`≥ ${PERCENT_CAP}`);
  });

  it('ordinary values are whole percent', () => {
    expect(formatPercentOfLimit(percentOfLimit(1.31, 1, 'max'))).toBe('131');
    expect(formatPercentOfLimit(percentOfLimit(0.5, 1, 'max'))).toBe('50');
    expect(formatPercentOfLimit(998.4)).toBe('998');
  });
});
