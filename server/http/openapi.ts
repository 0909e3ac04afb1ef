import type { TSchema } from '@sinclair/typebox';
import { ErrorBody } from '../../shared/contract/schema.js';
import { isFileAnswer, type RouteContract } from '../../shared/contract/route.js';
import type { RouteDef } from './route.js';

const ERROR_REF = { $ref: '#/components/schemas/Error' };

/** A schema as plain JSON (TypeBox's symbol keys dropped; our `x-text` marks kept, OpenAPI allows x- keys). */
const plain = (s: unknown): Record<string, unknown> => JSON.parse(JSON.stringify(s)) as Record<string, unknown>;

const errorAnswer = (description: string) => ({ description, content: { 'application/json': { schema: ERROR_REF } } });

/** The error answers every route may give, by its access; a contract's own error bodies replace these. */
function errorAnswers(r: RouteDef): Record<string, unknown> {
  const out: Record<string, unknown> = {
    '400': errorAnswer('Invalid input: each field and its fault'),
    '404': errorAnswer('No such record, or not visible to this user'),
    '409': errorAnswer('Conflict: a stale version, a duplicate or a record still in use'),
    '413': errorAnswer('Body or upload too large'),
    '415': errorAnswer('Unsupported charset or content encoding'),
    '422': errorAnswer('Well-formed input that cannot be processed'),
    '429': errorAnswer('Too many requests; wait and try again'),
    '503': errorAnswer('The database or file storage cannot be reached (Retry-After)'),
  };
  if (r.access !== 'public') {
    out['401'] = errorAnswer('Not signed in');
    out['403'] = errorAnswer('Role lacks the permission');
  }
  return out;
}

function parameters(c: { params?: TSchema; query?: TSchema }, path: string): object[] {
  const params = plain(c.params ?? {}).properties as Record<string, object> | undefined;
  const out: object[] = [...path.matchAll(/:(\w+)/g)].map((m) => ({
    name: m[1],
    in: 'path',
    required: true,
    schema: params?.[m[1]!] ?? { type: 'string' },
  }));
  const q = plain(c.query ?? {}) as { properties?: Record<string, object>; required?: string[] };
  for (const [name, schema] of Object.entries(q.properties ?? {}))
    out.push({ name, in: 'query', required: q.required?.includes(name) ?? false, schema });
  return out;
}

function successAnswer(c: RouteContract): Record<string, unknown> {
  const status = String(c.status ?? (c.response === null ? 204 : 200));
  if (c.response === null) return { [status]: { description: 'Done (no content)' } };
  if (isFileAnswer(c.response))
    return {
      [status]: {
        description: 'A file',
        content: Object.fromEntries(c.response.file.map((t) => [t, { schema: { type: 'string', format: 'binary' } }])),
      },
    };
  return { [status]: { description: 'Success', content: { 'application/json': { schema: plain(c.response) } } } };
}

function operation(r: RouteDef): object {
  const c = r.contract;
  if (!c)
    return {
      summary: r.summary,
      description: `Access: ${r.access}`,
      parameters: parameters({}, r.path),
      responses: { [String(r.status ?? 200)]: { description: 'Success' }, ...errorAnswers(r) },
    };
  const other = Object.fromEntries(
    Object.entries(c.otherResponses ?? {}).map(([s, schema]) => [
      s,
      { description: 'See schema', content: { 'application/json': { schema: plain(schema) } } },
    ]),
  );
  const body = c.body
    ? { requestBody: { required: true, content: { 'application/json': { schema: plain(c.body) } } } }
    : c.form
      ? { requestBody: { required: true, content: { 'multipart/form-data': { schema: plain(c.form) } } } }
      : {};
  return {
    summary: c.summary,
    description: `Access: ${c.access}`,
    parameters: parameters(c, c.path),
    ...body,
    responses: { ...errorAnswers(r), ...other, ...successAnswer(c) },
  };
}

/** Builds the OpenAPI 3.1 document from the routes' contracts, so docs and code cannot drift apart. */
export function buildOpenApi(routes: RouteDef[], version: string): object {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) (paths['/api' + r.path.replace(/:(\w+)/g, '{$1}')] ??= {})[r.method] = operation(r);
  return {
    openapi: '3.1.0',
    info: {
      title: 'Frothline API',
      version,
      description: 'Tray rating, pump-around studies and tray inspections. Session cookie authentication.',
    },
    paths,
    components: { schemas: { Error: plain(ErrorBody) } },
  };
}
