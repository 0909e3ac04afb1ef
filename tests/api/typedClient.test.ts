/**
 * The published OpenAPI document makes a typed client: openapi-typescript generates the types from the live
 * document (served by the app), tsc type-checks a small openapi-fetch client against them, and that client
 * then calls real routes, whose answers are checked against the document's own answer schemas.
 */
import { Ajv } from 'ajv';
import addFormatsModule from 'ajv-formats';
import { execFile } from 'node:child_process';
import { copyFileSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import path from 'node:path';
import { promisify } from 'node:util';
import openapiTS, { astToString } from 'openapi-typescript';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, sessionCookie, setupApp, TEST_PASSWORD, type TestContext } from '../helpers/app.js';
import { makeInspectionColumn } from './inspection-fixture.js';

const run = promisify(execFile);

type Answers = { path: string; method: string; status: number; body: unknown }[];
type RateAgain = (base: string, email: string, password: string) => Promise<Answers>;
/** tests/fixtures/typedClient/records.ts */
type ReadRecords = (
  base: string,
  cookie: string,
) => Promise<{ sense?: string; rangeWidth?: number; failed?: number; answers: Answers }>;
type ReadStudy = (
  base: string,
  cookie: string,
) => Promise<{ studyPoints: number; limiting?: string | null; latentHeat?: number; evidenceKind?: string; answers: Answers }>;
type CheckImport = (
  base: string,
  cookie: string,
  columnId: string,
  csv: string,
) => Promise<{ trays: number[]; previewTrays?: number[]; answers: Answers }>;
/** tests/fixtures/typedClient/inspections.ts */
type Inspect = (
  base: string,
  s: { inspectorCookie: string; engineerCookie: string; columnId: string; loadCaseId: string; png: Uint8Array<ArrayBuffer> },
) => Promise<{ failedChecks: number | null; answers: Answers }>;
/** tests/fixtures/typedClient/plant.ts */
type PlantTour = (
  base: string,
  cookie: string,
) => Promise<{
  numbering: string;
  engineerId: string | null;
  firstTrays: number[];
  vapour?: number;
  stalePaths?: string[];
  answers: Answers;
}>;
/** tests/fixtures/typedClient/client.ts (type-checked on its own, against the generated types) */
type Exercise = (
  base: string,
  email: string,
  password: string,
) => Promise<{
  role: string;
  status?: string;
  firstUserVersion?: number;
  badUserPaths?: string[];
  answers: Answers;
}>;
const addFormats = addFormatsModule as unknown as (ajv: Ajv) => Ajv;
const root = path.resolve(import.meta.dirname, '../..');

let ctx: TestContext;
let server: Server;
let base: string;
let dir: string;
beforeAll(async () => {
  ctx = await setupApp();
  server = ctx.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  // inside node_modules/.cache so the client resolves openapi-fetch from the project
  dir = mkdtempSync(path.join(root, 'node_modules/.cache/typed-client-'));
});
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await new Promise((r) => server.close(r));
  await ctx.close();
});

