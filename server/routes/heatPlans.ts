import { defineRoutes } from '../http/route.js';
import { putPumpAroundDuties } from '../services/heatPlans/dutyTags.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { putPumpAroundDutiesBody } from '../../shared/schemas/heatPlans.js';
import type { PutPumpAroundDutiesBody } from '../../shared/types/loads.js';

type Id = { id: string };

/** Heat-recovery plans (issue 17) and the pump-around duty tags of load cases they calibrate against. */
export const heatPlanRoutes = defineRoutes([
  {
    method: 'put',
    path: '/load-cases/:id/pump-around-duties',
    access: 'loads.edit',
    summary: 'Tag a load case with the pump-around duties it was made at (replaces the tags; optimistic lock on version)',
    params: uuidParams,
    body: putPumpAroundDutiesBody,
    handler: ({ ds, user, params, body }) => putPumpAroundDuties(ds, user, (params as Id).id, body as PutPumpAroundDutiesBody),
  },
]);
