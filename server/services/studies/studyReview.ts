/**
 * Review of a stored pump-around study, the same life cycle as a rating run: the author submits a draft
 * or returned study (ratings.run); a reviewer (reviews.approve), not the author, approves it or returns it
 * with a comment. Approved is read-only. Each action is audited and queues an e-mail notice in the same
 * transaction (server/mail/outbox.ts). A stale version answers 409.
 */
import type { DataSource } from 'typeorm';
import { PumpAroundStudy } from '../../db/entities/PumpAroundStudy.js';
import { ConflictError, ForbiddenError, ValidationError } from '../../errors.js';
import { queueNotice, reviewerEmails, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { getStudy } from './studies.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewEntry } from '../../../shared/types/runs.js';
import type { StudyRecord, StudyReviewBody, StudyStatus } from '../../../shared/types/studies.js';

export type StudyAction = 'submit' | 'approve' | 'return';

const FROM: Record<StudyAction, StudyStatus[]> = { submit: ['draft', 'returned'], approve: ['submitted'], return: ['submitted'] };
const TO: Record<StudyAction, StudyStatus> = { submit: 'submitted', approve: 'approved', return: 'returned' };

export async function reviewStudy(
  ds: DataSource,
  user: SessionUser,
  id: string,
  action: StudyAction,
  body: StudyReviewBody,
): Promise<StudyRecord> {
  const comment = body.comment?.trim() ?? '';
  await ds.transaction(async (em) => {
    const current = await getStudy(em, user, id); // 404 when not visible
    if (current.status === 'approved') throw new ConflictError('The study is approved and read-only');
    if (current.version !== body.version)
      throw new ConflictError('The study was changed by someone else: reload it', [
        { path: 'version', message: `is ${body.version}, the stored study is at ${current.version}` },
      ]);
    if (!FROM[action].includes(current.status))
      throw new ConflictError(
        `A ${current.status} study cannot be ${action === 'submit' ? 'submitted' : action === 'approve' ? 'approved' : 'returned'}`,
        [{ path: 'status', message: `must be ${FROM[action].join(' or ')}; is ${current.status}` }],
      );
    if (action === 'submit' && current.authorId !== user.id) throw new ForbiddenError('Only the author may submit the study');
    if (action !== 'submit' && current.authorId === user.id)
      throw new ForbiddenError('A study is reviewed by someone other than its author');
    if (action === 'return' && !comment)
      throw new ValidationError('A comment is required to return a study', [
        { path: 'comment', message: 'is required to return a study' },
      ]);

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
