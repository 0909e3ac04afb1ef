/**
 * Text hygiene for every string the API accepts: no control characters (tab, line feed and carriage
 * return only in multi-line text) and no lone UTF-16 surrogates (they cannot be stored as UTF-8).
 * Schemas mark multi-line text with `'x-text': 'multiline'`; withTextRules marks every other string
 * schema as a single line, so no route has to remember it.
 */

const CONTROL_LINE = /[\u0000-\u001F\u007F-\u009F]/;
const CONTROL_MULTILINE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** Why a text is refused, as a message after the field name, or null when it is acceptable. */
export function textFault(s: string, multiline: boolean): string | null {
  const control = (multiline ? CONTROL_MULTILINE : CONTROL_LINE).exec(s);
  if (control) {
    const code = control[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0');
    return `must not contain control characters (U+${code} at position ${control.index + 1})${multiline ? '' : '; line breaks and tabs are not allowed here'}`;
  }
  const lone = LONE_SURROGATE.exec(s);
  if (lone) return `contains an invalid character (a lone UTF-16 surrogate at position ${lone.index + 1})`;
  return null;
}

// values of these keywords are data, not schemas
const DATA_KEYWORDS = new Set(['enum', 'const', 'default', 'examples', 'example']);

const isStringSchema = (s: Record<string, unknown>): boolean =>
  s.type === 'string' || (Array.isArray(s.type) && s.type.includes('string'));

/** A copy of `schema` in which every string schema without an `x-text` mark is marked single-line. */
export function withTextRules<T>(schema: T): T {
  if (Array.isArray(schema)) return schema.map((s: unknown) => withTextRules(s)) as T;
  if (schema === null || typeof schema !== 'object') return schema;
  const src = schema as Record<string, unknown>;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(src)) out[k] = DATA_KEYWORDS.has(k) ? v : withTextRules(v);
  if (isStringSchema(src) && !('x-text' in src) && !('enum' in src) && !('const' in src)) out['x-text'] = 'line';
  return out as T;
}
