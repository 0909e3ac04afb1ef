/**
 * Answer schemas of the engine's results as they travel in JSON (stored runs, windows, comparisons). The
 * engine's own types stay in shared/types/rating.ts (the engine works in them); each schema here is tied to
 * that type (`Type.Unsafe<T>`), and every API test checks real answers against it. A number the engine
 * could not make finite goes out as JSON null, so result numbers are declared `number | null` on the wire.
 */
import { Type, type ObjectOptions, type TSchema } from '@sinclair/typebox';
import {
  CHECK_NAMES,
  type CheckResult,
  type EngineWarning,
  type MethodOptions,
  type OperatingWindow,
  type SectionGeometry,
  type CheckName,
  type SectionSummary,
  type TrayDetails,
  type TrayLoad,
} from '../types/rating.js';
import { methodOptionsSchema, sectionGeometrySchema, trayLoadSchema } from '../schemas/ratingRequest.js';
import { Obj, StringEnum } from './schema.js';

/** The JSON form of T, described by `schema`. */
const Wire = <T>(schema: TSchema | object) => Type.Unsafe<T>(JSON.parse(JSON.stringify(schema)) as object);

/** An object with one property per check name, each `schema` (typed by the check names). */
export function byCheckName<T extends TSchema>(schema: T, o: ObjectOptions = {}) {
  return Type.Object(Object.fromEntries(CHECK_NAMES.map((n) => [n, schema])) as Record<CheckName, T>, o);
}

/** A result number: JSON null when the engine could not make it finite. */
export const ResultNumber = () => Type.Unsafe<number>({ type: ['number', 'null'] });

export const CheckNameSchema = StringEnum(CHECK_NAMES);
export const CheckStatusSchema = StringEnum(['ok', 'near', 'over', 'na'] as const);

export const SectionGeometrySchema = Wire<SectionGeometry>(sectionGeometrySchema);
export const TrayLoadSchema = Wire<TrayLoad>(trayLoadSchema);
export const MethodOptionsSchema = Wire<MethodOptions>({ ...methodOptionsSchema, default: undefined });

export const CheckResultSchema = Wire<CheckResult>(
  Obj({
    value: ResultNumber(),
    unit: Type.String(),
    limit: ResultNumber(),
    sense: StringEnum(['max', 'min'] as const),
    percentOfLimit: ResultNumber(),
    status: CheckStatusSchema,
    method: Type.String(),
  }),
);

export const EngineWarningSchema = Wire<EngineWarning>(
  Obj({ code: Type.String(), message: Type.String(), tray: Type.Optional(Type.Integer()) }),
);

/** Per-tray intermediate figures, by name (a tray's `details`). */
export const TrayDetailsSchema = Type.Unsafe<TrayDetails>(Type.Record(Type.String(), ResultNumber()));

/** A tray's checks by name: a check added since a run was stored is absent from it. */
export const ChecksSchema = byCheckName(Type.Optional(CheckResultSchema), { additionalProperties: CheckResultSchema });

export const SectionSummarySchema = Wire<SectionSummary>(
  Obj({
    worst: Type.Array(
      Obj({
        check: CheckNameSchema,
        worstTray: Type.Integer(),
        worstValue: ResultNumber(),
        percentOfLimit: ResultNumber(),
        status: CheckStatusSchema,
      }),
    ),
    controllingCheck: CheckNameSchema,
    controllingTray: Type.Integer(),
    marginToNearestLimit_percent: ResultNumber(),
    turndown: ResultNumber(),
    traysOver: Type.Array(Type.Integer()),
    traysNear: Type.Array(Type.Integer()),
  }),
);

export const OperatingWindowSchema = Wire<OperatingWindow>(
  Obj({
    tray: Type.Integer(),
    curves: Type.Array(
      Obj({
        limit: Type.String(),
        label: Type.String(),
        value: Type.Optional(ResultNumber()),
        liquid_kg_h: Type.Array(ResultNumber()),
        vapour_kg_h: Type.Array(ResultNumber()),
      }),
    ),
    operatingPoint: Obj({ liquid_kg_h: ResultNumber(), vapour_kg_h: ResultNumber() }),
  }),
);
