/**
 * Review of a stored heat-recovery plan, with the rules of the pump-around studies (reviewRules.ts): the
 * author submits with an optional note; a reviewer who is not the author approves it or returns it with a
 * comment; approved is read-only. Audited, with an e-mail notice queued in the same transaction.
 */
import type { DataSource } from 'typeorm';
import { HeatPlan } from '../../db/entities/HeatPlan.js';
import type { ReviewAction } from '../studies/reviewRules.js';
import { applyReviewStep } from '../studies/reviewStep.js';
import { getHeatPlan, getPlanHead } from './planRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { HeatPlanRecord, HeatPlanReviewBody } from '../../../shared/types/heatPlans.js';

const CAUTION =
  'Screening estimate: a change of pump-around duties needs management-of-change review and confirmation by the internals vendor and licensed engineers.';

export async function reviewHeatPlan(
  ds: DataSource,
  user: SessionUser,
  id: string,
  action: ReviewAction,
  body: HeatPlanReviewBody,
): Promise<HeatPlanRecord> {
  await ds.transaction(async (em) => {
    const current = await getPlanHead(em, user, id); // 404 when not visible
    const target = {
      entity: HeatPlan,
      noun: 'plan',
      table: 'heat_plan',
      id,
      what: `heat-recovery plan "${current.label}" on ${current.columnTag}`,
      link: `/heat-plans/${id}`,
      submitCaution: CAUTION,
      decisionCaution: CAUTION,
    };
    await applyReviewStep(em, target, current, user, action, body);
  });
  return getHeatPlan(ds, user, id);
}
