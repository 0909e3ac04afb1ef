import type { TSchema } from '@sinclair/typebox';
import type { Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import type { Validated } from '../../shared/contract/schema.js';
import type { Access, RouteContract } from '../../shared/contract/route.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { SessionClaims } from './auth.js';

export type { Access } from '../../shared/contract/route.js';

export interface RouteContext<B = any, Q = any, P = any> {
  user: SessionUser;
  /** the request's session (null on public routes) */
  session: SessionClaims | null;
  body: B;
  query: Q;
  params: P;
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
  /** extra middleware run after the permission check (e.g. multer) */
  before?: RequestHandler[];
  status?: number;
  /** open to a user who must first change a temporary password (the account routes) */
  whilePasswordChangeDue?: boolean;
  handler: (ctx: RouteContext) => Promise<unknown> | unknown;
  /** the route's contract; every route has one (tests/api/contract.test.ts) */
  contract?: RouteContract;
}

export const defineRoutes = (routes: RouteDef[]): RouteDef[] => routes;

type Answer<R> = R extends TSchema ? R['static'] : void;
type Maybe<T> = T | Promise<T>;

/** The server side of a contract: what runs before the handler, and the handler with the contract's types. */
export interface Implementation<C extends RouteContract> {
  before?: RequestHandler[];
  whilePasswordChangeDue?: boolean;
  handler: (
    ctx: RouteContext<Validated<C['body']>, Validated<C['query']>, Validated<C['params']>>,
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
    status: contract.status,
    before: impl.before,
    whilePasswordChangeDue: impl.whilePasswordChangeDue,
    handler: impl.handler as RouteDef['handler'],
    contract,
  });
