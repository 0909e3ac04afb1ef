import type { Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import type { Permission } from '../../shared/permissions.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { SessionClaims } from './auth.js';

export type Access = Permission | 'public' | 'signed-in';

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
 * One API route. `access` is mandatory: every route declares the permission it needs.
 * The handler returns the JSON answer (or undefined after writing the response itself).
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
}

export const defineRoutes = (routes: RouteDef[]): RouteDef[] => routes;
