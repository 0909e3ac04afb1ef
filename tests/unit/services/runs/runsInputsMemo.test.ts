import { describe, expect, it } from 'vitest';
import { rateSnapshot } from '../../../../server/services/runs/runs.js';
import { demoSnapshots } from '../../db/demoResults.js';

describe('work shared between runs of the same inputs', () => {
  it('rating with validated requests kept from an earlier run gives the same results and leaves them as they were', () => {
    for (const snapshot of demoSnapshots()) {
      const validated = new Map();
      const first = rateSnapshot(snapshot, validated);
      expect(validated.size).toBe(snapshot.sections.length);
      const kept = structuredClone([...validated.entries()]);
      const second = rateSnapshot(snapshot, validated);
      expect(second).toEqual(first);
      expect(second).toEqual(rateSnapshot(snapshot));
      expect([...validated.entries()]).toEqual(kept);
    }
  });
});
