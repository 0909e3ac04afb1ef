/**
 * Request payloads of the tray-profile import (check and commit bodies, and the mapping, units and numbering
 * the preview answers with), declared once in TypeBox: the ajv validation and the TypeScript types both come
 * from here (shared/types/imports.ts re-exports the types).
 */
import { Type, type Static, type TOptional, type TSchema } from '@sinclair/typebox';
import {
  DENSITY_UNITS,
  IMPORT_FIELDS,
  MASS_FLOW_UNITS,
  PRESSURE_UNITS,
  SURFACE_TENSION_UNITS,
  TEMPERATURE_UNITS,
  VISCOSITY_UNITS,
  type ImportField,
  type ImportUnit,
} from '../types/imports.js';
import { IMPORT_LIMITS } from '../importLimits.js';
import { TrayNumberingSchema } from './columns.js';
import { PumpAroundDutyTagSchema } from './heatPlans.js';
import { LoadBasisSchema, StageMapSchema } from './loads.js';
import { Obj, StringEnum } from './schema.js';

/** a file column index (0-based) */
const col = () => Type.Integer({ minimum: 0, maximum: 1000 });
/** a cell read from the uploaded file: a quoted CSV cell may hold tabs or line breaks */
const cell = () => Type.String({ maxLength: IMPORT_LIMITS.cellChars, 'x-text': 'multiline' });
const optional = <T extends TSchema>(s: T) => Type.Optional(s);

/** field → index of the file column (0-based) holding it */
export const ImportMappingSchema = Obj(
  Object.fromEntries(IMPORT_FIELDS.map((f) => [f, optional(col())])) as {
    [K in ImportField]: TOptional<ReturnType<typeof col>>;
  },
);
export type ImportMapping = Static<typeof ImportMappingSchema>;

/**
 * field → unit of that file column (only fields with a physical unit are accepted, each with its own unit ids;
 * typed as field → unit id since the pages and the row reader look units up by any field)
 */
export const ImportUnitsSchema = Type.Unsafe<Partial<Record<ImportField, ImportUnit>>>(
  Obj({
    vapourMassFlow: optional(StringEnum(MASS_FLOW_UNITS)),
    liquidMassFlow: optional(StringEnum(MASS_FLOW_UNITS)),
    vapourDensity: optional(StringEnum(DENSITY_UNITS)),
    liquidDensity: optional(StringEnum(DENSITY_UNITS)),
    surfaceTension: optional(StringEnum(SURFACE_TENSION_UNITS)),
    liquidViscosity: optional(StringEnum(VISCOSITY_UNITS)),
    temperature: optional(StringEnum(TEMPERATURE_UNITS)),
    pressure: optional(StringEnum(PRESSURE_UNITS)),
  }),
);
export type ImportUnits = Static<typeof ImportUnitsSchema>;

/**
 * How the file numbers its rows: by actual tray or by simulation stage, and in which direction.
 * Stored tray numbers always follow the column's direction: a file numbered the other way is flipped
 * (tray → trayCount + 1 − tray). Stages map to trays through stageMap when given, else tray = stage − stageOffset.
 */
export const ImportNumberingSchema = Obj({
  key: StringEnum(['tray', 'stage'] as const),
  direction: TrayNumberingSchema,
  /** e.g. 1 when stage 1 is the condenser (default 0) */
  stageOffset: optional(Type.Integer({ minimum: -1000, maximum: 1000 })),
  stageMap: optional(StageMapSchema),
});
export type ImportNumbering = Static<typeof ImportNumberingSchema>;

/** The fields check and commit share: the rows (by preview token, or sent again) and how to read them. */
const checkFields = {
  /** from the preview; or send headers + rows instead */
  token: optional(Type.String({ maxLength: 100 })),
  headers: optional(Type.Array(cell(), { maxItems: IMPORT_LIMITS.columns })),
  rows: optional(Type.Array(Type.Array(cell(), { maxItems: IMPORT_LIMITS.columns }), { maxItems: IMPORT_LIMITS.rows })),
  /** 1-based file row of the first data row (for error row numbers; default 2) */
  firstDataRow: optional(Type.Integer({ minimum: 1 })),
  mapping: ImportMappingSchema,
  units: ImportUnitsSchema,
  numbering: ImportNumberingSchema,
};

/** POST /columns/:id/imports/check: the commit body without name, basis, file name, notes and duty tags; stores nothing. */
export const ImportCheckBodySchema = Obj(checkFields);
export type ImportCheckBody = Static<typeof ImportCheckBodySchema>;

/** POST /columns/:id/imports/commit */
export const ImportCommitBodySchema = Obj({
  ...checkFields,
  name: Type.String({ minLength: 1, maxLength: 120 }),
  basis: LoadBasisSchema,
  fileName: Type.String({ minLength: 1, maxLength: 255 }),
  notes: optional(Type.String({ maxLength: 4000, 'x-text': 'multiline' })),
  /** the pump-around duties a simulation case was made at (optional; heat-recovery plans calibrate against them) */
  pumpAroundDuties: optional(Type.Array(PumpAroundDutyTagSchema, { maxItems: 20 })),
});
export type ImportCommitBody = Static<typeof ImportCommitBodySchema>;
