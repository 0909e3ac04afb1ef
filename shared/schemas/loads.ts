/** JSON schemas for load cases. Per-tray rows use the engine's trayLoadSchema (SI, properties at actual conditions). */
import { LOAD_BASES, LOAD_SOURCES } from '../types/loads.js';
import { trayLoadSchema } from './ratingRequest.js';

const version = { type: 'integer', minimum: 1 } as const;

export const stageMapSchema = {
  type: 'array',
  maxItems: 1000,
  items: {
    type: 'object',
    additionalProperties: false,
    required: ['stage', 'firstTray', 'lastTray'],
    properties: {
      stage: { type: 'integer', minimum: 0, maximum: 10000 },
      firstTray: { type: 'integer', minimum: 1, maximum: 500 },
      lastTray: { type: 'integer', minimum: 1, maximum: 500 },
    },
  },
} as const;

export const loadsArraySchema = { type: 'array', maxItems: 500, items: trayLoadSchema } as const;

export const createLoadCaseBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name', 'basis', 'source', 'loads'],
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 120 },
    basis: { type: 'string', enum: [...LOAD_BASES] },
    source: { type: 'string', enum: [...LOAD_SOURCES] },
    sourceFile: { anyOf: [{ type: 'string', maxLength: 255 }, { type: 'null' }] },
    notes: { type: 'string', maxLength: 4000, 'x-text': 'multiline' },
    loads: loadsArraySchema,
    stageMap: { anyOf: [stageMapSchema, { type: 'null' }] },
  },
} as const;

export const updateLoadCaseBody = {
  type: 'object',
  additionalProperties: false,
  required: ['version'],
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 120 },
    basis: { type: 'string', enum: [...LOAD_BASES] },
    notes: { type: 'string', maxLength: 4000, 'x-text': 'multiline' },
    version,
  },
} as const;

export const putLoadsBody = {
  type: 'object',
  additionalProperties: false,
  required: ['loads', 'version'],
  properties: {
    loads: loadsArraySchema,
    stageMap: { anyOf: [stageMapSchema, { type: 'null' }] },
    source: { type: 'string', enum: [...LOAD_SOURCES] },
    version,
  },
} as const;

export const exportQuery = {
  type: 'object',
  additionalProperties: false,
  properties: { format: { type: 'string', enum: ['csv', 'xlsx'], default: 'csv' } },
} as const;
