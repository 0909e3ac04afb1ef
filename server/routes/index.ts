import type { RouteDef } from '../http/route.js';
import { authRoutes } from './auth.js';
import { columnRoutes } from './columns.js';
import { evidenceRoutes } from './evidence.js';
import { healthRoutes } from './health.js';
import { heatPlanRoutes } from './heatPlans.js';
import { inspectionRoutes } from './inspections.js';
import { photoRoutes } from './photos.js';
import { importRoutes } from './imports.js';
import { loadRoutes } from './loads.js';
import { runRoutes } from './runs.js';
import { sectionRoutes } from './sections.js';
import { mailRoutes } from './mail.js';
import { methodRoutes } from './methods.js';
import { studyRoutes } from './studies.js';
import { userRoutes } from './users.js';

/** Every API route. The role test walks this list, so a route that is not here does not exist. */
export const allRoutes: RouteDef[] = [
  ...healthRoutes,
  ...authRoutes,
  ...userRoutes,
  ...columnRoutes,
  ...sectionRoutes,
  ...loadRoutes,
  ...importRoutes,
  ...runRoutes,
  ...mailRoutes,
  ...methodRoutes,
  ...studyRoutes,
  ...heatPlanRoutes,
  ...inspectionRoutes,
  ...photoRoutes,
  ...evidenceRoutes,
];
