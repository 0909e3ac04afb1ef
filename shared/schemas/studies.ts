/**
 * Request schemas of the stored pump-around studies (issue 5); payload types in shared/types/studies.ts.
 * Cross-field rules (one of ΔT or circulation, sweep order, trays inside the sections) are checked by the
 * engine's validateStudyInput after the study input is built from the column.
 */
import { dutySweepSchema, pumpAroundStudySchema, pumpAroundSpecSchema } from './pumpAroundStudy.js';
import { methodOptionsSchema } from './ratingRequest.js';

const pa = pumpAroundSpecSchema.properties;
const uuid = { type: 'string', format: 'uuid' } as const;

/** Stored studies keep at most 100 sweep intervals (101 points) to bound their size. */
export const STORED_STUDY_MAX_STEPS = 100;

export const createStudySchema = {
  type: 'object',
  properties: {
    label: { type: 'string', maxLength: 120 },
    loadCaseId: uuid,
    pumpAroundId: uuid,
    latentHeat_kJ_kg: pumpAroundStudySchema.properties.latentHeat_kJ_kg,
    liquidHeatCapacity_kJ_kgK: pa.liquidHeatCapacity_kJ_kgK,
    returnTemperatureDrop_K: pa.returnTemperatureDrop_K,
    circulation_kg_h: pa.circulation_kg_h,
    baseDuty_kW: pa.baseDuty_kW,
    zoneLiquidIncludesCirculation: { type: 'boolean' },
    sweep: {
      ...dutySweepSchema,
      properties: { ...dutySweepSchema.properties, steps: { type: 'integer', minimum: 1, maximum: STORED_STUDY_MAX_STEPS } },
    },
    margin: { type: 'number', exclusiveMinimum: 0, maximum: 1, default: 0.7 },
    methods: methodOptionsSchema,
  },
  required: [
    'loadCaseId',
    'pumpAroundId',
    'latentHeat_kJ_kg',
    'liquidHeatCapacity_kJ_kgK',
    'zoneLiquidIncludesCirculation',
    'sweep',
  ],
  additionalProperties: false,
} as const;

export const studyReviewSchema = {
  type: 'object',
  properties: {
    comment: { type: 'string', maxLength: 4000, 'x-text': 'multiline' },
    version: { type: 'integer', minimum: 1 },
  },
  required: ['version'],
  additionalProperties: false,
} as const;

export const latentHeatSchema = {
  type: 'object',
  properties: {
    condenserDuty_kW: { type: 'number', exclusiveMinimum: 0, maximum: 1e6 },
    overheadVapour_kg_h: { type: 'number', exclusiveMinimum: 0, maximum: 1e8 },
  },
  required: ['condenserDuty_kW', 'overheadVapour_kg_h'],
  additionalProperties: false,
} as const;
