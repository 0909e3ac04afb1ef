/**
 * One contract per API route: method, path, access, and the TypeBox schemas of its params, query, body and
 * answers. The server validates requests and (in tests) answers with them, the handler's types come from
 * them, and the OpenAPI document (GET /api/openapi.json) is built from them (server/http/openapi.ts).
 */
import type { TObject, TSchema } from '@sinclair/typebox';
import type { Permission } from '../permissions.js';
import type { FileKeys } from './schema.js';

export type Access = Permission | 'public' | 'signed-in';
export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** An answer that is a file (PDF, CSV, XLSX, image), not JSON. */
export interface FileAnswer {
  file: readonly string[];
}
export const fileAnswer = (...contentTypes: string[]): FileAnswer => ({ file: contentTypes });

export interface RouteContract {
  method: Method;
  /** express path under /api, e.g. '/columns/:id' */
  path: string;
  access: Access;
  summary: string;
  params?: TObject;
  query?: TObject;
  /** JSON body */
  body?: TSchema;
  /** multipart/form-data body: its fields, files as `Type.String({ format: 'binary' })` (read by multer) */
  form?: TObject;
  /** status of success (200 unless given) */
  status?: number;
  /** the success answer: a JSON schema, a file, or null for 204 No Content */
  response: TSchema | FileAnswer | null;
  /** answers other than success whose body is not the shared ErrorBody, by status */
  otherResponses?: Readonly<Record<number, TSchema>>;
}

export const route = <C extends RouteContract>(c: C): C => c;

export const isFileAnswer = (r: RouteContract['response']): r is FileAnswer =>
  r !== null && Array.isArray((r as { file?: unknown }).file);

type StaticOf<S> = S extends TSchema ? S['static'] : undefined;
/** A multipart form as a client fills it: its text fields, and a Blob (or File) for each file part. */
export type FormOf<S> = S extends TObject ? Omit<S['static'], FileKeys<S>> & { [K in FileKeys<S>]: Blob } : undefined;
/** What a client sends to a route: its path parameters, query and JSON body (or multipart form) as the contract types them. */
export type RequestOf<C extends RouteContract> = {
  params?: StaticOf<C['params']>;
  query?: StaticOf<C['query']>;
  body?: StaticOf<C['body']>;
  form?: FormOf<C['form']>;
};
/** The JSON answer of a route on success (undefined for files and 204). */
export type AnswerOf<C extends RouteContract> = StaticOf<C['response']>;

/** A contract's path with its parameters filled in, e.g. '/runs/:id' → '/runs/3f…'. */
export const pathOf = (c: RouteContract, params: Record<string, string | number> = {}): string =>
  c.path.replace(/:(\w+)/g, (_m, name: string) => encodeURIComponent(String(params[name] ?? '')));
