/**
 * JSON Schema (draft-07, ajv 8 with useDefaults) of a pump-around duty study input, the one declaration of its
 * fields: StudyInput and its parts in shared/types/pumpAround.ts are derived from these objects (FromSchema).
 * Section geometry, tray loads and method options are the rating request's own sub-schemas.
 * Cross-field rules (tray ranges, return above draw, one of ΔT or circulation) are checked in
 * server/engine/pumpAround/faults.ts.
 */
import { methodOptionsSchema, sectionGeometrySchema, trayLoadSchema } from './ratingRequest.js';

const trayNumber = { type: 'integer', minimum: 1, maximum: 1000 } as const;

/** A column section: the rating geometry plus its name and tray range (inclusive, either order). */
export const studySectionSchema = {
  type: 'object',
  properties: {
    ...sectionGeometrySchema.properties,
    name: { type: 'string', minLength: 1, maxLength: 80 },
    fromTray: trayNumber,
    toTray: trayNumber,
  },
  required: [...sectionGeometrySchema.required, 'name', 'fromTray', 'toTray'],
  additionalProperties: false,
} as const;

/**
 * The pump-around varied by the study. Give exactly one of `returnTemperatureDrop_K` (circulation then
 * follows the duty, m = Q/(c_p ΔT)) or `circulation_kg_h` (ΔT then follows the duty).
 */
export const pumpAroundSpecSchema = {
  type: 'object',
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 80 },
    drawTray: { ...trayNumber, description: 'tray the pump-around liquid is drawn from (the bottom of the zone)' },
    returnTray: {
      ...trayNumber,
      description: 'tray the cooled liquid is returned to (the top of the zone, above the draw)',
    },
    baseDuty_kW: { type: 'number', minimum: 0, maximum: 1e6, description: 'duty of the base load case [kW]' },
    liquidHeatCapacity_kJ_kgK: { type: 'number', exclusiveMinimum: 0, maximum: 20 },
    returnTemperatureDrop_K: { type: 'number', exclusiveMinimum: 0, maximum: 500 },
    circulation_kg_h: { type: 'number', exclusiveMinimum: 0, maximum: 1e8 },
  },
  required: ['name', 'drawTray', 'returnTray', 'baseDuty_kW', 'liquidHeatCapacity_kJ_kgK'],
  additionalProperties: false,
} as const;

export const dutySweepSchema = {
  type: 'object',
  properties: {
    fromDuty_kW: { type: 'number', minimum: 0, maximum: 1e6 },
    toDuty_kW: { type: 'number', minimum: 0, maximum: 1e6 },
    steps: {
      type: 'integer',
      minimum: 1,
      maximum: 1000,
      description: 'number of intervals; the sweep has steps + 1 points',
    },
  },
  required: ['fromDuty_kW', 'toDuty_kW', 'steps'],
  additionalProperties: false,
} as const;

export const pumpAroundStudySchema = {
  type: 'object',
  properties: {
    sections: { type: 'array', minItems: 1, maxItems: 20, items: studySectionSchema },
    trays: {
      type: 'array',
      minItems: 1,
      maxItems: 300,
      items: trayLoadSchema,
      description:
        'base load case at the base duty: vapour entering each tray from below, liquid leaving it; in the pump-around zone the liquid is the net internal liquid, without the pump-around circulation (the pump-around modelled as a side cooler)',
    },
    pumpAround: pumpAroundSpecSchema,
    latentHeat_kJ_kg: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 5000,
      description: 'latent heat of the vapour condensed by the extra duty [kJ/kg]',
    },
    // default 0.7: common practice
    margin: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 1,
      default: 0.7,
      description: 'fraction of the dry-out duty recommended at most',
    },
    sweep: dutySweepSchema,
    methods: methodOptionsSchema,
    numbering: { type: 'string', enum: ['top-down', 'bottom-up'], default: 'top-down' },
  },
  required: ['sections', 'trays', 'pumpAround', 'latentHeat_kJ_kg', 'sweep'],
  additionalProperties: false,
} as const;
