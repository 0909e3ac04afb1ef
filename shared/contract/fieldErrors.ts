/**
 * The one formatter of JSON Schema (ajv) errors, for the API and for the engine's input checks (rating
 * request, study, field evidence, heat plan): one wording for every keyword, and one path style on the
 * API (dotted, `section.weirHeight_mm`, `trays.3.tray`; `(root)` for the whole value). The engine, a
 * library, reports JSON pointers (`/trays/3/tray`), which services turn into the API's form with `dottedPath`.
 */
import type { ErrorObject } from 'ajv';

export interface FieldError {
  path: string;
  message: string;
}

/** A JSON pointer (`/trays/3/tray`) as a dotted path (`trays.3.tray`); `(root)` when empty. */
export const dottedPath = (pointer: string): string => pointer.replace(/^\//, '').replace(/\//g, '.') || '(root)';

/** One ajv error: the JSON pointer of the field it is about (a missing or unknown field by its own path) and why. */
export function ajvFault(e: ErrorObject): { pointer: string; message: string } {
  const params = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'required':
      return { pointer: `${e.instancePath}/${String(params.missingProperty)}`, message: 'is required' };
    case 'additionalProperties':
      return { pointer: `${e.instancePath}/${String(params.additionalProperty)}`, message: 'is not an allowed field' };
    case 'enum':
      return {
        pointer: e.instancePath,
        message: `must be one of ${(params.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(', ')}`,
      };
    default:
      return { pointer: e.instancePath, message: e.message ?? 'is invalid' };
  }
}

/** Each ajv error as the API's { path, message }. */
export function ajvDetails(errors: readonly ErrorObject[] | null | undefined): FieldError[] {
  return (errors ?? []).map((e) => {
    const f = ajvFault(e);
    return { path: dottedPath(f.pointer), message: f.message };
  });
}

/**
 * The engine's form of an input error: the JSON pointer, and a message naming the field and, for an entry of
 * one of `lists` (e.g. `/trays/3/…`), the tray it carries (`tray 12, liquidMassFlow_kg_h: must be …`).
 */
export function engineFieldError(
  raw: unknown,
  e: ErrorObject,
  lists: readonly string[] = ['trays'],
  whole = '(input)',
): FieldError {
  const { pointer, message } = ajvFault(e);
  return { path: pointer || '/', message: `${fieldInEntry(raw, pointer, lists, whole)}: ${message}` };
}

/** How an engine message names a field: its name, after the tray of the list entry holding it. */
export function fieldInEntry(raw: unknown, pointer: string, lists: readonly string[] = ['trays'], whole = '(input)'): string {
  const field = pointer.split('/').filter(Boolean).pop() ?? whole;
  const m = /^\/([^/]+)\/(\d+)(?:\/|$)/.exec(pointer);
  if (!m || !lists.includes(m[1]!)) return field;
  const list = (raw as Record<string, { tray?: unknown }[] | undefined> | null)?.[m[1]!];
  const tray = Array.isArray(list) ? list[Number(m[2])]?.tray : undefined;
  return `${typeof tray === 'number' ? `tray ${tray}` : `${m[1]}[${m[2]}]`}, ${field}`;
}