describe('a client generated from the published OpenAPI document', () => {
  let doc: {
    paths: Record<string, Record<string, { responses: Record<string, { content?: Record<string, { schema: object }> }> }>>;
    components: object;
  };

  it('generates types from the live document and type-checks a client against them', async () => {
    doc = (await (await fetch(`${base}/api/openapi.json`)).json()) as typeof doc;
    const types = astToString(await openapiTS(doc as unknown as Parameters<typeof openapiTS>[0]));
    expect(types).toMatch(/"\/api\/runs": \{/);
    writeFileSync(path.join(dir, 'api.d.ts'), types);
    const fixtures = path.join(root, 'tests/fixtures/typedClient');
    const clients = readdirSync(fixtures).filter((f) => f.endsWith('.ts'));
    for (const f of clients) copyFileSync(path.join(fixtures, f), path.join(dir, f));
    writeFileSync(
      path.join(dir, 'tsconfig.json'),
      JSON.stringify({
        compilerOptions: {
          strict: true,
          noEmit: true,
          target: 'ES2022',
          module: 'ESNext',
          moduleResolution: 'bundler',
          lib: ['ES2022', 'DOM', 'DOM.Iterable'],
          types: [],
          skipLibCheck: true,
        },
        files: [...clients, 'api.d.ts'],
      }),
    );
    const tsc = path.join(root, 'node_modules/typescript/bin/tsc');
    const out = await run(process.execPath, [tsc, '-p', path.join(dir, 'tsconfig.json')]).then(
      () => '',
      (e: Error & { stdout?: string }) => e.stdout ?? String(e),
    );
    expect(out, 'tsc on the generated types and the client').toBe('');
  }, 120000);

  it('calls real routes through it; every answer matches the document’s schema for its status', async () => {
    const admin = await makeUser(ctx.ds, 'admin');
    const { exercise, rateAgain } = (await import(path.join(dir, 'client.ts'))) as { exercise: Exercise; rateAgain: RateAgain };
    const r = await exercise(base, admin.email, TEST_PASSWORD);
    const sites = await ctx.ds.query<{ id: string }[]>('SELECT id FROM sites');
    const engineer = await makeUser(
      ctx.ds,
      'process-engineer',
      sites.map((s) => s.id),
    );
    const runs = await rateAgain(base, engineer.email, TEST_PASSWORD);
    expect(runs.map((a) => a.status)).toEqual([200, 201, 200]);
    r.answers.push(...runs);
    const { readRecords, readStudy, checkImport } = (await import(path.join(dir, 'records.ts'))) as {
      readRecords: ReadRecords;
      readStudy: ReadStudy;
      checkImport: CheckImport;
    };
    const records = await readRecords(base, await sessionCookie(ctx.ds, admin));
    expect(records.answers.map((a) => a.status)).toEqual([200, 200]);
    expect(['min', 'max']).toContain(records.sense);
    expect(records.rangeWidth).toBeGreaterThan(0);
    expect(records.failed).toBeGreaterThanOrEqual(0);
    r.answers.push(...records.answers);
    const study = await readStudy(base, await sessionCookie(ctx.ds, engineer));
    expect(study.studyPoints, 'a stored study (the demo seeds one) read through the typed client').toBeGreaterThan(1);
    expect(study.latentHeat).toBeCloseTo((5000 * 3600) / 60000, 6); // kW / (kg/h) → kJ/kg
    expect(study.evidenceKind, 'a field-evidence record (the demo seeds some) read through the typed client').toBeDefined();
    r.answers.push(...study.answers);
    const csv = [
      'Tray,Vapour flow (kg/h),Liquid flow (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m)',
    ]
      .concat(['1,40000,60000,3.1,720,18', '2,40500,60500,3.1,719,18', '3,41000,61000,3.0,718,17.8'])
      .join('\n');
    // the oldest column (the demo's): other test files add and remove columns of their own meanwhile
    const columnId = await ctx.ds.query<{ id: string; tray_count: number }[]>(
      'SELECT id, tray_count FROM columns ORDER BY created_at, tag LIMIT 1',
    );
    const imported = await checkImport(base, await sessionCookie(ctx.ds, engineer), columnId[0]!.id, csv);
    expect(imported.answers.map((a) => a.status)).toEqual([200, 200]);
    // the check reverses the numbering: tray t becomes trayCount + 1 - t
    const n = columnId[0]!.tray_count;
    expect(imported.trays.sort((a, b) => a - b)).toEqual(imported.previewTrays!.map((t) => n + 1 - t).sort((a, b) => a - b));
    r.answers.push(...imported.answers);
    const { inspect } = (await import(path.join(dir, 'inspections.ts'))) as { inspect: Inspect };
    const column = await makeInspectionColumn(ctx.ds, null);
    const inspector = await makeUser(ctx.ds, 'inspector', [column.siteId]);
    const columnEngineer = await makeUser(ctx.ds, 'process-engineer', [column.siteId]);
    const png = await sharp({ create: { width: 32, height: 24, channels: 3, background: '#5b7083' } })
      .png()
      .toBuffer();
    const inspection = await inspect(base, {
      inspectorCookie: await sessionCookie(ctx.ds, inspector),
      engineerCookie: await sessionCookie(ctx.ds, columnEngineer),
      ...column,
      png: new Uint8Array(png),
    });
    expect(inspection.answers.map((a) => `${a.method} ${a.status}`)).toEqual([
      'get 200',
      'post 201',
      'get 200',
      'put 200',
      'post 201',
      'post 200',
      'post 201',
      'get 200',
      'post 201',
    ]);
    // GEOMETRY's weir is 50 mm: 60 and 61 mm are both outside ±1.6 mm (PIP VEFV1102, the published set)
    expect(inspection.failedChecks).toBe(2);
    r.answers.push(...inspection.answers);
    // a process engineer of every site: the stale load-case edit needs loads.edit
    const { plantTour } = (await import(path.join(dir, 'plant.ts'))) as { plantTour: PlantTour };
    const tour = await plantTour(base, await sessionCookie(ctx.ds, engineer));
    expect(tour.answers.map((a) => a.status)).toEqual([200, 200, 200, 200, 200, 200, 200, 409]);
    expect(['top-down', 'bottom-up']).toContain(tour.numbering);
    expect(tour.firstTrays.length).toBeGreaterThan(0);
    expect(tour.vapour).toBeGreaterThan(0);
    expect(tour.stalePaths).toEqual(['version']);
    r.answers.push(...tour.answers);
    expect(r.role).toBe('admin');
    expect(r.status).toBe('ok');
    expect(r.firstUserVersion).toBeGreaterThanOrEqual(1);
    expect(r.badUserPaths).toEqual(['id']);
    const ajv = addFormats(new Ajv({ allErrors: true, strict: false }));
    ajv.addSchema({ components: doc.components }, 'doc');
    for (const a of r.answers) {
      const schema = doc.paths[a.path]?.[a.method]?.responses[String(a.status)]?.content?.['application/json']?.schema;
      expect(schema, `${a.method} ${a.path} ${a.status} has a schema`).toBeDefined();
      const check = ajv.compile(JSON.parse(JSON.stringify(schema).replaceAll('"#/components/', '"doc#/components/')) as object);
      expect(check(a.body), `${a.method} ${a.path} ${a.status}: ${JSON.stringify(check.errors)}`).toBe(true);
    }
  }, 120000);
});
