import { Notify } from 'quasar';
import type { Router } from 'vue-router';
import type { ApiErrorBody } from '../../shared/types/api';
import { pathOf, type AnswerOf, type RequestOf, type RouteContract } from '../../shared/contract/route';
import { pathWords } from '../utils/fieldNames';

/** An API failure, carrying the server's `{ error, details }` body. */
export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly body: ApiErrorBody,
  ) {
    super(body.error);
  }
}

let router: Router | null = null;
let onUnauthorized: (() => void) | null = null;

export function installApi(r: Router): void {
  router = r;
  // an API failure has already been shown to the user by request(); do not also report it as unhandled
  window.addEventListener('unhandledrejection', (e) => {
    if (e.reason instanceof ApiError) e.preventDefault();
  });
}
export function setUnauthorizedHandler(fn: () => void): void {
  onUnauthorized = fn;
}

export interface RequestOptions {
  query?: Record<string, string | number | boolean | undefined>;
  body?: unknown;
  /** do not show a notification on failure (the caller shows the error itself) */
  quiet?: boolean;
  /** do not show a notification for these statuses only (the caller shows them; others are notified) */
  quietFor?: readonly number[];
}

/** An API error body in one line for people: the error, then up to `max` details with their fields in words. */
export function describeApiError(body: ApiErrorBody, max = 4): string {
  const d = body.details?.slice(0, max).map((x) => `${pathWords(x.path)}: ${x.message}`) ?? [];
  return d.length ? `${body.error} — ${d.join('; ')}` : body.error;
}

/** The one API client: JSON in and out, errors shown to the user, 401 returns to sign-in. */
async function request<T>(method: string, url: string, opts: RequestOptions = {}): Promise<T> {
  const qs = opts.query
    ? '?' +
      new URLSearchParams(
        Object.entries(opts.query)
          .filter(([, v]) => v !== undefined && v !== '')
          .map(([k, v]) => [k, String(v)]),
      ).toString()
    : '';
  const isForm = opts.body instanceof FormData;
  let res: Response;
  try {
    res = await fetch(`/api${url}${qs}`, {
      method,
      credentials: 'same-origin',
      headers: opts.body !== undefined && !isForm ? { 'Content-Type': 'application/json' } : undefined,
      body: opts.body === undefined ? undefined : isForm ? (opts.body as FormData) : JSON.stringify(opts.body),
    });
  } catch {
    // no answer at all (offline, server down): say so rather than fail silently
    const body: ApiErrorBody = { error: 'The server could not be reached. Check the connection and try again.' };
    if (!opts.quiet) Notify.create({ type: 'negative', message: body.error, multiLine: true });
    throw new ApiError(0, body);
  }
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => ({ error: `HTTP ${res.status}` }))) as unknown;
  if (!res.ok) {
    const body = data as ApiErrorBody;
    if (res.status === 401 && !url.startsWith('/auth/sign-in')) {
      onUnauthorized?.();
      const current = router?.currentRoute.value;
      if (router && current?.name !== 'sign-in') void router.push({ name: 'sign-in', query: { redirect: current?.fullPath } });
    } else if (!opts.quiet && !opts.quietFor?.includes(res.status)) {
      Notify.create({ type: 'negative', message: describeApiError(body), multiLine: true });
    }
    throw new ApiError(res.status, body);
  }
  return data as T;
}

/** A multipart body from a contract's form: text fields first, then the files. */
function formData(form: object): FormData {
  const fd = new FormData();
  const entries = Object.entries(form).filter(([, v]) => v !== undefined);
  for (const [k, v] of entries) if (!(v instanceof Blob)) fd.append(k, String(v));
  for (const [k, v] of entries) if (v instanceof Blob) fd.append(k, v);
  return fd;
}

/** A route by its contract (shared/contract/): parameters, query, body (or multipart form) and answer typed by it. */
function call<C extends RouteContract>(c: C, input: NoInfer<RequestOf<C>> = {}, opts: RequestOptions = {}): Promise<AnswerOf<C>> {
  const url = pathOf(c, (input.params ?? {}) as Record<string, string | number>);
  const query = input.query as RequestOptions['query'];
  const body = input.form ? formData(input.form) : input.body;
  return request<AnswerOf<C>>(c.method.toUpperCase(), url, { ...opts, ...(query ? { query } : {}), body });
}

/** Client requests go through route contracts only (shared/contract/): `api.call`. */
export const api = { call };
