/**
 * Review of a stored pump-around study, the same life cycle as a rating run: the author submits a draft
 * or returned study (ratings.run); a reviewer (reviews.approve), not the author, approves it or returns it
 * with a comment. Approved is read-only. Each action is audited and queues an e-mail notice in the same
 * transaction (server/mail/outbox.ts). A stale version answers 409.
 */
import type { DataSource } from 'typeorm';
import { PumpAroundStudy } from '../../db/entities/PumpAroundStudy.js';
import { ConflictError } from '../../errors.js';
import { queueNotice, reviewerEmails, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { assertReviewStep, REVIEW_TO, type ReviewAction } from './reviewRules.js';
import { getStudy } from './studies.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewEntry } from '../../../shared/types/runs.js';
import type { StudyRecord, StudyReviewBody } from '../../../shared/types/studies.js';

export type StudyAction = ReviewAction;

const TO = REVIEW_TO;

export async function reviewStudy(
  ds: DataSource,
  user: SessionUser,
  id: string,
  action: StudyAction,
  body: StudyReviewBody,
): Promise<StudyRecord> {
  await ds.transaction(async (em) => {
    const current = await getStudy(em, user, id); // 404 when not visible
    const comment = assertReviewStep('study', current, user, action, body);

    const entry: ReviewEntry = { at: new Date().toISOString(), userId: user.id, userName: user.name, action, comment };
    const now = new Date();
    const patch: Partial<PumpAroundStudy> =
      action === 'submit'
        ? { status: TO[action], submittedAt: now, reviews: [...current.reviews, entry] }
        : {
            status: TO[action],
            reviewerId: user.id,
            reviewComment: comment || null,
            reviewedAt: now,
            reviews: [...current.reviews, entry],
          };
    const res = await em
      .createQueryBuilder()
      .update(PumpAroundStudy)
      .set({ ...patch, version: () => 'version + 1' })
      .where('id = :id AND version = :v', { id, v: body.version })
      .execute();
    if (!res.affected) throw new ConflictError('The study was changed by someone else: reload it');
    await audit(em, user.id, action, 'pump_around_study', id, { from: current.status, to: TO[action], comment });

    const what = `pump-around study "${current.label}" on ${current.columnTag}`;
    if (action === 'submit') {
      await queueNotice(em, {
        kind: 'study.submitted',
        to: await reviewerEmails(em, current.columnId),
        subject: `Review requested: ${what}`,
        text: `${user.name} submitted the ${what} for review.${comment ? `\nNote: ${comment}` : ''}\nApprove it or return it with a comment.\nScreening estimate: a duty change still needs management-of-change review.`,
        link: `/studies/${id}`,
      });
    } else {
      const to = await userEmail(em, current.authorId, current.columnId);
      await queueNotice(em, {
        kind: action === 'approve' ? 'study.approved' : 'study.returned',
        to: to ? [to] : [],
        subject: `${action === 'approve' ? 'Approved' : 'Returned'}: ${what}`,
        text: `${user.name} ${action === 'approve' ? 'approved' : 'returned'} the ${what}.${comment ? `\nComment: ${comment}` : ''}`,
        link: `/studies/${id}`,
      });
    }
  });
  return getStudy(ds, user, id);
}
