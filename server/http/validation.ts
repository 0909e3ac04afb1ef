import { Ajv, type ErrorObject, type ValidateFunction } from 'ajv';
import addFormatsModule from 'ajv-formats';
import { ValidationError, type ErrorDetail } from '../errors.js';

// ajv-formats ships CommonJS; its default export is the plugin.
const addFormats = addFormatsModule as unknown as (ajv: Ajv) => Ajv;

export const ajv = new Ajv({ allErrors: true, useDefaults: true, coerceTypes: false, strict: false });
addFormats(ajv);
/** A separate instance for query strings, which arrive as text. */
export const queryAjv = new Ajv({ allErrors: true, useDefaults: true, coerceTypes: true, strict: false });
addFormats(queryAjv);

const cache = new WeakMap<object, ValidateFunction>();
const queryCache = new WeakMap<object, ValidateFunction>();

export function ajvDetails(errors: ErrorObject[] | null | undefined, root = ''): ErrorDetail[] {
  return (errors ?? []).map((e) => {
    let p = `${root}${e.instancePath}`;
    if (e.keyword === 'required') p = `${p}/${(e.params as { missingProperty: string }).missingProperty}`;
    if (e.keyword === 'additionalProperties')
      p = `${p}/${(e.params as { additionalProperty: string }).additionalProperty}`;
    const message =
      e.keyword === 'additionalProperties' ? 'is not an allowed field' : e.keyword === 'required' ? 'is required' : (e.message ?? 'is invalid');
    return { path: p.replace(/^\//, '').replace(/\//g, '.') || '(root)', message };
  });
}

/** Validate `data` against `schema`, applying defaults; throws ValidationError naming each field. */
export function validate<T>(schema: object, data: unknown, where: 'body' | 'query' | 'params' | string): T {
  const useQuery = where === 'query' || where === 'params';
  const c = useQuery ? queryCache : cache;
  let fn = c.get(schema);
  if (!fn) {
    fn = (useQuery ? queryAjv : ajv).compile(schema);
    c.set(schema, fn);
  }
  if (!fn(data)) {
    throw new ValidationError(`Invalid ${where}`, ajvDetails(fn.errors));
  }
  return data as T;
}
