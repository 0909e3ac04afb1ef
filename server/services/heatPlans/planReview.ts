/**
 * Review of a stored heat-recovery plan, with the rules of the pump-around studies (reviewRules.ts): the
 * author submits with an optional note; a reviewer who is not the author approves it or returns it with a
 * comment; approved is read-only. Audited, with an e-mail notice queued in the same transaction.
 */
import type { DataSource } from 'typeorm';
import { HeatPlan } from '../../db/entities/HeatPlan.js';
import { ConflictError } from '../../errors.js';
import { queueNotice, reviewerEmails, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { assertReviewStep, REVIEW_TO, type ReviewAction } from '../studies/reviewRules.js';
import { getHeatPlan, getPlanHead } from './planRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { HeatPlanRecord, HeatPlanReviewBody } from '../../../shared/types/heatPlans.js';
import type { ReviewEntry } from '../../../shared/types/runs.js';

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
    const comment = assertReviewStep('plan', current, user, action, body);
    const entry: ReviewEntry = { at: new Date().toISOString(), userId: user.id, userName: user.name, action, comment };
    const now = new Date();
    const patch: Partial<HeatPlan> =
      action === 'submit'
        ? { status: REVIEW_TO[action], submittedAt: now, reviews: [...current.reviews, entry] }
        : {
            status: REVIEW_TO[action],
            reviewerId: user.id,
            reviewComment: comment || null,
            reviewedAt: now,
            reviews: [...current.reviews, entry],
          };
    const res = await em
      .createQueryBuilder()
      .update(HeatPlan)
      .set({ ...patch, version: () => 'version + 1' })
      .where('id = :id AND version = :v', { id, v: body.version })
      .execute();
    if (!res.affected) throw new ConflictError('The plan was changed by someone else: reload it');
    await audit(em, user.id, action, 'heat_plan', id, { from: current.status, to: REVIEW_TO[action], comment });

    const what = `heat-recovery plan "${current.label}" on ${current.columnTag}`;
    if (action === 'submit') {
      await queueNotice(em, {
        kind: 'plan.submitted',
        to: await reviewerEmails(em, current.columnId),
        subject: `Review requested: ${what}`,
        text: `${user.name} submitted the ${what} for review.${comment ? `\nNote: ${comment}` : ''}\nApprove it or return it with a comment.\n${CAUTION}`,
        link: `/heat-plans/${id}`,
      });
    } else {
      const to = await userEmail(em, current.authorId, current.columnId);
      await queueNotice(em, {
        kind: action === 'approve' ? 'plan.approved' : 'plan.returned',
        to: to ? [to] : [],
        subject: `${action === 'approve' ? 'Approved' : 'Returned'}: ${what}`,
        text: `${user.name} ${action === 'approve' ? 'approved' : 'returned'} the ${what}.${comment ? `\nComment: ${comment}` : ''}\n${CAUTION}`,
        link: `/heat-plans/${id}`,
      });
    }
  });
  return getHeatPlan(ds, user, id);
}
