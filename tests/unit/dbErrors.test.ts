import { describe, expect, it } from 'vitest';
import { databaseFault, isDatabaseOutage } from '../../server/http/dbErrors.js';

// the shape TypeORM's QueryFailedError takes: the driver's fields copied, the original as driverError
const pg = (code: string, extra: Record<string, unknown> = {}) =>
  Object.assign(new Error('query failed'), { code, driverError: { code, ...extra }, ...extra });

describe('PostgreSQL errors as HTTP answers', () => {
  it('a unique violation is 409 naming the field from the key, leaving out the parent id', () => {
    expect(databaseFault(pg('23505', { detail: 'Key (unit_id, tag)=(abc, C-1) already exists.' }))).toMatchObject({
      status: 409,
      details: [{ path: 'tag' }],
    });
    expect(databaseFault(pg('23505', { detail: 'Key (name)=(North) already exists.' }))?.details?.[0]?.path).toBe('name');
  });

  it('bad values are 400, a missing reference 400, a row still referenced 409', () => {
    for (const code of ['22P02', '22003', '22001', '22021', '23502', '23514'])
      expect(databaseFault(pg(code))?.status, code).toBe(400);
    expect(databaseFault(pg('23503', { detail: 'Key (unit_id)=(x) is not present in table "process_units".' }))).toMatchObject({
      status: 400,
      details: [{ path: 'unitId' }],
    });
    expect(databaseFault(pg('23503', { detail: 'Key (id)=(x) is still referenced from table "sections".' }))?.status).toBe(409);
  });

  it('connection failures are 503 with Retry-After', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    for (const e of [
      refused,
      new Error('Connection terminated unexpectedly'),
      new Error('timeout exceeded when trying to connect'),
      pg('57P01'),
      pg('08006'),
    ]) {
      const f = databaseFault(e);
      expect(f?.status, e.message).toBe(503);
      expect(f?.retryAfter).toBeGreaterThan(0);
    }
    expect(isDatabaseOutage(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseOutage(refused)).toBe(false); // a refused socket may be file storage: 503, worded for both
  });

  it('anything else is left to the generic 500', () => {
    expect(databaseFault(new Error('boom'))).toBeNull();
    expect(databaseFault(pg('XX000'))).toBeNull();
  });
});
