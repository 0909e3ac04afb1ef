/**
 * The review rules shared by stored pump-around studies and heat-recovery plans: draft|returned → submitted
 * (the author) → approved | returned (a reviewer who is not the author; a comment is required to return);
 * approved is read-only; a stale version answers 409. Rating runs follow the same life cycle (review.ts).
 */
import { ConflictError, ForbiddenError, ValidationError } from '../../errors.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewEntry, ReviewStatus } from '../../../shared/types/runs.js';

export type ReviewAction = ReviewEntry['action'];

export const REVIEW_FROM: Record<ReviewAction, ReviewStatus[]> = {
  submit: ['draft', 'returned'],
  approve: ['submitted'],
  return: ['submitted'],
};
export const REVIEW_TO: Record<ReviewAction, ReviewStatus> = { submit: 'submitted', approve: 'approved', return: 'returned' };
const DONE: Record<ReviewAction, string> = { submit: 'submitted', approve: 'approved', return: 'returned' };

/** Throw the 409/403/400 that refuses this step, naming the field; returns the trimmed comment. */
export function assertReviewStep(
  what: string,
  current: { status: ReviewStatus; version: number; authorId: string },
  user: SessionUser,
  action: ReviewAction,
  body: { version: number; comment?: string },
): string {
  const comment = body.comment?.trim() ?? '';
  if (current.status === 'approved') throw new ConflictError(`The ${what} is approved and read-only`);
  if (current.version !== body.version)
    throw new ConflictError(`The ${what} was changed by someone else: reload it`, [
      { path: 'version', message: `is ${body.version}, the stored ${what} is at ${current.version}` },
    ]);
  if (!REVIEW_FROM[action].includes(current.status))
    throw new ConflictError(`A ${current.status} ${what} cannot be ${DONE[action]}`, [
      { path: 'status', message: `must be ${REVIEW_FROM[action].join(' or ')}; is ${current.status}` },
    ]);
  if (action === 'submit' && current.authorId !== user.id) throw new ForbiddenError(`Only the author may submit the ${what}`);
  if (action !== 'submit' && current.authorId === user.id)
    throw new ForbiddenError(`A ${what} is reviewed by someone other than its author`);
  if (action === 'return' && !comment)
    throw new ValidationError(`A comment is required to return a ${what}`, [
      { path: 'comment', message: `is required to return a ${what}` },
    ]);
  return comment;
}
