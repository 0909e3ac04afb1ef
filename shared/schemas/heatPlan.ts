/**
 * JSON Schema (draft-07, ajv 8 with useDefaults) of a heat-recovery plan input, HeatPlanInput in
 * shared/types/heatPlan.ts. Sections, tray loads, method options, the pump-around and its sweep are the
 * pump-around study's own sub-schemas. Cross-field rules (tray ranges, return above draw, zones not
 * overlapping, one of ΔT or circulation, sweep order) are checked in server/engine/heatPlan/faults.ts.
 */
import { methodOptionsSchema, trayLoadSchema } from './ratingRequest.js';
import { dutySweepSchema, pumpAroundSpecSchema, studySectionSchema } from './pumpAroundStudy.js';

export const planPumpAroundSchema = {
  type: 'object',
  properties: {
    ...pumpAroundSpecSchema.properties,
    drawTemperature_C: { type: 'number', minimum: -100, maximum: 600 },
    sweep: dutySweepSchema,
    latentHeat_kJ_kg: { type: 'number', exclusiveMinimum: 0, maximum: 5000 },
  },
  required: [...pumpAroundSpecSchema.required, 'drawTemperature_C', 'sweep'],
  additionalProperties: false,
} as const;

const perDuty = { type: 'array', minItems: 1, maxItems: 3, items: { type: 'number', minimum: -1e3, maximum: 1e3 } } as const;

export const trayPropertyDriftSchema = {
  type: 'object',
  properties: {
    tray: { type: 'integer', minimum: 1, maximum: 1000 },
    vapourDensity_kg_m3_per_kW: perDuty,
    liquidDensity_kg_m3_per_kW: perDuty,
    surfaceTension_mN_m_per_kW: perDuty,
    liquidViscosity_mPa_s_per_kW: perDuty,
  },
  required: ['tray', 'vapourDensity_kg_m3_per_kW', 'liquidDensity_kg_m3_per_kW', 'surfaceTension_mN_m_per_kW'],
  additionalProperties: false,
} as const;

export const heatPlanSchema = {
  type: 'object',
  properties: {
    sections: { type: 'array', minItems: 1, maxItems: 20, items: studySectionSchema },
    trays: { type: 'array', minItems: 1, maxItems: 300, items: trayLoadSchema },
    numbering: { type: 'string', enum: ['top-down', 'bottom-up'], default: 'top-down' },
    latentHeat_kJ_kg: { type: 'number', exclusiveMinimum: 0, maximum: 5000 },
    margin: { type: 'number', exclusiveMinimum: 0, maximum: 1, default: 0.7 },
    methods: methodOptionsSchema,
    pumpArounds: { type: 'array', minItems: 1, maxItems: 3, items: planPumpAroundSchema },
    usefulAboveTemperature_C: { type: 'number', minimum: -100, maximum: 600 },
    fractionationThreshold: { type: 'number', exclusiveMinimum: 0, maximum: 1, default: 0.8 },
    propertyDrift: { type: 'array', maxItems: 300, items: trayPropertyDriftSchema },
  },
  required: ['sections', 'trays', 'latentHeat_kJ_kg', 'pumpArounds', 'usefulAboveTemperature_C'],
  additionalProperties: false,
} as const;

export const simulationCaseSchema = {
  type: 'object',
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 80 },
    duties_kW: { type: 'array', minItems: 1, maxItems: 3, items: { type: 'number', minimum: 0, maximum: 1e6 } },
    trays: { type: 'array', minItems: 1, maxItems: 300, items: trayLoadSchema },
  },
  required: ['duties_kW', 'trays'],
  additionalProperties: false,
} as const;

export const simulationCasesSchema = { type: 'array', minItems: 2, maxItems: 20, items: simulationCaseSchema } as const;
