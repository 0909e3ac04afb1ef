/**
 * Site isolation, with the visibility helper (server/services/access/access.ts) as the oracle: for every
 * GET route that reads site data, a user answers 200 exactly when the helper says they may see the item's
 * column (or site), 404 otherwise; every list holds only items the helper lets them see. An outsider (member
 * of a new, empty site), a member of the demo site and an administrator are asked about every demo item.
 */
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { allRoutes } from '../../server/routes/index.js';
import { canSeeColumn, siteFilterSql, type Viewer } from '../../server/services/access/access.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
type Agent = ReturnType<typeof request.agent>;
const users: Record<'outsider' | 'member' | 'admin', { agent: Agent; viewer: Viewer }> = {} as never;

/** One item a route reads: its path filled in, and the column (or, for a site, the site) it belongs to. */
interface Probe {
  url: string;
  /** a list filtered by the item: 200 with items when visible, 200 and empty when not */
  list?: boolean;
  columnId?: string;
  siteId?: string;
}

const one = async (sql: string): Promise<Record<string, string>[]> =>
  await ctx.ds.query<Record<string, string>[]>(`${sql} LIMIT 2`);

/**
 * How to find items for each GET route that has path parameters (or reads one column's items by query).
 * A route reading site data that is missing here fails the coverage test below.
 */
const PROBES: Record<string, () => Promise<Probe[]>> = {
  '/columns/:id': () => byColumn(''),
  '/columns/:id/sections': () => byColumn('/sections'),
  '/columns/:id/load-cases': () => byColumn('/load-cases'),
  '/columns/:id/studies': () => byColumn('/studies'),
  '/columns/:id/heat-plans': () => byColumn('/heat-plans'),
  '/columns/:id/evidence': () => byColumn('/evidence'),
  '/sites/:id/units': async () => (await one(`SELECT id FROM sites`)).map((r) => ({ url: `/sites/${r.id}/units`, siteId: r.id })),
  '/load-cases/:id': () => rows('load_cases', (id) => `/load-cases/${id}`),
  '/load-cases/:id/export': () => rows('load_cases', (id) => `/load-cases/${id}/export`),
  '/runs/compare': async () =>
    (
      await one(
        `SELECT a.id AS a, b.id AS b, a.column_id FROM rating_runs a JOIN rating_runs b ON b.column_id = a.column_id AND b.id <> a.id`,
      )
    ).map((r) => ({ url: `/runs/compare?a=${r.a}&b=${r.b}`, columnId: r.column_id })),
  '/runs/:id': () => rows('rating_runs', (id) => `/runs/${id}`),
  '/runs/:id/report.pdf': () => rows('rating_runs', (id) => `/runs/${id}/report.pdf`, 1),
  '/runs/:id/window/:tray': async () =>
    (await one(`SELECT id, column_id, summary->>'controllingTray' AS controlling_tray FROM rating_runs`)).map((r) => ({
      url: `/runs/${r.id}/window/${r.controlling_tray}`,
      columnId: r.column_id,
    })),
  '/runs/:id/export': () => rows('rating_runs', (id) => `/runs/${id}/export`),
  '/studies/:id': () => rows('pump_around_studies', (id) => `/studies/${id}`),
  '/studies/:id/report.pdf': () => rows('pump_around_studies', (id) => `/studies/${id}/report.pdf`, 1),
  '/studies/:id/export': () => rows('pump_around_studies', (id) => `/studies/${id}/export`),
  '/heat-plans/:id': () => rows('heat_plans', (id) => `/heat-plans/${id}`),
  '/heat-plans/:id/points/:index': () => rows('heat_plans', (id) => `/heat-plans/${id}/points/0`),
  '/heat-plans/:id/report.pdf': () => rows('heat_plans', (id) => `/heat-plans/${id}/report.pdf`, 1),
  '/heat-plans/:id/export': () => rows('heat_plans', (id) => `/heat-plans/${id}/export`),
  '/inspections': () => byColumnQuery('/inspections', 'inspections'),
  '/inspections/:id': () => rows('inspections', (id) => `/inspections/${id}`),
  '/inspections/:id/report.pdf': () => rows('inspections', (id) => `/inspections/${id}/report.pdf`, 1),
  '/evidence/:id': () => rows('field_evidence', (id) => `/evidence/${id}`),
  '/evidence/:id/reading': () => rows('field_evidence', (id) => `/evidence/${id}/reading`),
  '/evidence/:id/report.pdf': () => rows('field_evidence', (id) => `/evidence/${id}/report.pdf`, 1),
  '/runs': () => byColumnQuery('/runs', 'rating_runs'),
  '/columns': async () =>
    (await one(`SELECT s.id FROM sites s`)).map((r) => ({ url: `/columns?siteId=${r.id}`, siteId: r.id, list: true })),
};

