/** Contracts of the service's own routes: health and the OpenAPI document. */
import { Type, type Static } from '@sinclair/typebox';
import { Obj, StringEnum } from './schema.js';
import { route } from './route.js';

export const HealthBodySchema = Obj({
  status: StringEnum(['ok', 'degraded'] as const),
  database: StringEnum(['reachable', 'unreachable'] as const),
  engineVersion: Type.Optional(Type.String()),
});
export type HealthBody = Static<typeof HealthBodySchema>;

export const healthContract = {
  health: route({
    method: 'get',
    path: '/health',
    access: 'public',
    summary: 'Service health and database reachability (503 with Retry-After while the database is unreachable)',
    response: HealthBodySchema,
    otherResponses: { 503: HealthBodySchema },
  }),
  /** served by app.ts beside the route table (not a RouteDef) */
  openApi: route({
    method: 'get',
    path: '/openapi.json',
    access: 'public',
    summary: 'This API’s OpenAPI 3.1 document, built from the routes’ contracts',
    response: Type.Object(
      {
        openapi: Type.Literal('3.1.0'),
        info: Type.Object({ title: Type.String(), version: Type.String() }),
        paths: Type.Object({}),
      },
      { additionalProperties: true },
    ),
  }),
};
