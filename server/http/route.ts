import type { TObject, TOptional, TSchema } from '@sinclair/typebox';
import type { Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { Obj, type FileKeys, type FormFields, type Validated } from '../../shared/contract/schema.js';
import type { Access, RouteContract } from '../../shared/contract/route.js';
import type { SessionUser } from '../../shared/types/api.js';
import { ValidationError } from '../errors.js';
import type { SessionClaims } from './auth.js';

export type { Access } from '../../shared/contract/route.js';

/** A file part of a multipart upload as multer hands it over (memory storage). */
export type UploadedFile = Express.Multer.File;

export interface RouteContext<B = any, Q = any, P = any, F = Record<string, UploadedFile | undefined>> {
  user: SessionUser;
  /** the request's session (null on public routes) */
  session: SessionClaims | null;
  body: B;
  query: Q;
  params: P;
  /** the file parts of a multipart form by field name (multipart routes; read by multer in `before`) */
  files: F;
  req: Request;
  res: Response;
  ds: DataSource;
}

/**
 * One mounted API route: its contract (shared/contract/*.ts) and its handler. The schemas below are the
 * contract's (kept here for the router, the role and fuzz tests). The handler returns the JSON answer
 * (or undefined after writing the response itself).
 */
export interface RouteDef {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** express path under /api, e.g. '/columns/:id' */
  path: string;
  access: Access;
  summary: string;
  body?: object;
  query?: object;
  params?: object;
  /** multipart routes: the schema of the form's text fields (validated into `body`) and the names of its file parts */
  form?: object;
  files?: readonly { name: string; required: boolean }[];
  /** extra middleware run after the permission check (e.g. multer) */
  before?: RequestHandler[];
  status?: number;
  /** open to a user who must first change a temporary password (the account routes) */
  whilePasswordChangeDue?: boolean;
  handler: (ctx: RouteContext) => unknown;
  /** the route's contract; every route has one (tests/api/contract.test.ts) */
  contract?: RouteContract;
}

export const defineRoutes = (routes: RouteDef[]): RouteDef[] => routes;

type Answer<R> = R extends TSchema ? R['static'] : void;
type Maybe<T> = T | Promise<T>;
/** What the handler gets as `body`: the JSON body, or a multipart form's text fields. */
type BodyOf<C extends RouteContract> = C['body'] extends TSchema ? Validated<C['body']> : FormFields<C['form']>;
/** A form's file parts: present when the form requires them (the route refuses the request otherwise). */
type FilesOf<S> =
  S extends TObject<infer P>
    ? {
        [K in FileKeys<S>]: K extends keyof P
          ? P[K] extends TOptional<TSchema>
            ? UploadedFile | undefined
            : UploadedFile
          : never;
      }
    : Record<string, never>;

/** A form's schema without its file parts (multer reads those), and their names. */
function splitForm(form: TObject | undefined): Pick<RouteDef, 'form' | 'files'> {
  if (!form) return {};
  const isFile = (s: TSchema): boolean => (s as { format?: unknown }).format === 'binary';
  const files = Object.keys(form.properties).filter((k) => isFile(form.properties[k]!));
  const fields = Obj(Object.fromEntries(Object.entries(form.properties).filter(([k]) => !files.includes(k))));
  return { form: fields, files: files.map((name) => ({ name, required: form.required?.includes(name) ?? false })) };
}

/**
 * The file parts multer left on the request (`single` → req.file, `fields`/`array` → req.files), by the
 * form's names; a missing required part is refused naming its field.
 */
export function formFiles(req: Request, specs: RouteDef['files'] = []): Record<string, UploadedFile | undefined> {
  const out: Record<string, UploadedFile | undefined> = {};
  const many = req.files;
  for (const { name, required } of specs) {
    const file =
      req.file?.fieldname === name ? req.file : Array.isArray(many) ? many.find((f) => f.fieldname === name) : many?.[name]?.[0];
    if (!file && required)
      throw new ValidationError(`No file in the field "${name}"`, [
        { path: name, message: `is required (multipart field "${name}")` },
      ]);
    out[name] = file;
  }
  return out;
}

/** The server side of a contract: what runs before the handler, and the handler with the contract's types. */
export interface Implementation<C extends RouteContract> {
  before?: RequestHandler[];
  whilePasswordChangeDue?: boolean;
  handler: (
    ctx: RouteContext<BodyOf<C>, Validated<C['query']>, Validated<C['params']>, FilesOf<C['form']>>,
  ) => Maybe<Answer<C['response']>>;
}

/** A route from its contract and its implementation. */
export const implement =
  <C extends RouteContract>(contract: C) =>
  (impl: Implementation<C>): RouteDef => ({
    method: contract.method,
    path: contract.path,
    access: contract.access,
    summary: contract.summary,
    body: contract.body,
    query: contract.query,
    params: contract.params,
    ...splitForm(contract.form),
    status: contract.status,
    before: impl.before,
    whilePasswordChangeDue: impl.whilePasswordChangeDue,
    handler: impl.handler as RouteDef['handler'],
    contract,
  });
