/**
 * JSON Schema (draft-07, ajv 8 with useDefaults) of a heat-recovery plan input, the one declaration of its
 * fields: HeatPlanInput and its parts in shared/types/heatPlan.ts are derived from these objects (FromSchema). Sections, tray loads, method options, the pump-around and its sweep are the
 * pump-around study's own sub-schemas. Cross-field rules (tray ranges, return above draw, zones not
 * overlapping, one of ΔT or circulation, sweep order) are checked in server/engine/heatPlan/faults.ts.
 */
import { methodOptionsSchema, trayLoadSchema } from './ratingRequest.js';
import { dutySweepSchema, pumpAroundSpecSchema, studySectionSchema } from './pumpAroundStudy.js';

/** A pump-around of the plan: the study's pump-around plus its draw temperature and its duty sweep. */
export const planPumpAroundSchema = {
  type: 'object',
  properties: {
    ...pumpAroundSpecSchema.properties,
    drawTemperature_C: {
      type: 'number',
      minimum: -100,
      maximum: 600,
      description: "temperature of the liquid drawn (the draw tray's liquid, from the load case) [°C]",
    },
    sweep: dutySweepSchema,
    latentHeat_kJ_kg: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 5000,
      description: "latent heat of the vapour condensed in this zone [kJ/kg]; the plan's latentHeat_kJ_kg when absent",
    },
  },
  required: [...pumpAroundSpecSchema.required, 'drawTemperature_C', 'sweep'],
  additionalProperties: false,
} as const;

const perDuty = { type: 'array', minItems: 1, maxItems: 3, items: { type: 'number', minimum: -1e3, maximum: 1e3 } } as const;

/**
 * Property drift of one tray: change of each property per kW of each pump-around's duty change from base
 * (input order), p = p0 + Σ_i perDuty[i]·(Q_i − Q0_i). Fitted by calibration; absent means held at base.
 */
export const trayPropertyDriftSchema = {
  type: 'object',
  properties: {
    tray: { type: 'integer', minimum: 1, maximum: 1000 },
    vapourDensity_kg_m3_per_kW: perDuty,
    liquidDensity_kg_m3_per_kW: perDuty,
    surfaceTension_mN_m_per_kW: perDuty,
    liquidViscosity_mPa_s_per_kW: { ...perDuty, description: 'only when the base tray has a viscosity' },
  },
  required: ['tray', 'vapourDensity_kg_m3_per_kW', 'liquidDensity_kg_m3_per_kW', 'surfaceTension_mN_m_per_kW'],
  additionalProperties: false,
} as const;

export const heatPlanSchema = {
  type: 'object',
  properties: {
    sections: { type: 'array', minItems: 1, maxItems: 20, items: studySectionSchema },
    trays: {
      type: 'array',
      minItems: 1,
      maxItems: 300,
      items: trayLoadSchema,
      description: 'base load case at the base duties (vapour entering each tray, net liquid leaving it)',
    },
    numbering: { type: 'string', enum: ['top-down', 'bottom-up'], default: 'top-down' },
    latentHeat_kJ_kg: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 5000,
      description: 'latent heat of the condensed vapour [kJ/kg], for every zone without its own value',
    },
    // default 0.7: common practice (see the engine README)
    margin: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 1,
      default: 0.7,
      description: 'fraction of the dry-out duties kept at most',
    },
    methods: methodOptionsSchema,
    pumpArounds: {
      type: 'array',
      minItems: 1,
      maxItems: 3,
      items: planPumpAroundSchema,
      description: 'one to three pump-arounds, zones not overlapping',
    },
    usefulAboveTemperature_C: {
      type: 'number',
      minimum: -100,
      maximum: 600,
      description: 'heat released above this temperature counts as useful (what the preheat train can take) [°C]',
    },
    // default 0.8: our choice
    fractionationThreshold: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 1,
      default: 0.8,
      description: "a section's L/V below this fraction of its base-case L/V is flagged",
    },
    propertyDrift: {
      type: 'array',
      maxItems: 300,
      items: trayPropertyDriftSchema,
      description: 'property drift per tray with the duties (from calibration); properties held at base without it',
    },
  },
  required: ['sections', 'trays', 'latentHeat_kJ_kg', 'pumpArounds', 'usefulAboveTemperature_C'],
  additionalProperties: false,
} as const;

/** A simulation case tagged with its pump-around duties (input order), every tray of the base case. */
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
