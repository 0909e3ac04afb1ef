/** JSON schemas (ajv, draft-07) for sites, units, columns, sections and pump-arounds. Unknown fields are rejected. */
import { sectionGeometrySchema } from './ratingRequest.js';

const uuid = { type: 'string', format: 'uuid' } as const;
const name = (max = 120) => ({ type: 'string', minLength: 1, maxLength: max }) as const;
const tray = { type: 'integer', minimum: 1, maximum: 500 } as const;
const version = { type: 'integer', minimum: 1 } as const;
const numbering = { type: 'string', enum: ['top-down', 'bottom-up'] } as const;

export const trayMarkSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['tray', 'kind', 'label'],
  properties: {
    tray,
    kind: { type: 'string', enum: ['feed', 'side-draw', 'pa-draw', 'pa-return', 'chimney', 'note'] },
    label: { type: 'string', maxLength: 200 },
  },
} as const;
const trayMarks = { type: 'array', maxItems: 500, items: trayMarkSchema } as const;

export const createSiteBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name'],
  properties: { name: name(), location: { type: 'string', maxLength: 200 } },
} as const;

export const createUnitBody = {
  type: 'object',
  additionalProperties: false,
  required: ['siteId', 'name'],
  properties: { siteId: uuid, name: name() },
} as const;

export const createColumnBody = {
  type: 'object',
  additionalProperties: false,
  required: ['unitId', 'tag', 'numbering', 'trayCount'],
  properties: {
    unitId: uuid,
    tag: name(40),
    service: { type: 'string', maxLength: 200 },
    numbering,
    trayCount: tray,
    engineerId: { anyOf: [uuid, { type: 'null' }] },
    trayMarks,
  },
} as const;

export const updateColumnBody = {
  type: 'object',
  additionalProperties: false,
  required: ['version'],
  properties: {
    tag: name(40),
    service: { type: 'string', maxLength: 200 },
    numbering,
    trayCount: tray,
    engineerId: { anyOf: [uuid, { type: 'null' }] },
    trayMarks,
    version,
  },
} as const;

export const columnListQuery = {
  type: 'object',
  additionalProperties: false,
  properties: {
    page: { type: 'integer', minimum: 1, maximum: 1000000, default: 1 },
    pageSize: { type: 'integer', minimum: 1, maximum: 200, default: 50 },
    q: { type: 'string', maxLength: 200 },
    siteId: uuid,
    unitId: uuid,
  },
} as const;

const sectionProps = {
  name: name(),
  firstTray: tray,
  lastTray: tray,
  geometry: sectionGeometrySchema,
  provenance: { type: 'string', enum: ['design', 'as-left', 'as-found'] },
  provenanceDate: { anyOf: [{ type: 'string', format: 'date' }, { type: 'null' }] },
  notes: { type: 'string', maxLength: 2000, 'x-text': 'multiline' },
} as const;

export const sectionBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name', 'firstTray', 'lastTray', 'geometry', 'provenance'],
  properties: sectionProps,
} as const;

export const updateSectionBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name', 'firstTray', 'lastTray', 'geometry', 'provenance', 'version'],
  properties: { ...sectionProps, version },
} as const;

const paProps = {
  name: name(),
  drawTray: tray,
  returnTray: tray,
  baseDuty_kW: { type: 'number', minimum: 0, maximum: 1e6 },
} as const;

export const pumpAroundBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name', 'drawTray', 'returnTray', 'baseDuty_kW'],
  properties: paProps,
} as const;

export const updatePumpAroundBody = {
  type: 'object',
  additionalProperties: false,
  required: ['name', 'drawTray', 'returnTray', 'baseDuty_kW', 'version'],
  properties: { ...paProps, version },
} as const;

export const versionBody = {
  type: 'object',
  additionalProperties: false,
  required: ['version'],
  properties: { version },
} as const;
