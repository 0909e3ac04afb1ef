/**
 * TypeBox building blocks of the API contract (shared/contract/*.ts). A schema declared here is at once
 * the ajv validation, the TypeScript type (`Static<>`) and a part of the OpenAPI document.
 */
import {
  Type,
  type SchemaOptions,
  type Static,
  type TObject,
  type TOptional,
  type TSchema,
  type TString,
} from '@sinclair/typebox';
import type { JSONSchema } from 'json-schema-to-ts';
import type { JsonPayload } from '../types/jsonPayload.js';

/** The bare uuid form (validation.ts refuses `urn:uuid:`). */
export const Uuid = (o: SchemaOptions = {}) => Type.String({ format: 'uuid', ...o });

/** A string from a fixed list, as one `enum` (ajv then answers "must be equal to one of the allowed values"). */
export const StringEnum = <const T extends readonly string[]>(values: T, o: SchemaOptions = {}) =>
  Type.Unsafe<T[number]>({ type: 'string', enum: [...values], ...o });

/** A value or null, as `type: [t, 'null']` for simple types (one ajv error) and anyOf otherwise. */
export function Nullable<T extends TSchema>(s: T) {
  const t = (s as { type?: unknown }).type;
  if (typeof t === 'string' && t !== 'object' && t !== 'array' && !('enum' in s))
    return Type.Unsafe<Static<T> | null>({ ...s, type: [t, 'null'] });
  return Type.Unsafe<Static<T> | null>({ anyOf: [s, { type: 'null' }] });
}

/** An object that refuses unknown fields: every body and every answer of the API. */
export const Obj = <P extends Record<string, TSchema>>(props: P, o: SchemaOptions = {}) =>
  Type.Object(props, { additionalProperties: false, ...o });

/**
 * A plain JSON schema (shared/schemas, `as const`) as a contract part, typed from the schema itself
 * (JsonPayload). `S extends object` with the JSONSchema test inside: constraining S to JSONSchema directly
 * makes TypeScript give up ("excessively deep") when the call sits in an Obj({...}) literal.
 */
export const FromJson = <S extends object>(schema: S) => Type.Unsafe<S extends JSONSchema ? JsonPayload<S> : never>(schema);

/** ISO 8601 timestamp as the API sends it. */
export const Timestamp = () => Type.String({ format: 'date-time' });

declare const DEFAULTED: unique symbol;
/** An optional field that validation fills in with `value` when absent: the handler sees it present. */
export type TDefaulted<T extends TSchema> = TOptional<T> & { readonly [DEFAULTED]: true };
export const Defaulted = <T extends TSchema>(s: T, value: Static<T>): TDefaulted<T> =>
  Type.Optional(Type.Unsafe<Static<T>>({ ...s, default: value })) as unknown as TDefaulted<T>;

type DefaultedKeys<P> = { [K in keyof P]: P[K] extends { readonly [DEFAULTED]: true } ? K : never }[keyof P];
type DefaultedPart<P> = { [K in DefaultedKeys<P>]-?: P[K] extends TSchema ? Exclude<P[K]['static'], undefined> : never };
/** What a handler receives after validation: Static<S> with the defaulted fields present. */
export type Validated<S> =
  S extends TObject<infer P>
    ? [DefaultedKeys<P>] extends [never]
      ? S['static']
      : Omit<S['static'], DefaultedKeys<P>> & DefaultedPart<P>
    : S extends TSchema
      ? S['static']
      : Record<string, never>;

declare const FILE_PART: unique symbol;
/** A file part of a multipart form (`form` of a contract): read by multer, not by ajv; the handler gets it in `files`. */
export type TFilePart = TString & { readonly [FILE_PART]: true };
export const FilePart = (o: SchemaOptions = {}): TFilePart => Type.String({ format: 'binary', ...o }) as TFilePart;

/** The names of a form's file parts. */
export type FileKeys<S> =
  S extends TObject<infer P> ? { [K in keyof P]: P[K] extends { readonly [FILE_PART]: true } ? K : never }[keyof P] : never;
/** The text fields of a multipart form as the handler receives them: validated, the file parts left out. */
export type FormFields<S> = S extends TObject<infer P> ? Validated<TObject<Omit<P, FileKeys<S>>>> : Record<string, never>;

/** One field error: `path` names the field (dotted, e.g. `section.weirHeight_mm`; `(root)` for the whole). */
export const ErrorDetail = Obj({ path: Type.String(), message: Type.String() });
/** Body of every error answer of the API. */
export const ErrorBody = Obj(
  { error: Type.String(), details: Type.Optional(Type.Array(ErrorDetail)) },
  { title: 'Error', description: 'An error: what failed, and for bad input each field and its fault' },
);
export type ErrorBody = Static<typeof ErrorBody>;

/** One page of a list. */
export const PageOf = <T extends TSchema>(item: T) =>
  Obj({ items: Type.Array(item), total: Type.Integer({ minimum: 0 }), page: Type.Integer(), pageSize: Type.Integer() });

/** `{ items }`: a whole (short) list. */
export const ItemsOf = <T extends TSchema>(item: T) => Obj({ items: Type.Array(item) });

/** `{ items, total }`: the newest items of a list cut at a fixed length, and how many there are in all. */
export const NewestOf = <T extends TSchema>(item: T) => Obj({ items: Type.Array(item), total: Type.Integer({ minimum: 0 }) });

/** `{ id }` path parameters. */
export const IdParams = Obj({ id: Uuid() });

/** page, pageSize (bounded) and a search text. */
export const pageFields = {
  page: Defaulted(Type.Integer({ minimum: 1, maximum: 1000000 }), 1),
  pageSize: Defaulted(Type.Integer({ minimum: 1, maximum: 200 }), 50),
};
export const PageQuery = Obj({ ...pageFields, q: Type.Optional(Type.String({ maxLength: 200 })) });

export const Ok = Obj({ ok: Type.Literal(true) });
