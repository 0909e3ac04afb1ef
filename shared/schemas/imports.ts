/** JSON schemas for the tray-profile import commit. */
import { LOAD_BASES } from '../types/loads.js';
import {
  DENSITY_UNITS,
  IMPORT_FIELDS,
  MASS_FLOW_UNITS,
  PRESSURE_UNITS,
  SURFACE_TENSION_UNITS,
  TEMPERATURE_UNITS,
  VISCOSITY_UNITS,
} from '../types/imports.js';
import { stageMapSchema } from './loads.js';
import { IMPORT_LIMITS } from '../importLimits.js';

const col = { type: 'integer', minimum: 0, maximum: 1000 } as const;
/** a cell read from the uploaded file: a quoted CSV cell may hold tabs or line breaks */
const cell = { type: 'string', maxLength: IMPORT_LIMITS.cellChars, 'x-text': 'multiline' } as const;
const unit = (u: readonly string[]) => ({ type: 'string', enum: [...u] }) as const;

export const importMappingSchema = {
  type: 'object',
  additionalProperties: false,
  properties: Object.fromEntries(IMPORT_FIELDS.map((f) => [f, col])),
} as const;

export const importUnitsSchema = {
  type: 'object',
  additionalProperties: false,
  properties: {
    vapourMassFlow: unit(MASS_FLOW_UNITS),
    liquidMassFlow: unit(MASS_FLOW_UNITS),
    vapourDensity: unit(DENSITY_UNITS),
    liquidDensity: unit(DENSITY_UNITS),
    surfaceTension: unit(SURFACE_TENSION_UNITS),
    liquidViscosity: unit(VISCOSITY_UNITS),
    temperature: unit(TEMPERATURE_UNITS),
    pressure: unit(PRESSURE_UNITS),
  },
} as const;

export const importNumberingSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['key', 'direction'],
  properties: {
    key: { type: 'string', enum: ['tray', 'stage'] },
    direction: { type: 'string', enum: ['top-down', 'bottom-up'] },
    stageOffset: { type: 'integer', minimum: -1000, maximum: 1000 },
    stageMap: stageMapSchema,
  },
} as const;

export const importCommitBody = {
  type: 'object',
  additionalProperties: false,
  required: ['mapping', 'units', 'numbering', 'name', 'basis', 'fileName'],
  properties: {
    token: { type: 'string', maxLength: 100 },
    headers: { type: 'array', maxItems: IMPORT_LIMITS.columns, items: cell },
    rows: { type: 'array', maxItems: IMPORT_LIMITS.rows, items: { type: 'array', maxItems: IMPORT_LIMITS.columns, items: cell } },
    firstDataRow: { type: 'integer', minimum: 1 },
    mapping: importMappingSchema,
    units: importUnitsSchema,
    numbering: importNumberingSchema,
    name: { type: 'string', minLength: 1, maxLength: 120 },
    basis: { type: 'string', enum: [...LOAD_BASES] },
    fileName: { type: 'string', minLength: 1, maxLength: 255 },
    notes: { type: 'string', maxLength: 4000, 'x-text': 'multiline' },
    /** the pump-around duties a simulation case was made at (optional; heat-recovery plans calibrate against them) */
    pumpAroundDuties: {
      type: 'array',
      maxItems: 20,
      items: {
        type: 'object',
        additionalProperties: false,
        required: ['pumpAroundId', 'duty_kW'],
        properties: {
          pumpAroundId: { type: 'string', format: 'uuid' },
          duty_kW: { type: 'number', minimum: 0, maximum: 1e6 },
        },
      },
    },
  },
} as const;

/** Optional query of the preview upload: choose the sheet of an XLSX workbook. */
export const importPreviewQuery = {
  type: 'object',
  additionalProperties: false,
  properties: { sheet: { type: 'string', maxLength: 100 } },
} as const;

/** POST /columns/:id/imports/check: the commit body without name, basis, file name, notes and duty tags. */
export const importCheckBody = {
  type: 'object',
  additionalProperties: false,
  required: ['mapping', 'units', 'numbering'],
  properties: Object.fromEntries(
    Object.entries(importCommitBody.properties).filter(
      ([k]) => !['name', 'basis', 'fileName', 'notes', 'pumpAroundDuties'].includes(k),
    ),
  ),
} as const;
