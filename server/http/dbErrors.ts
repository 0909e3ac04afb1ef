/**
 * PostgreSQL and connection errors as HTTP answers. A constraint the input broke is the client's fault
 * (4xx naming the field where PostgreSQL says which); a database that cannot be reached is an outage (503
 * with Retry-After), never a 500. Anything else stays unknown and becomes the generic 500.
 */
import type { ErrorDetail } from '../errors.js';

export interface HttpFault {
  status: number;
  error: string;
  details?: ErrorDetail[];
  /** seconds, sent as Retry-After */
  retryAfter?: number;
}

/** Seconds a client should wait before retrying while the database is unreachable. */
export const DB_RETRY_AFTER_SECONDS = 5;

interface PgLike {
  code?: unknown;
  detail?: unknown;
  column?: unknown;
  message?: unknown;
  driverError?: unknown;
  cause?: unknown;
  errors?: unknown;
}

const camel = (s: string): string => s.replace(/_([a-z])/g, (_m, c: string) => c.toUpperCase());

/** Columns named in PostgreSQL's detail, e.g. `Key (unit_id, tag)=(…) already exists.` → ['unitId', 'tag']. */
function keyColumns(detail: unknown): string[] {
  const m = typeof detail === 'string' ? /^Key \(([^)]+)\)/.exec(detail) : null;
  if (!m) return [];
  const cols = m[1]!.split(',').map((c) => camel(c.trim().replace(/^"|"$/g, '')));
  const named = cols.filter((c) => !/Id$/.test(c) && c !== 'id');
  return named.length ? named : cols;
}

// PostgreSQL: admin/crash shutdown, cannot connect now, too many connections, statement cancelled; class 08 below
const PG_UNAVAILABLE = new Set(['57P01', '57P02', '57P03', '53300', '57014']);
// node-postgres and TypeORM when the server went away or the pool cannot connect
const PG_CONNECTION_MESSAGES =
  /Connection terminated|timeout exceeded when trying to connect|Cannot use a pool after calling end|Client has encountered a connection error|Client was closed and is not queryable|Connection is not established|Driver not Connected/i;
// socket errors: the database's, or file storage's (both are services a request depends on)
const SOCKET_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'ENOTFOUND',
  'EAI_AGAIN',
  'EHOSTUNREACH',
  'ENETUNREACH',
]);

/** The error and the errors it wraps (TypeORM's driverError, cause, AggregateError's errors). */
function chain(err: unknown): PgLike[] {
  const out: PgLike[] = [];
  const visit = (e: unknown, depth: number) => {
    if (!e || typeof e !== 'object' || depth > 4 || out.includes(e)) return;
    const p = e as PgLike;
    out.push(p);
    visit(p.driverError, depth + 1);
    visit(p.cause, depth + 1);
    if (Array.isArray(p.errors)) for (const x of p.errors.slice(0, 4)) visit(x, depth + 1);
  };
  visit(err, 0);
  return out;
}

const codeOf = (e: PgLike): string => (typeof e.code === 'string' ? e.code : '');

export function isDatabaseOutage(err: unknown): boolean {
  return chain(err).some(
    (e) =>
      PG_UNAVAILABLE.has(codeOf(e)) ||
      codeOf(e).startsWith('08') ||
      (typeof e.message === 'string' && PG_CONNECTION_MESSAGES.test(e.message)),
  );
}

const isSocketFailure = (err: unknown): boolean => chain(err).some((e) => SOCKET_CODES.has(codeOf(e)));

/** The HTTP answer for a database (or other backing service) error, or null when the error is not one we can explain. */
export function databaseFault(err: unknown): HttpFault | null {
  if (isDatabaseOutage(err))
    return { status: 503, error: 'The database is unreachable; try again in a few seconds', retryAfter: DB_RETRY_AFTER_SECONDS };
  if (isSocketFailure(err))
    return {
      status: 503,
      error: 'The database or the file storage is unreachable; try again in a few seconds',
      retryAfter: DB_RETRY_AFTER_SECONDS,
    };
  const pg = chain(err).find((e) => typeof e.code === 'string' && /^[0-9A-Z]{5}$/.test(e.code));
  if (!pg) return null;
  const code = pg.code as string;
  const cols = keyColumns(pg.detail);
  const field = cols.join(', ') || (typeof pg.column === 'string' ? camel(pg.column) : '(body)');
  const detail = (message: string): ErrorDetail[] => [{ path: field, message }];
  switch (code) {
    case '23505':
      return { status: 409, error: 'Already exists', details: detail('is already used by another record; choose another') };
    case '23503':
      return typeof pg.detail === 'string' && /still referenced/.test(pg.detail)
        ? { status: 409, error: 'Still in use', details: [{ path: '(record)', message: 'is still referenced by other records' }] }
        : { status: 400, error: 'Unknown reference', details: detail('refers to a record that does not exist') };
    case '23502':
      return { status: 400, error: 'Missing value', details: detail('is required') };
    case '23514':
    case '23P01':
      return { status: 400, error: 'Value not allowed', details: detail('breaks a rule of the stored data') };
    case '22001':
      return { status: 400, error: 'Value too long', details: detail('is too long') };
    case '22003':
      return { status: 400, error: 'Number out of range', details: detail('is too large or too small') };
    case '22P02':
    case '22007':
    case '22008':
    case '2201W':
    case '2201X':
    case '22023':
      return { status: 400, error: 'Invalid value', details: detail('is not a valid value of its kind') };
    case '22021':
    case '22P05':
      return { status: 400, error: 'Invalid text', details: detail('contains characters that cannot be stored') };
    case '54000':
      return { status: 413, error: 'Value too large to store', details: detail('is too large') };
    case '40001':
    case '40P01':
      return { status: 409, error: 'A simultaneous change got in the way; try again' };
    default:
      return null;
  }
}
