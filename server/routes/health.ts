import { DB_RETRY_AFTER_SECONDS } from '../http/dbErrors.js';
import { implement } from '../http/route.js';
import { healthContract, type HealthBody } from '../../shared/contract/health.js';

export const healthRoutes = [
  implement(healthContract.health)({
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
  }),
];
