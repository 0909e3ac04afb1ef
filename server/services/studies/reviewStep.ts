/**
 * One review step on a stored study or heat-recovery plan, in the caller's transaction: check it
 * (reviewRules.ts), write status, reviewer and history under the version guard (409 when stale), audit it and
 * queue the e-mail notice (server/mail/outbox.ts). The caller reads the record back afterwards.
 */
import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { ConflictError } from '../../errors.js';
import { queueNotice, reviewerEmails, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { assertReviewStep, REVIEW_TO, type ReviewAction } from './reviewRules.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewEntry, ReviewStatus } from '../../../shared/types/runs.js';

export interface ReviewTarget {
  entity: EntityTarget<ObjectLiteral>;
  /** the item's short name in refusals ('study', 'plan') and the prefix of its notice kinds */
  noun: string;
  /** audit table name */
  table: string;
  id: string;
  /** the item as named in notices, e.g. 'pump-around study "…" on T-701' */
  what: string;
  link: string;
  /** the caution closing a submit notice, and (when given) an approve/return notice */
  submitCaution: string;
  decisionCaution?: string;
}

export interface ReviewedItem {
  status: ReviewStatus;
  version: number;
  authorId: string;
  columnId: string;
  reviews: ReviewEntry[];
}

export async function applyReviewStep(
  em: EntityManager,
  target: ReviewTarget,
  current: ReviewedItem,
  user: SessionUser,
  action: ReviewAction,
  body: { version: number; comment?: string },
): Promise<void> {
  const comment = assertReviewStep(target.noun, current, user, action, body);
  const entry: ReviewEntry = { at: new Date().toISOString(), userId: user.id, userName: user.name, action, comment };
  const now = new Date();
  const reviews = [...current.reviews, entry];
  const patch =
    action === 'submit'
      ? { status: REVIEW_TO[action], submittedAt: now, reviews }
      : { status: REVIEW_TO[action], reviewerId: user.id, reviewComment: comment || null, reviewedAt: now, reviews };
  const res = await em
    .createQueryBuilder()
    .update(target.entity)
    .set({ ...patch, version: () => 'version + 1' })
    .where('id = :id AND version = :v', { id: target.id, v: body.version })
    .execute();
  if (!res.affected) throw new ConflictError(`The ${target.noun} was changed by someone else: reload it`);
  await audit(em, user.id, action, target.table, target.id, { from: current.status, to: REVIEW_TO[action], comment });

  const { what, link } = target;
  if (action === 'submit') {
    await queueNotice(em, {
      kind: `${target.noun}.submitted`,
      to: await reviewerEmails(em, current.columnId),
      subject: `Review requested: ${what}`,
      text: `${user.name} submitted the ${what} for review.${comment ? `\nNote: ${comment}` : ''}\nApprove it or return it with a comment.\n${target.submitCaution}`,
      link,
    });
  } else {
    const to = await userEmail(em, current.authorId, current.columnId);
    const caution = target.decisionCaution ? `\n${target.decisionCaution}` : '';
    await queueNotice(em, {
      kind: `${target.noun}.${action === 'approve' ? 'approved' : 'returned'}`,
      to: to ? [to] : [],
      subject: `${action === 'approve' ? 'Approved' : 'Returned'}: ${what}`,
      text: `${user.name} ${action === 'approve' ? 'approved' : 'returned'} the ${what}.${comment ? `\nComment: ${comment}` : ''}${caution}`,
      link,
    });
  }
}
