/**
 * JSON Schema (draft-07, ajv 8 with useDefaults) of a pump-around duty study input, StudyInput in shared/types/pumpAround.ts.
 * Section geometry, tray loads and method options are the rating request's own sub-schemas.
 * Cross-field rules (tray ranges, return above draw, one of ΔT or circulation) are checked in
 * server/engine/pumpAround/faults.ts.
 */
import { methodOptionsSchema, sectionGeometrySchema, trayLoadSchema } from './ratingRequest.js';

const trayNumber = { type: 'integer', minimum: 1, maximum: 1000 } as const;

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

export const pumpAroundSpecSchema = {
  type: 'object',
  properties: {
    name: { type: 'string', minLength: 1, maxLength: 80 },
    drawTray: trayNumber,
    returnTray: trayNumber,
    baseDuty_kW: { type: 'number', minimum: 0, maximum: 1e6 },
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
    steps: { type: 'integer', minimum: 1, maximum: 1000 },
  },
  required: ['fromDuty_kW', 'toDuty_kW', 'steps'],
  additionalProperties: false,
} as const;

export const pumpAroundStudySchema = {
  type: 'object',
  properties: {
    sections: { type: 'array', minItems: 1, maxItems: 20, items: studySectionSchema },
    trays: { type: 'array', minItems: 1, maxItems: 300, items: trayLoadSchema },
    pumpAround: pumpAroundSpecSchema,
    latentHeat_kJ_kg: { type: 'number', exclusiveMinimum: 0, maximum: 5000 },
    margin: { type: 'number', exclusiveMinimum: 0, maximum: 1, default: 0.7 },
    sweep: dutySweepSchema,
    methods: methodOptionsSchema,
    numbering: { type: 'string', enum: ['top-down', 'bottom-up'], default: 'top-down' },
  },
  required: ['sections', 'trays', 'pumpAround', 'latentHeat_kJ_kg', 'sweep'],
  additionalProperties: false,
} as const;
