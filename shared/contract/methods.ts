/** Contract of GET /methods: the engine's correlations and default limits with their published sources. */
import { Type, type Static } from '@sinclair/typebox';
import { route } from './route.js';
import { Nullable, Obj, StringEnum } from './schema.js';
import type { TrayType } from '../types/rating.js';

export const PROVENANCES = ['seen', 'recalled', 'derived', 'common-practice', 'own-fit'] as const;
/** the tray types of shared/types/rating.ts, as the answer schema lists them */
const METHOD_TRAY_TYPES = ['sieve', 'fixed-valve', 'moving-valve'] as const satisfies readonly TrayType[];

export const MethodInfoSchema = Obj({
  /** correlation id; `CheckResult.method` values are ids */
  id: Type.String(),
  label: Type.String(),
  /** the published source, in plain words (no drafting notes) */
  source: Type.String(),
  equation: Type.String(),
  provenance: StringEnum(PROVENANCES),
  /** validity range of each input, keyed by the input's name with its unit */
  ranges: Type.Record(Type.String(), Type.Unsafe<readonly [number, number]>(Type.Tuple([Type.Number(), Type.Number()]))),
  /** the uncertainty a report states once for this correlation, or null */
  uncertainty: Nullable(Type.String()),
  /** ids of the correlations this one relies on (listed with it in reports) */
  uses: Type.Unsafe<readonly string[]>(Type.Array(Type.String())),
  /** tray types the correlation was developed for (null: any type) */
  trayTypes: Nullable(Type.Unsafe<readonly TrayType[]>(Type.Array(StringEnum(METHOD_TRAY_TYPES)))),
});
export type MethodInfo = Static<typeof MethodInfoSchema>;

export const LIMIT_SENSES = ['min', 'max'] as const;
export const LimitInfoSchema = Obj({
  check: Type.String(),
  limit: Type.Number(),
  unit: Type.String(),
  sense: StringEnum(LIMIT_SENSES),
  note: Type.String(),
  source: Type.String(),
});
export type LimitInfo = Static<typeof LimitInfoSchema>;

export const MethodsPayloadSchema = Obj({
  engineVersion: Type.String(),
  methods: Type.Array(MethodInfoSchema),
  limits: Type.Array(LimitInfoSchema),
  /** the cautions every rating report carries */
  cautions: Type.Array(Type.String()),
});
export type MethodsPayload = Static<typeof MethodsPayloadSchema>;

export const methodsContract = {
  list: route({
    method: 'get',
    path: '/methods',
    access: 'read',
    summary: 'Rating correlations and default limits with their published sources, and the report cautions',
    response: MethodsPayloadSchema,
  }),
};
