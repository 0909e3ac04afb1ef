/** JSON schemas for rating runs, review actions and comparisons. */
import { methodOptionsSchema } from './ratingRequest.js';

const uuid = { type: 'string', format: 'uuid' } as const;

export const createRunBody = {
  type: 'object',
  additionalProperties: false,
  required: ['columnId', 'loadCaseId'],
  properties: {
    columnId: uuid,
    loadCaseId: uuid,
    sectionIds: { type: 'array', minItems: 1, maxItems: 100, uniqueItems: true, items: uuid },
    methods: methodOptionsSchema,
    label: { type: 'string', minLength: 1, maxLength: 200 },
  },
} as const;

export const reviewActionBody = {
  type: 'object',
  additionalProperties: false,
  required: ['version'],
  properties: {
    comment: { type: 'string', maxLength: 4000, 'x-text': 'multiline' },
    version: { type: 'integer', minimum: 1 },
  },
} as const;

/** approve and return need a comment */
export const reviewDecisionBody = {
  ...reviewActionBody,
  required: ['version', 'comment'],
  properties: {
    ...reviewActionBody.properties,
    comment: { type: 'string', minLength: 1, maxLength: 4000, 'x-text': 'multiline' },
  },
} as const;

export const runWindowParams = {
  type: 'object',
  additionalProperties: false,
  required: ['id', 'tray'],
  properties: { id: uuid, tray: { type: 'integer', minimum: 0, maximum: 100000 } },
} as const;

export const compareQuery = {
  type: 'object',
  additionalProperties: false,
  required: ['a', 'b'],
  properties: { a: uuid, b: uuid },
} as const;

export const runListQuery = {
  type: 'object',
  additionalProperties: false,
  properties: {
    page: { type: 'integer', minimum: 1, maximum: 1000000, default: 1 },
    pageSize: { type: 'integer', minimum: 1, maximum: 200, default: 50 },
    columnId: uuid,
    status: { type: 'string', enum: ['draft', 'submitted', 'approved', 'returned'] },
    /** also list the runs of ratings as found (the as-found runs and their design working copies) */
    inspection: { type: 'boolean', default: false },
  },
} as const;
