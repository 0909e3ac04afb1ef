import cookieParser from 'cookie-parser';
import express, { type Express, type NextFunction, type Request, type Response } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { pinoHttp } from 'pino-http';
import swaggerUi from 'swagger-ui-express';
import type { DataSource } from 'typeorm';
import { config } from './config.js';
import { ForbiddenError, UnauthorizedError } from './errors.js';
import { readSession, renewSessionIfOld, type SessionClaims } from './http/auth.js';
import { errorHandler, notFoundHandler } from './http/errorHandler.js';
import { buildOpenApi } from './http/openapi.js';
import { checkAnswers as answerCheck, CONTRACT_LOCAL } from './http/responseCheck.js';
import { clientStatic } from './http/staticClient.js';
import { formFiles, type RouteDef } from './http/route.js';
import { validate } from './http/validation.js';
import { logger } from './logger.js';
import { allRoutes } from './routes/index.js';
import { activeSessionUser } from './services/auth/users.js';
import { healthContract } from '../shared/contract/health.js';
import { can, PERMISSION_LABELS, ROLE_LABELS } from '../shared/permissions.js';
import type { SessionUser } from '../shared/types/api.js';

export interface AppOptions {
  ds: DataSource;
  routes?: RouteDef[];
  serveClient?: boolean;
  /** check every JSON answer against its route's contract (server/http/responseCheck.ts): tests only */
  checkAnswers?: boolean;
}

/** Run an async step; errors go to the error middleware, success continues only when `proceed` is set. */
const wrap =
  (fn: (req: Request, res: Response) => Promise<void>, proceed = false) =>
  (req: Request, res: Response, next: NextFunction): void => {
    fn(req, res).then(() => (proceed ? next() : undefined), next);
  };

function mountRoute(router: express.Router, ds: DataSource, r: RouteDef): void {
  const authn = wrap(async (req, res) => {
    res.locals[CONTRACT_LOCAL] = r.contract ?? 'legacy';
    let user: SessionUser | null = null;
    if (r.access !== 'public') {
      const session = readSession(req);
      user = session ? await activeSessionUser(ds, session) : null;
      if (!user || !session) throw new UnauthorizedError();
      renewSessionIfOld(res, user, session);
      res.locals.session = session;
      if (user.mustChangePassword && !r.whilePasswordChangeDue)
        throw new ForbiddenError(
          'Change the temporary password an administrator set before anything else (account menu, Change password)',
        );
      if (r.access !== 'signed-in' && !can(user.role, r.access))
        throw new ForbiddenError(
          `Your role (${ROLE_LABELS[user.role]}) does not include “${PERMISSION_LABELS[r.access].toLowerCase()}”`,
        );
    }
    res.locals.user = user;
  }, true);
  const run = wrap(async (req, res) => {
    const params = r.params ? validate<unknown>(r.params, { ...req.params }, 'params') : req.params;
    const query = r.query ? validate(r.query, { ...(req.query as object) }, 'query') : {};
    const files = formFiles(req, r.files);
    const body = r.body
      ? validate<unknown>(r.body, req.body ?? {}, 'body')
      : r.form
        ? validate<unknown>(r.form, { ...(req.body as object | undefined) }, 'body')
        : (req.body as unknown);
    const session = (res.locals.session as SessionClaims | undefined) ?? null;
    const out = await r.handler({ user: res.locals.user as SessionUser, session, body, query, params, files, req, res, ds });
    if (res.headersSent) return;
    if (out === undefined) res.status(204).end();
    else res.status(res.statusCode !== 200 ? res.statusCode : (r.status ?? 200)).json(out);
  });
  const chain = [authn, ...(r.before ?? []), run];
  router[r.method](r.path, ...chain);
}

/** Express app factory; the listener lives in main.ts so tests can drive the app with supertest. */
export function createApp({ ds, routes = allRoutes, serveClient = true, checkAnswers = config.isTest }: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: !config.isTest,
      // our serializers get the raw request and response: the wrapped (standard) ones first build a full
      // copy with every header, on every request, only for us to keep two fields of it
      wrapSerializers: false,
      serializers: {
        req: (req: { method: string; originalUrl?: string; url: string }) => ({
          method: req.method,
          url: req.originalUrl ?? req.url,
        }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
    }),
  );
  app.use(cookieParser());
  // API answers (records, exports, photos, errors) are never stored by browsers or proxies
  app.use('/api', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  if (checkAnswers) app.use('/api', answerCheck);
  app.use('/api', express.json({ limit: config.bodyLimit }));

  const api = express.Router();
  for (const r of routes) mountRoute(api, ds, r);
  const openapi = buildOpenApi(routes, '1');
  api.get('/openapi.json', (_req, res) => {
    res.locals[CONTRACT_LOCAL] = healthContract.openApi;
    res.json(openapi);
  });
  api.use('/docs', swaggerUi.serve, swaggerUi.setup(openapi, { customSiteTitle: 'Frothline API' }));
  app.use('/api', api);
  app.use('/api', notFoundHandler);

  const dist = config.clientDist;
  if (serveClient && existsSync(path.join(dist, 'index.html'))) app.use(...clientStatic(dist));
  app.use(errorHandler);
  return app;
}
