/**
 * Review of rating runs: draft|returned → submitted (the author, ratings.run) → approved | returned
 * (reviews.approve, not the author, with a comment). Approved runs are read-only. Notices go to the
 * reviewers on submit and to the author on approve/return, queued in the same transaction.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { ConflictError, ForbiddenError } from '../../errors.js';
import { queueNotice, reviewerEmails, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { assertVersion, visibleChild } from '../columns/columnsCommon.js';
import { toRunRecord } from './runsRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewActionBody, ReviewEntry, ReviewStatus, RunRecord } from '../../../shared/types/runs.js';

type Action = ReviewEntry['action'];
const FROM: Record<Action, ReviewStatus[]> = { submit: ['draft', 'returned'], approve: ['submitted'], return: ['submitted'] };
const TO: Record<Action, ReviewStatus> = { submit: 'submitted', approve: 'approved', return: 'returned' };

async function notify(em: EntityManager, run: RatingRun, action: Action, user: SessionUser, comment: string): Promise<void> {
  const what = `rating run "${run.label}" (column ${run.snapshot.column.tag}, load case "${run.snapshot.loadCase.name}")`;
  const tail =
    '\n\nResults are screening estimates; operating changes need management-of-change review and confirmation by the internals vendor and licensed engineers.';
  if (action === 'submit') {
    await queueNotice(em, {
      kind: 'run.submitted',
      to: await reviewerEmails(em, run.columnId),
      subject: `Review requested: ${run.label}`,
      text: `${user.name} submitted ${what} for review.${comment ? `\n\nComment: ${comment}` : ''}${tail}`,
      link: `/runs/${run.id}`,
    });
    return;
  }
  const to = await userEmail(em, run.authorId, run.columnId);
  const verb = action === 'approve' ? 'approved' : 'returned';
  await queueNotice(em, {
    kind: `run.${verb}`,
    to: to ? [to] : [],
    subject: `Rating run ${verb}: ${run.label}`,
    text: `${user.name} ${verb} ${what}.\n\nComment: ${comment}${tail}`,
    link: `/runs/${run.id}`,
  });
}

/** Write only the mutable columns (TypeORM's save() would diff the large snapshot and results); bumps the version. */
async function saveReviewState(em: EntityManager, run: RatingRun): Promise<RatingRun> {
  const rows = await em.query<[{ version: number; updated_at: Date }[], number]>(
    `UPDATE rating_runs SET label = $2, status = $3, reviews = $4, review_comment = $5, reviewer_id = $6, version = version + 1,
       updated_at = now() WHERE id = $1 RETURNING version, updated_at`,
    [run.id, run.label, run.status, JSON.stringify(run.reviews), run.reviewComment, run.reviewerId],
  );
  const row = rows[0][0]!;
  run.version = row.version;
  run.updatedAt = row.updated_at;
  return run;
}

export async function reviewRun(
  ds: DataSource,
  user: SessionUser,
  id: string,
  action: Action,
  body: ReviewActionBody,
): Promise<RunRecord> {
  return ds.transaction(async (em) => toRunRecord(em, await applyReview(em, user, id, action, body)));
}

/** One review step inside the caller's transaction (also used by the demo seed). */
export async function applyReview(
  em: EntityManager,
  user: SessionUser,
  id: string,
  action: Action,
  body: ReviewActionBody,
): Promise<RatingRun> {
  const run = await visibleChild(em, user, RatingRun, id, 'Rating run', true);
  assertVersion('rating run', run.version, body.version);
  if (!FROM[action].includes(run.status))
    throw new ConflictError(
      `A ${run.status} run cannot be ${TO[action]}${run.status === 'approved' ? ': approved runs are read-only' : ''}`,
      [{ path: 'status', message: `is ${run.status}; ${action} needs ${FROM[action].join(' or ')}` }],
    );
  if (action === 'submit' && run.authorId !== user.id)
    throw new ForbiddenError('Only the author of a run may submit it for review');
  if (action !== 'submit' && run.authorId === user.id)
    throw new ForbiddenError('You cannot review your own run; ask another reviewer');
  const comment = body.comment?.trim() ?? '';
  run.status = TO[action];
  run.reviews = [...run.reviews, { at: new Date().toISOString(), userId: user.id, userName: user.name, action, comment }];
  if (action !== 'submit') {
    run.reviewerId = user.id;
    run.reviewComment = comment;
  }
  const saved = await saveReviewState(em, run);
  await audit(em, user.id, action, 'rating-run', id, { status: run.status, comment });
  await notify(em, saved, action, user, comment);
  return saved;
}

/** Relabel a run (the snapshot and results never change); approved runs are read-only. */
export async function relabelRun(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: { label: string; version: number },
): Promise<RunRecord> {
  return ds.transaction(async (em) => {
    const run = await visibleChild(em, user, RatingRun, id, 'Rating run', true);
    assertVersion('rating run', run.version, body.version);
    if (run.status === 'approved')
      throw new ConflictError('This run is approved and read-only', [{ path: 'status', message: 'is approved' }]);
    run.label = body.label;
    const saved = await saveReviewState(em, run);
    await audit(em, user.id, 'update', 'rating-run', id, { label: body.label });
    return toRunRecord(em, saved);
  });
}
