import { Ajv, type ErrorObject, type ValidateFunction } from 'ajv';
import { ajvDetails } from '../../shared/contract/fieldErrors.js';
import addFormatsModule from 'ajv-formats';
import { ValidationError } from '../errors.js';
import { textFault, withTextRules } from './textRules.js';

// ajv-formats ships CommonJS; its default export is the plugin.
const addFormats = addFormatsModule as unknown as (ajv: Ajv) => Ajv;

/** ajv-formats' uuid also accepts a `urn:uuid:` prefix, which PostgreSQL's uuid type refuses: the bare form only. */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function configure(a: Ajv): Ajv {
  addFormats(a);
  a.addFormat('uuid', UUID);
  // every string schema carries `x-text` after withTextRules: refuse control characters and lone surrogates
  a.addKeyword({
    keyword: 'x-text',
    type: 'string',
    schemaType: 'string',
    errors: true,
    validate: function check(kind: string, data: string): boolean {
      const fault = textFault(data, kind === 'multiline');
      (check as { errors?: Partial<ErrorObject>[] }).errors = fault ? [{ keyword: 'x-text', message: fault, params: {} }] : [];
      return fault === null;
    },
  });
  return a;
}

// strictNumbers refuses NaN and Infinity where a number is expected (strict: false would let them through)
export const ajv = configure(
  new Ajv({ allErrors: true, useDefaults: true, coerceTypes: false, strict: false, strictNumbers: true }),
);
/** A separate instance for query strings, which arrive as text. */
export const queryAjv = configure(
  new Ajv({ allErrors: true, useDefaults: true, coerceTypes: true, strict: false, strictNumbers: true }),
);

const cache = new WeakMap<object, ValidateFunction>();
const queryCache = new WeakMap<object, ValidateFunction>();

/** Validate `data` against `schema`, applying defaults; throws ValidationError naming each field. */
export function validate<T>(schema: object, data: unknown, where: string): T {
  const useQuery = where === 'query' || where === 'params';
  const c = useQuery ? queryCache : cache;
  let fn = c.get(schema);
  if (!fn) {
    fn = (useQuery ? queryAjv : ajv).compile(withTextRules(schema));
    c.set(schema, fn);
  }
  if (!fn(data)) {
    throw new ValidationError(`Invalid ${where}`, ajvDetails(fn.errors));
  }
  if (useQuery) {
    const bad = nonFinite(data);
    if (bad) throw new ValidationError(`Invalid ${where}`, [{ path: bad, message: 'must be a finite number' }]);
  }
  return data as T;
}

/**
 * ajv's type coercion turns the text "Infinity" into a number without checking it is finite (and then
 * skips minimum/maximum), so coerced query values are checked here: the path of the first, or null.
 */
function nonFinite(data: unknown, path = ''): string | null {
  if (typeof data === 'number') return Number.isFinite(data) ? null : path || '(root)';
  if (data && typeof data === 'object')
    for (const [k, v] of Object.entries(data)) {
      const bad = nonFinite(v, path ? `${path}.${k}` : k);
      if (bad) return bad;
    }
  return null;
}
