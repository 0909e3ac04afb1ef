import { DB_RETRY_AFTER_SECONDS } from '../http/dbErrors.js';
import { defineRoutes } from '../http/route.js';
import type { HealthBody } from '../../shared/types/api.js';

export const healthRoutes = defineRoutes([
  {
    method: 'get',
    path: '/health',
    access: 'public',
    summary: 'Service health and database reachability (503 with Retry-After while the database is unreachable)',
    handler: async ({ ds, res }) => {
      let database: HealthBody['database'] = 'unreachable';
      try {
        await ds.query('SELECT 1');
        database = 'reachable';
      } catch {
        /* reported below */
      }
      const body: HealthBody = { status: database === 'reachable' ? 'ok' : 'degraded', database };
      if (database !== 'reachable') res.status(503).set('Retry-After', String(DB_RETRY_AFTER_SECONDS));
      return body;
    },
  },
]);
