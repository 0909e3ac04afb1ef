/**
 * Review of a stored pump-around study, the same life cycle as a rating run: the author submits a draft
 * or returned study (ratings.run); a reviewer (reviews.approve), not the author, approves it or returns it
 * with a comment. Approved is read-only. Each action is audited and queues an e-mail notice in the same
 * transaction (server/mail/outbox.ts). A stale version answers 409.
 */
import type { DataSource } from 'typeorm';
import { PumpAroundStudy } from '../../db/entities/PumpAroundStudy.js';
import type { ReviewAction } from './reviewRules.js';
import { applyReviewStep } from './reviewStep.js';
import { getStudy } from './studies.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { StudyRecord, StudyReviewBody } from '../../../shared/types/studies.js';

export type StudyAction = ReviewAction;

export async function reviewStudy(
  ds: DataSource,
  user: SessionUser,
  id: string,
  action: StudyAction,
  body: StudyReviewBody,
): Promise<StudyRecord> {
  await ds.transaction(async (em) => {
    const current = await getStudy(em, user, id); // 404 when not visible
    const target = {
      entity: PumpAroundStudy,
      noun: 'study',
      table: 'pump_around_study',
      id,
      what: `pump-around study "${current.label}" on ${current.columnTag}`,
      link: `/studies/${id}`,
      submitCaution: 'Screening estimate: a duty change still needs management-of-change review.',
    };
    await applyReviewStep(em, target, current, user, action, body);
  });
  return getStudy(ds, user, id);
}
