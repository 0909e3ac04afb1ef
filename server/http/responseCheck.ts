/**
 * Tests only (NODE_ENV=test, see app.ts): every JSON answer of /api is checked against the schema its
 * route's contract declares for its status (the shared ErrorBody for errors), so the whole API suite
 * proves the contract. An answer that does not match is replaced by a 500 naming each fault: loud drift.
 * Never mounted in production.
 */
import { Ajv, type ValidateFunction } from 'ajv';
import addFormatsModule from 'ajv-formats';
import type { TSchema } from '@sinclair/typebox';
import type { RequestHandler, Response } from 'express';
import { ErrorBody } from '../../shared/contract/schema.js';
import { isFileAnswer, type RouteContract } from '../../shared/contract/route.js';
import { ajvDetails } from '../../shared/contract/fieldErrors.js';
import { logger } from '../logger.js';

const addFormats = addFormatsModule as unknown as (ajv: Ajv) => Ajv;
const ajv = addFormats(new Ajv({ allErrors: true, strict: false, coerceTypes: false, useDefaults: false }));
const compiled = new WeakMap<object, ValidateFunction>();

const compile = (s: TSchema): ValidateFunction => {
  let fn = compiled.get(s);
  if (!fn) compiled.set(s, (fn = ajv.compile(s)));
  return fn;
};

/** The schema an answer with this status must match, or null when the contract declares no JSON body for it. */
export function answerSchema(c: RouteContract | undefined, status: number): TSchema | null {
  const other = c?.otherResponses?.[status];
  if (other) return other;
  if (status >= 400 || !c) return ErrorBody;
  if (status === (c.status ?? 200) && c.response && !isFileAnswer(c.response)) return c.response;
  return null;
}

/** Faults of `body` (as the client will read it, after JSON) against the contract, or null. */
export function answerFaults(c: RouteContract | undefined, status: number, body: unknown): string[] | null {
  const schema = answerSchema(c, status);
  if (!schema) return [`status ${status} with a JSON body is not declared by the contract`];
  const fn = compile(schema);
  const data: unknown = body === undefined ? undefined : JSON.parse(JSON.stringify(body));
  return fn(data) ? null : ajvDetails(fn.errors).map((d) => `${d.path} ${d.message}`);
}

/** res.locals key where the router leaves the matched route's contract ('legacy' for a route without one). */
export const CONTRACT_LOCAL = 'contract';

export const checkAnswers: RequestHandler = (req, res, next) => {
  const json = res.json.bind(res) as Response['json'];
  res.json = function checked(body: unknown) {
    const c = res.locals[CONTRACT_LOCAL] as RouteContract | 'legacy' | undefined;
    if (c === 'legacy') return json(body);
    const status = res.statusCode;
    const faults = answerFaults(c, status, body);
    if (!faults) return json(body);
    logger.error({ method: req.method, url: req.originalUrl, status, faults }, 'answer breaks its contract');
    res.status(500);
    return json({
      error: `Answer breaks its contract (${req.method} ${c ? c.path : req.originalUrl}, status was ${status})`,
      details: faults.slice(0, 20).map((f) => ({ path: '(answer)', message: f })),
    });
  } as Response['json'];
  next();
};
