import { describe, expect, it } from 'vitest';
import { CONSTRAINTS_PER_TRAY, constraintName } from '../../../server/engine/heatPlan/model.js';
import { CHECK_NAMES } from '../../../shared/types/rating.js';

describe('heat-plan constraints', () => {
  it('dry-out and every rating check fit the 16-bit mask the grid keeps per watched tray (grid.ts, Uint16Array)', () => {
    // adding a check adds a constraint: past 15 checks the grid's masks must widen first
    expect(CONSTRAINTS_PER_TRAY).toBe(CHECK_NAMES.length + 1);
    expect(CONSTRAINTS_PER_TRAY).toBeLessThanOrEqual(16);
  });

  it('constraint 0 is dry-out, the others the checks by name in CHECK_NAMES order', () => {
    expect(Array.from({ length: CONSTRAINTS_PER_TRAY }, (_, c) => constraintName(c))).toEqual(['dry-out', ...CHECK_NAMES]);
  });
});
