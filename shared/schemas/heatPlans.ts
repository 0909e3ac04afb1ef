/**
 * Request schemas of the heat-recovery plans and of the load cases' pump-around duty tags (issue 17);
 * payload types in shared/types/heatPlans.ts and shared/types/loads.ts. Cross-field rules (ΔT or circulation,
 * sweep order, zones not overlapping) are checked by the engine's validateHeatPlanInput once the input is built.
 */
import { dutySweepSchema, pumpAroundSpecSchema, pumpAroundStudySchema } from './pumpAroundStudy.js';
import { methodOptionsSchema } from './ratingRequest.js';
const uuid = { type: 'string', format: 'uuid' } as const;
const version = { type: 'integer', minimum: 1 } as const;
/** a duty in kW: zero (pump-around off) up to a bound far above any column */
const duty = { type: 'number', minimum: 0, maximum: 1e6 } as const;

export const putPumpAroundDutiesBody = {
  type: 'object',
  additionalProperties: false,
  required: ['duties', 'version'],
  properties: {
    duties: {
      type: 'array',
      maxItems: 20,
      items: {
        type: 'object',
        additionalProperties: false,
        required: ['pumpAroundId', 'duty_kW'],
        properties: { pumpAroundId: uuid, duty_kW: duty },
      },
    },
    version,
  },
} as const;

const pa = pumpAroundSpecSchema.properties;
const temperature = { type: 'number', minimum: -100, maximum: 800 } as const;

export const createHeatPlanSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['loadCaseId', 'pumpArounds', 'latentHeat_kJ_kg', 'usefulAboveTemperature_C'],
  properties: {
    label: { type: 'string', maxLength: 120 },
    loadCaseId: uuid,
    pumpArounds: {
      type: 'array',
      minItems: 2,
      maxItems: 3,
      items: {
        type: 'object',
        additionalProperties: false,
        required: ['pumpAroundId', 'sweep', 'liquidHeatCapacity_kJ_kgK'],
        properties: {
          pumpAroundId: uuid,
          sweep: {
            ...dutySweepSchema,
            properties: { ...dutySweepSchema.properties, steps: { type: 'integer', minimum: 1, maximum: 40 } },
          },
          liquidHeatCapacity_kJ_kgK: pa.liquidHeatCapacity_kJ_kgK,
          returnTemperatureDrop_K: pa.returnTemperatureDrop_K,
          circulation_kg_h: pa.circulation_kg_h,
          drawTemperature_C: temperature,
          baseDuty_kW: pa.baseDuty_kW,
        },
      },
    },
    latentHeat_kJ_kg: pumpAroundStudySchema.properties.latentHeat_kJ_kg,
    usefulAboveTemperature_C: temperature,
    margin: { type: 'number', exclusiveMinimum: 0, maximum: 1 },
    liquidToVapourThreshold: { type: 'number', exclusiveMinimum: 0, maximum: 1 },
    baseCondenserDuty_kW: duty,
    simulationCaseIds: { type: 'array', minItems: 2, maxItems: 12, items: uuid },
    zoneLiquidIncludesCirculation: { type: 'boolean', default: false },
    methods: methodOptionsSchema,
  },
} as const;

export const heatPlanReviewSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['version'],
  properties: { comment: { type: 'string', maxLength: 4000, 'x-text': 'multiline' }, version },
} as const;

export const planPointParams = {
  type: 'object',
  additionalProperties: false,
  required: ['id', 'index'],
  properties: { id: uuid, index: { type: 'integer', minimum: 0, maximum: 100000 } },
} as const;
