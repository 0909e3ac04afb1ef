import { DAMAGE_KINDS, PUNCH_PRIORITIES } from '../types/inspections.js';

const date = { type: 'string', format: 'date' } as const;
const text = (max: number) => ({ type: 'string', maxLength: max }) as const;
/** free text that may span lines (notes, findings, actions) */
const lines = (max: number, minLength = 0) => ({ type: 'string', minLength, maxLength: max, 'x-text': 'multiline' }) as const;
const mm = { type: 'number', minimum: 0, maximum: 5000 } as const;
const points = { type: 'array', items: mm, maxItems: 12 } as const;

export const measurementsSchema = {
  type: 'object',
  properties: {
    weirHeight_mm: points,
    downcomerClearance_mm: points,
    levelness_mm: { anyOf: [mm, { type: 'null' }] },
    traySpacing_mm: { anyOf: [mm, { type: 'null' }] },
  },
  required: ['weirHeight_mm', 'downcomerClearance_mm', 'levelness_mm', 'traySpacing_mm'],
  additionalProperties: false,
} as const;

export const findingsSchema = {
  type: 'object',
  properties: {
    fouling: { type: 'boolean' },
    blockedPercent: { type: 'number', minimum: 0, maximum: 100 },
    corrosion: { type: 'boolean' },
    damage: { type: 'string', enum: [...DAMAGE_KINDS] },
    valvesMissing: { type: 'integer', minimum: 0, maximum: 100000 },
    valvesStuck: { type: 'integer', minimum: 0, maximum: 100000 },
    looseFasteners: { type: 'boolean' },
    manwayInstalled: { type: 'boolean' },
    closureWitnessed: { type: 'boolean' },
    debris: { type: 'boolean' },
    notes: lines(2000),
  },
  required: [
    'fouling',
    'blockedPercent',
    'corrosion',
    'damage',
    'valvesMissing',
    'valvesStuck',
    'looseFasteners',
    'manwayInstalled',
    'closureWitnessed',
    'debris',
  ],
  additionalProperties: false,
} as const;

const ruleSchema = {
  type: 'object',
  properties: {
    item: { type: 'string', enum: ['weirHeight', 'downcomerClearance', 'traySpacing', 'levelness'] },
    label: text(200),
    plusMinus_mm: { type: 'number', exclusiveMinimum: 0, maximum: 100 },
    max_mm: { type: 'number', exclusiveMinimum: 0, maximum: 100 },
    source: { type: 'string', minLength: 1, maxLength: 300 },
  },
  required: ['item', 'label', 'source'],
  additionalProperties: false,
} as const;

export const rulesSchema = {
  type: 'object',
  properties: {
    kind: { type: 'string', enum: ['published', 'project'] },
    levelnessClass: { type: 'string', enum: ['A', 'B'] },
    project: {
      type: 'object',
      properties: {
        id: text(60),
        name: { type: 'string', minLength: 1, maxLength: 200 },
        source: { type: 'string', minLength: 1, maxLength: 300 },
        note: lines(1000),
        rules: { type: 'array', items: ruleSchema, maxItems: 10 },
      },
      required: ['id', 'name', 'source', 'rules'],
      additionalProperties: false,
    },
  },
  required: ['kind', 'levelnessClass'],
  additionalProperties: false,
} as const;

export const createInspectionBody = {
  type: 'object',
  properties: {
    columnId: { type: 'string', format: 'uuid' },
    turnaround: { type: 'string', minLength: 1, maxLength: 200 },
    startDate: date,
    endDate: { anyOf: [date, { type: 'null' }] },
    permitRef: text(200),
    gasTestRef: text(200),
    rules: rulesSchema,
    notes: lines(5000),
  },
  required: ['columnId', 'turnaround', 'startDate'],
  additionalProperties: false,
} as const;

const { columnId: _columnId, ...editable } = createInspectionBody.properties;
void _columnId;
export const updateInspectionBody = {
  type: 'object',
  properties: { ...editable, version: { type: 'integer', minimum: 1 } },
  required: ['version'],
  additionalProperties: false,
} as const;

export const saveTrayBody = {
  type: 'object',
  properties: {
    findings: findingsSchema,
    asFound: measurementsSchema,
    asLeft: measurementsSchema,
    version: { type: 'integer', minimum: 1 },
  },
  required: ['findings', 'asFound', 'asLeft'],
  additionalProperties: false,
} as const;

const nullableInt = (min: number, max: number) =>
  ({ anyOf: [{ type: 'integer', minimum: min, maximum: max }, { type: 'null' }] }) as const;

export const createPunchBody = {
  type: 'object',
  properties: {
    tray: nullableInt(1, 500),
    pass: nullableInt(1, 4),
    finding: lines(1000, 1),
    action: lines(1000, 1),
    priority: { type: 'string', enum: [...PUNCH_PRIORITIES] },
    owner: text(200),
  },
  required: ['finding', 'action', 'priority'],
  additionalProperties: false,
} as const;

export const updatePunchBody = {
  type: 'object',
  properties: {
    finding: lines(1000, 1),
    action: lines(1000, 1),
    priority: { type: 'string', enum: [...PUNCH_PRIORITIES] },
    owner: text(200),
    status: { type: 'string', enum: ['open', 'closed'] },
    version: { type: 'integer', minimum: 1 },
  },
  required: ['version'],
  additionalProperties: false,
} as const;

export const voidPunchBody = {
  type: 'object',
  properties: {
    reason: lines(1000, 1),
    version: { type: 'integer', minimum: 1 },
  },
  required: ['reason', 'version'],
  additionalProperties: false,
} as const;

export const signBody = {
  type: 'object',
  properties: { version: { type: 'integer', minimum: 1 } },
  required: ['version'],
  additionalProperties: false,
} as const;

export const asFoundBody = {
  type: 'object',
  properties: {
    loadCaseId: { type: 'string', format: 'uuid' },
    combine: { type: 'string', enum: ['average', 'worst'], default: 'average' },
    state: { type: 'string', enum: ['asFound', 'asLeft'], default: 'asFound' },
  },
  required: ['loadCaseId'],
  additionalProperties: false,
} as const;

export const inspectionListQuery = {
  type: 'object',
  properties: { columnId: { type: 'string', format: 'uuid' } },
  additionalProperties: false,
} as const;

const uuid = { type: 'string', format: 'uuid' } as const;
export const trayParams = {
  type: 'object',
  properties: {
    id: uuid,
    tray: { type: 'integer', minimum: 1, maximum: 500 },
    pass: { type: 'integer', minimum: 1, maximum: 4 },
  },
  required: ['id', 'tray', 'pass'],
  additionalProperties: false,
} as const;
export const punchParams = {
  type: 'object',
  properties: { id: uuid, itemId: uuid },
  required: ['id', 'itemId'],
  additionalProperties: false,
} as const;
export const photoParams = {
  type: 'object',
  properties: { id: uuid, photoId: uuid },
  required: ['id', 'photoId'],
  additionalProperties: false,
} as const;
export const photoQuery = {
  type: 'object',
  properties: { size: { type: 'string', enum: ['original', 'thumb'], default: 'original' } },
  additionalProperties: false,
} as const;

/** The text fields sent with a photo (multipart form fields arrive as text; the service reads the numbers). */
export const photoFieldsBody = {
  type: 'object',
  properties: {
    tray: { type: 'string', maxLength: 10 },
    pass: { type: 'string', maxLength: 10 },
    finding: lines(1000),
    caption: lines(2000),
  },
  additionalProperties: false,
} as const;
