/**
 * The one formatter of JSON Schema (ajv) errors, for the API, the engine's request checks and the study
 * input: one path style (dotted, `section.weirHeight_mm`, `trays.3.tray`; `(root)` for the whole value)
 * and one wording.
 */
import type { ErrorObject } from 'ajv';

export interface FieldError {
  path: string;
  message: string;
}

/** A JSON pointer (`/trays/3/tray`) as a dotted path (`trays.3.tray`); `(root)` when empty. */
export const dottedPath = (pointer: string): string => pointer.replace(/^\//, '').replace(/\//g, '.') || '(root)';

/** Each ajv error as { path, message }: a missing or unknown field is named by its own path. */
export function ajvDetails(errors: readonly ErrorObject[] | null | undefined): FieldError[] {
  return (errors ?? []).map((e) => {
    let p = e.instancePath;
    if (e.keyword === 'required') p = `${p}/${(e.params as { missingProperty: string }).missingProperty}`;
    if (e.keyword === 'additionalProperties') p = `${p}/${(e.params as { additionalProperty: string }).additionalProperty}`;
    const message =
      e.keyword === 'additionalProperties'
        ? 'is not an allowed field'
        : e.keyword === 'required'
          ? 'is required'
          : (e.message ?? 'is invalid');
    return { path: dottedPath(p), message };
  });
}
