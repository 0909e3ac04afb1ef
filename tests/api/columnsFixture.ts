/** Test fixtures for the column / load-case / run API tests: a fresh invented plant per call. */
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { expect } from 'vitest';
import { ProcessUnit, Site, TowerColumn } from '../../server/db/entities/index.js';
import { DEMO_SECTIONS } from '../../server/db/seed/demoColumn.js';
import { demoProfile } from '../../server/db/seed/demoLoads.js';
import type { SectionBody } from '../../shared/types/columns.js';
import type { TrayLoad } from '../../shared/types/rating.js';
import { signedIn, type TestContext } from '../helpers/app.js';

export interface Plant {
  siteId: string;
  unitId: string;
  columnId: string;
}

/** A new site, unit and 20-tray top-down column with invented tags. */
export async function makePlant(ds: DataSource, trayCount = 20): Promise<Plant> {
  const tag = randomUUID().slice(0, 6);
  const site = await ds.getRepository(Site).save({ name: `Test site ${tag}`, location: 'test' });
  const unit = await ds.getRepository(ProcessUnit).save({ siteId: site.id, name: `Unit ${tag}` });
  const col = await ds
    .getRepository(TowerColumn)
    .save({ unitId: unit.id, tag: `T-${tag}`, service: 'test column', numbering: 'top-down', trayCount });
  return { siteId: site.id, unitId: unit.id, columnId: col.id };
}

/** A valid section body (the demo top-section geometry) over the given trays. */
export const section = (firstTray: number, lastTray: number, name = `S${firstTray}-${lastTray}`): SectionBody => ({
  name,
  firstTray,
  lastTray,
  geometry: structuredClone(DEMO_SECTIONS[0]!.geometry),
  provenance: 'design',
  provenanceDate: null,
});

/** Invented loads for trays first..last (taken from the demo's normal profile). */
export function loads(first: number, last: number, vapourFactor = 1): TrayLoad[] {
  const all = demoProfile({ vapour: vapourFactor, liquid: 1, topReflux_kg_h: 150000 });
  return all.filter((l) => l.tray >= first && l.tray <= last);
}

/**
 * Two runs of one load case on a fresh 8-tray section of the plant, rated through the API by a process
 * engineer (the section made by a specialist): the first labelled "Current", the second with `label`, for
 * tests that then rewrite the second as an older stored run would be.
 */
export async function twoRuns(ctx: TestContext, plant: Plant, label: string) {
  const { agent: specialist } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
  const { agent: engineer } = await signedIn(ctx, 'process-engineer', [plant.siteId]);
  expect((await specialist.post(`/api/columns/${plant.columnId}/sections`).send(section(1, 8, 'Top'))).status).toBe(201);
  const lc = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 8) })
  ).body.id;
  const current = (await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label: 'Current' }))
    .body as { id: string };
  const other = (await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label })).body as {
    id: string;
  };
  return { engineer, current, other };
}