/**
 * Routes outside the site rule: public, the signed-in user's own record, administration (users.manage), the
 * method and tolerance tables. Lists checked item by item below are also here. The photo of an inspection
 * is checked on its own (its file lives in object storage).
 */
const NOT_SITE_DATA = new Set([
  '/health',
  '/auth/me',
  '/users',
  '/sites',
  '/mail/outbox',
  '/mail/mailbox',
  '/methods',
  '/tolerances',
  '/sites/visible',
  '/inspections/:id/photos/:photoId',
]);

async function byColumn(suffix: string): Promise<Probe[]> {
  return (await one(`SELECT id FROM columns ORDER BY tag`)).map((r) => ({ url: `/columns/${r.id}${suffix}`, columnId: r.id }));
}
/** a list filtered by a column that has items in `table` */
async function byColumnQuery(path: string, table: string): Promise<Probe[]> {
  return (
    await one(`SELECT DISTINCT column_id AS id FROM ${table} WHERE ${table === 'rating_runs' ? "kind = 'rating'" : 'TRUE'}`)
  ).map((r) => ({
    url: `${path}?columnId=${r.id}`,
    columnId: r.id,
    list: true,
  }));
}
async function rows(table: string, url: (id: string) => string, n = 2): Promise<Probe[]> {
  return (await one(`SELECT id, column_id FROM ${table} ORDER BY id`))
    .slice(0, n)
    .map((r) => ({ url: url(r.id!), columnId: r.column_id }));
}

/** What the helper says: may this viewer see the probe's column or site? */
async function visible(viewer: Viewer, p: Probe): Promise<boolean> {
  if (p.columnId) return canSeeColumn(ctx.ds, viewer, p.columnId);
  const f = siteFilterSql(viewer, 's.id', 2);
  return (
    (await ctx.ds.query<unknown[]>(`SELECT 1 FROM sites s WHERE s.id = $1 AND ${f.sql}`, [p.siteId, ...f.params])).length > 0
  );
}

beforeAll(async () => {
  ctx = await setupApp();
  const [emptySite] = await ctx.ds.query<{ id: string }[]>(
    `INSERT INTO sites (name, location) VALUES ('Isolation test site ' || gen_random_uuid(), 'nowhere') RETURNING id`,
  );
  const demoSites = (
    await ctx.ds.query<
      {
        site_id: string;
      }[]
    >(`SELECT DISTINCT u.site_id FROM columns c JOIN process_units u ON u.id = c.unit_id`)
  ).map((r) => r.site_id);
  expect(demoSites.length, 'the seeded demo data has columns').toBeGreaterThan(0);
  for (const [name, role, sites] of [
    ['outsider', 'internals-specialist', [emptySite!.id]],
    ['member', 'internals-specialist', demoSites],
    ['admin', 'admin', []],
  ] as const) {
    const s = await signedIn(ctx, role, [...sites]);
    users[name] = { agent: s.agent, viewer: { id: s.user.id, role: s.user.role } };
  }
}, 60_000);
afterAll(() => ctx.close());

