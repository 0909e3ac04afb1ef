import { roleSchema } from './common.js';

/**
 * What a new password must meet (server/services/auth/passwordPolicy.ts applies it; the client repeats the
 * length checks as hints): bcrypt uses only the first 72 bytes of a password, so longer ones are refused.
 */
export const PASSWORD_RULES = { minLength: 12, maxBytes: 72, minScore: 3 } as const;

export const signInBody = {
  type: 'object',
  properties: {
    email: { type: 'string', format: 'email', maxLength: 254 },
    password: { type: 'string', minLength: 1, maxLength: 200 },
  },
  required: ['email', 'password'],
  additionalProperties: false,
} as const;

export const createUserBody = {
  type: 'object',
  properties: {
    email: { type: 'string', format: 'email', maxLength: 254 },
    name: { type: 'string', minLength: 1, maxLength: 120 },
    role: roleSchema,
    password: { type: 'string', minLength: 1, maxLength: 200 },
  },
  required: ['email', 'name', 'role', 'password'],
  additionalProperties: false,
} as const;

export const updateUserBody = {
  type: 'object',
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 120 },
    role: roleSchema,
    active: { type: 'boolean' },
    unitSystem: { type: 'string', enum: ['SI', 'US'] },
    version: { type: 'integer', minimum: 1 },
  },
  required: ['version'],
  additionalProperties: false,
} as const;

export const preferencesBody = {
  type: 'object',
  properties: { unitSystem: { type: 'string', enum: ['SI', 'US'] } },
  required: ['unitSystem'],
  additionalProperties: false,
} as const;

export const userSitesBody = {
  type: 'object',
  properties: { siteIds: { type: 'array', items: { type: 'string', format: 'uuid' }, maxItems: 200 } },
  required: ['siteIds'],
  additionalProperties: false,
} as const;

// lengths and strength are checked by the password policy (server/services/auth/passwordPolicy.ts), which says why
export const changePasswordBody = {
  type: 'object',
  properties: {
    currentPassword: { type: 'string', minLength: 1, maxLength: 200 },
    newPassword: { type: 'string', minLength: 1, maxLength: 200 },
  },
  required: ['currentPassword', 'newPassword'],
  additionalProperties: false,
} as const;

export const resetPasswordBody = {
  type: 'object',
  properties: { password: { type: 'string', minLength: 1, maxLength: 200 } },
  required: ['password'],
  additionalProperties: false,
} as const;
