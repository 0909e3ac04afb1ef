import { defineRoutes } from '../http/route.js';
import { exportRun } from '../services/reports/exports.js';
import { relabelRun, reviewRun } from '../services/runs/review.js';
import { createRunFromBody } from '../services/runs/runs.js';
import { compareRuns } from '../services/runs/runsCompare.js';
import { getRun, listRuns, runWindow } from '../services/runs/runsRead.js';
import { runReportPdf } from '../services/reports/runReportPdf.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { exportQuery } from '../../shared/schemas/loads.js';
import {
  compareQuery,
  createRunBody,
  reviewActionBody,
  reviewDecisionBody,
  runListQuery,
  runWindowParams,
} from '../../shared/schemas/runs.js';
import type { CreateRunBody, ReviewActionBody, ReviewStatus } from '../../shared/types/runs.js';

type Id = { id: string };

const relabelBody = {
  type: 'object',
  additionalProperties: false,
  required: ['label', 'version'],
  properties: { label: { type: 'string', minLength: 1, maxLength: 200 }, version: { type: 'integer', minimum: 1 } },
} as const;

export const runRoutes = defineRoutes([
  {
    method: 'get',
    path: '/runs',
    access: 'read',
    summary: 'Rating runs the user may see, newest first (filter by columnId, status; paged)',
    query: runListQuery,
    handler: async ({ ds, user, query }) =>
      listRuns(
        ds,
        user,
        query as { page: number; pageSize: number; columnId?: string; status?: ReviewStatus; inspection: boolean },
      ),
  },
  {
    method: 'post',
    path: '/runs',
    access: 'ratings.run',
    summary:
      'Rate a load case on the column’s sections and store the run (immutable snapshot and results); answers the run summary',
    body: createRunBody,
    status: 201,
    handler: async ({ ds, user, body }) => createRunFromBody(ds, user, body as CreateRunBody),
  },
  {
    method: 'get',
    path: '/runs/compare',
    access: 'read',
    summary: 'Per-tray differences of two runs (percent of limit of every check; controlling-check changes)',
    query: compareQuery,
    handler: async ({ ds, user, query }) => compareRuns(ds, user, (query as { a: string }).a, (query as { b: string }).b),
  },
  {
    method: 'get',
    path: '/runs/:id',
    access: 'read',
    summary: 'A rating run with snapshot, results and review history',
    params: uuidParams,
    handler: async ({ ds, user, params }) => getRun(ds, user, (params as Id).id),
  },
  {
    method: 'get',
    path: '/runs/:id/report.pdf',
    access: 'read',
    summary: 'Printable rating report (PDF, A4 landscape): review record, cautions, charts, per-tray table, methods',
    params: uuidParams,
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await runReportPdf(ds, user, (params as Id).id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  },
  {
    method: 'patch',
    path: '/runs/:id',
    access: 'ratings.run',
    summary: 'Relabel a run (not when approved; optimistic lock on version)',
    params: uuidParams,
    body: relabelBody,
    handler: async ({ ds, user, params, body }) =>
      relabelRun(ds, user, (params as Id).id, body as { label: string; version: number }),
  },
  {
    method: 'get',
    path: '/runs/:id/window/:tray',
    access: 'read',
    summary: 'Operating window of one rated tray (engine curves and the operating point)',
    params: runWindowParams,
    handler: async ({ ds, user, params }) => runWindow(ds, user, (params as Id).id, (params as { tray: number }).tray),
  },
  {
    method: 'get',
    path: '/runs/:id/export',
    access: 'read',
    summary: 'Download the per-tray results as CSV or XLSX (?format=csv|xlsx)',
    params: uuidParams,
    query: exportQuery,
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportRun(ds, user, (params as Id).id, (query as { format: 'csv' | 'xlsx' }).format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  },
  {
    method: 'post',
    path: '/runs/:id/submit',
    access: 'ratings.run',
    summary: 'Submit a draft or returned run for review (author only)',
    params: uuidParams,
    body: reviewActionBody,
    handler: async ({ ds, user, params, body }) => reviewRun(ds, user, (params as Id).id, 'submit', body as ReviewActionBody),
  },
  {
    method: 'post',
    path: '/runs/:id/approve',
    access: 'reviews.approve',
    summary: 'Approve a submitted run with a comment (not your own); approved runs are read-only',
    params: uuidParams,
    body: reviewDecisionBody,
    handler: async ({ ds, user, params, body }) => reviewRun(ds, user, (params as Id).id, 'approve', body as ReviewActionBody),
  },
  {
    method: 'post',
    path: '/runs/:id/return',
    access: 'reviews.approve',
    summary: 'Return a submitted run to its author with a comment',
    params: uuidParams,
    body: reviewDecisionBody,
    handler: async ({ ds, user, params, body }) => reviewRun(ds, user, (params as Id).id, 'return', body as ReviewActionBody),
  },
]);
