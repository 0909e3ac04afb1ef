/**
 * The frozen readers that migration 1764750000000 uses to re-encode rows stored before FRB4
 * (server/db/migrations/frozen), against golden rows of each layout.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { decodeResultsBeforeFrb4 } from '../../../server/db/migrations/frozen/resultsBeforeFrb4.js';
import {
  decodeFrb3,
  encodeFrb3,
  FRB3_CHECK_ORDER,
  notFrb3,
  type Frb3Results,
} from '../../../server/db/migrations/frozen/resultsFrb3.js';
import { CHECK_NAMES } from '../../../shared/types/rating.js';
import { demoResults, storedFixture } from './demoResults.js';

const names = CHECK_NAMES as unknown as string[];
const order = FRB3_CHECK_ORDER as unknown as string[];
const original = { names: [...names], order: [...order] };
afterEach(() => {
  names.splice(0, names.length, ...original.names);
  order.splice(0, order.length, ...original.order);
});

const asFrb3 = (r: unknown) => r as Frb3Results;

describe('results stored before FRB4, read by the frozen readers', () => {
  it('reads the golden FRB3 row (tests/fixtures/run-results-frb3.json), also when today’s code knows a check more', () => {
    const { stored, results } = storedFixture('frb3');
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB3');
    expect(decodeResultsBeforeFrb4(stored)).toEqual(results);
    names.push('passImbalance');
    expect(decodeResultsBeforeFrb4(stored)).toEqual(results);
  });

  it('reads the golden FRB2 row (tests/fixtures/run-results-frb2.json)', () => {
    const { stored, results } = storedFixture('frb2');
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB2');
    expect(decodeResultsBeforeFrb4(stored)).toEqual(results);
  });

  it('reads rows stored before compression (plain JSON text and the packed-1 array form)', () => {
    const [r] = demoResults();
    expect(decodeResultsBeforeFrb4(Buffer.from(JSON.stringify(r)))).toEqual(r);
    const t = r!.trays[0]!;
    const packed1 = {
      ...r,
      trays: [[t.tray, 0, 1, FRB3_CHECK_ORDER.map(() => [1, 2, 80, 3, 1.25, 4, 5]), [0.5, null], []]],
      format: 'packed-1',
      strings: ['s1', 'jetFlood', '%', 'max', 'ok', 'fair'],
      detailKeys: ['flowParameter', 'capacityFactor_m_s'],
    };
    const back = decodeResultsBeforeFrb4(Buffer.from(JSON.stringify(packed1))).trays[0]!;
    expect(back.sectionId).toBe('s1');
    expect(back.checks.weeping).toEqual({
      value: 1,
      unit: '%',
      limit: 80,
      sense: 'max',
      percentOfLimit: 1.25,
      status: 'ok',
      method: 'fair',
    });
    expect(back.details).toEqual({ flowParameter: 0.5 });
  });

  it('refuses an FRB3 row written with another number of checks instead of reading it shifted', () => {
    const [r] = demoResults();
    for (const t of r!.trays)
      (t.checks as unknown as Record<string, unknown>).passImbalance = { ...t.checks.jetFlood, method: 'x' };
    order.push('passImbalance'); // an encoder of a version that knew 11 checks
    const eleven = encodeFrb3(asFrb3(r));
    order.pop();
    expect(() => decodeFrb3(eleven)).toThrow(/do not fit 10 checks per tray/);
  });

  it('writes FRB3 for the migration’s down, and says what FRB3 cannot hold', () => {
    const { results } = storedFixture('frb3');
    expect(notFrb3(results as unknown as Record<string, unknown>)).toBeNull();
    expect(decodeFrb3(encodeFrb3(asFrb3(results)))).toEqual(results);
    const [r] = demoResults();
    expect(decodeFrb3(encodeFrb3(asFrb3(r)))).toEqual(r);
    (r!.trays[4]!.checks as unknown as Record<string, unknown>).passImbalance = { ...r!.trays[4]!.checks.jetFlood };
    expect(notFrb3(r as unknown as Record<string, unknown>)).toMatch(/^tray 5 checks .*passImbalance/);
    delete (r!.trays[4]!.checks as unknown as Record<string, unknown>).passImbalance;
    delete (r!.trays[4]!.checks as unknown as Record<string, unknown>).weeping;
    expect(notFrb3(r as unknown as Record<string, unknown>)).toMatch(/^tray 5 checks/);
  });
});
