import { ROLES } from '../permissions.js';

export const uuidParams = {
  type: 'object',
  properties: { id: { type: 'string', format: 'uuid' } },
  required: ['id'],
  additionalProperties: false,
} as const;

export const pageQuery = {
  type: 'object',
  properties: {
    page: { type: 'integer', minimum: 1, maximum: 1000000, default: 1 },
    pageSize: { type: 'integer', minimum: 1, maximum: 200, default: 50 },
    q: { type: 'string', maxLength: 200 },
  },
  additionalProperties: false,
} as const;

export const roleSchema = { type: 'string', enum: [...ROLES] } as const;
export const emptyObject = { type: 'object', additionalProperties: false } as const;