describe('every GET route reading site data answers as the visibility helper says', () => {
  it('each such route has a probe (a new route must be added here)', () => {
    const gets = allRoutes.filter((r) => r.method === 'get').map((r) => r.path);
    const missing = gets.filter((p) => !PROBES[p] && !NOT_SITE_DATA.has(p));
    expect(missing).toEqual([]);
  });

  for (const path of Object.keys(PROBES)) {
    it(`GET ${path}`, async () => {
      const probes = await PROBES[path]!();
      expect(probes.length, `the demo data has an item for ${path}`).toBeGreaterThan(0);
      for (const p of probes)
        for (const [name, u] of Object.entries(users)) {
          const res = await u.agent.get(`/api${p.url}`);
          const may = await visible(u.viewer, p);
          if (name === 'outsider') expect(may, 'the helper hides the demo site from the outsider').toBe(false);
          else expect(may, `the helper shows the demo site to the ${name}`).toBe(true);
          const what = `${name} ${p.url}: ${JSON.stringify(res.body).slice(0, 200)}`;
          if (p.list) {
            expect(res.status, what).toBe(200);
            const items = (res.body as { items: unknown[] }).items;
            if (may) expect(items.length, what).toBeGreaterThan(0);
            else expect(items, what).toEqual([]);
          } else expect(res.status, what).toBe(may ? 200 : 404);
        }
    }, 120_000);
  }
});

describe('lists hold only what the helper lets the user see', () => {
  /** every columnId / siteId found anywhere in an answer */
  function owners(x: unknown, out: { columnIds: Set<string>; siteIds: Set<string> }): typeof out {
    if (Array.isArray(x)) for (const v of x) owners(v, out);
    else if (x && typeof x === 'object')
      for (const [k, v] of Object.entries(x)) {
        if (k === 'columnId' && typeof v === 'string') out.columnIds.add(v);
        else if (k === 'siteId' && typeof v === 'string') out.siteIds.add(v);
        else owners(v, out);
      }
    return out;
  }

  for (const url of ['/columns?pageSize=200', '/runs?pageSize=200&inspection=true', '/inspections', '/sites/visible']) {
    it(`GET ${url}`, async () => {
      for (const [name, u] of Object.entries(users)) {
        const res = await u.agent.get(`/api${url}`);
        expect(res.status).toBe(200);
        const found = owners(res.body, { columnIds: new Set(), siteIds: new Set() });
        if (url === '/sites/visible') for (const s of (res.body as { items: { id: string }[] }).items) found.siteIds.add(s.id);
        for (const columnId of found.columnIds)
          expect(await visible(u.viewer, { url, columnId }), `${name} sees ${columnId}`).toBe(true);
        for (const siteId of found.siteIds)
          expect(await visible(u.viewer, { url, siteId }), `${name} sees site ${siteId}`).toBe(true);
        if (name !== 'outsider')
          expect(found.columnIds.size + found.siteIds.size, `${name} sees the demo items`).toBeGreaterThan(0);
      }
    });
  }

  it('an inspection photo of the demo site is a 404 for the outsider, before any file is read', async () => {
    const [insp] = await ctx.ds.query<{ id: string }[]>(`SELECT id FROM inspections LIMIT 1`);
    const [photo] = await ctx.ds.query<{ id: string }[]>(
      `INSERT INTO inspection_photos (inspection_id, content_type, bytes, object_key, thumb_key)
       VALUES ($1, 'image/jpeg', 1, 'isolation-test/none.jpg', 'isolation-test/none-thumb.jpg') RETURNING id`,
      [insp!.id],
    );
    try {
      const res = await users.outsider.agent.get(`/api/inspections/${insp!.id}/photos/${photo!.id}`);
      expect(res.status).toBe(404);
    } finally {
      await ctx.ds.query(`DELETE FROM inspection_photos WHERE id = $1`, [photo!.id]);
    }
  });
});
