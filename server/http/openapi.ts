import type { RouteDef } from './route.js';

/** Builds the OpenAPI 3.1 document from the route list, so docs and code cannot drift apart. */
export function buildOpenApi(routes: RouteDef[], version: string): object {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) {
    const p = '/api' + r.path.replace(/:(\w+)/g, '{$1}');
    const params = [...r.path.matchAll(/:(\w+)/g)].map((m) => ({
      name: m[1],
      in: 'path',
      required: true,
      schema: { type: 'string' },
    }));
    const q = r.query as { properties?: Record<string, object> } | undefined;
    for (const [name, schema] of Object.entries(q?.properties ?? {}))
      params.push({ name, in: 'query', required: false, schema: schema as { type: string } });
    (paths[p] ??= {})[r.method] = {
      summary: r.summary,
      description: `Access: ${r.access}`,
      parameters: params,
      ...(r.body ? { requestBody: { required: true, content: { 'application/json': { schema: r.body } } } } : {}),
      responses: {
        [String(r.status ?? 200)]: { description: 'Success' },
        '400': { description: 'Invalid input: { error, details: [{ path, message }] }' },
        ...(r.access === 'public'
          ? {}
          : { '401': { description: 'Not signed in' }, '403': { description: 'Role lacks the permission' } }),
      },
    };
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Frothline API',
      version,
      description: 'Tray rating, pump-around studies and tray inspections. Session cookie authentication.',
    },
    paths,
  };
}
