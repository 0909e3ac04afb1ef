import type { RouteDef } from '../http/route.js';
import { authRoutes } from './auth.js';
import { columnRoutes } from './columns.js';
import { healthRoutes } from './health.js';
import { userRoutes } from './users.js';

/** Every API route. The role test walks this list, so a route that is not here does not exist. */
export const allRoutes: RouteDef[] = [...healthRoutes, ...authRoutes, ...userRoutes, ...columnRoutes];
