import { defineRoutes } from '../http/route.js';
import { createPumpAround, deletePumpAround, updatePumpAround } from '../services/columns/sectionsPumpArounds.js';
import { createSection, deleteSection, listVisibleSections, updateSection } from '../services/columns/sections.js';
import {
  pumpAroundBody,
  sectionBody,
  updatePumpAroundBody,
  updateSectionBody,
  versionBody,
} from '../../shared/schemas/columns.js';
import { uuidParams } from '../../shared/schemas/common.js';
import type { PumpAroundBody, SectionBody, UpdatePumpAroundBody, UpdateSectionBody } from '../../shared/types/columns.js';

type Id = { id: string };
const versionQuery = versionBody;

export const sectionRoutes = defineRoutes([
  {
    method: 'get',
    path: '/columns/:id/sections',
    access: 'read',
    summary: 'Tray sections of a column, by first tray',
    params: uuidParams,
    handler: async ({ ds, user, params }) => ({ items: await listVisibleSections(ds, user, (params as Id).id) }),
  },
  {
    method: 'post',
    path: '/columns/:id/sections',
    access: 'geometry.edit',
    summary: 'Add a tray section (engine geometry, tray range not overlapping other sections, provenance)',
    params: uuidParams,
    body: sectionBody,
    status: 201,
    handler: async ({ ds, user, params, body }) => createSection(ds, user, (params as Id).id, body as SectionBody),
  },
  {
    method: 'put',
    path: '/sections/:id',
    access: 'geometry.edit',
    summary: 'Replace a tray section (optimistic lock on version)',
    params: uuidParams,
    body: updateSectionBody,
    handler: async ({ ds, user, params, body }) => updateSection(ds, user, (params as Id).id, body as UpdateSectionBody),
  },
  {
    method: 'delete',
    path: '/sections/:id',
    access: 'geometry.edit',
    summary: 'Delete a tray section (?version=N; stored runs keep their snapshot)',
    params: uuidParams,
    query: versionQuery,
    handler: async ({ ds, user, params, query }) =>
      deleteSection(ds, user, (params as Id).id, (query as { version: number }).version),
  },
  {
    method: 'post',
    path: '/columns/:id/pump-arounds',
    access: 'geometry.edit',
    summary: 'Add a pump-around (draw tray, return tray above it, base duty kW)',
    params: uuidParams,
    body: pumpAroundBody,
    status: 201,
    handler: async ({ ds, user, params, body }) => createPumpAround(ds, user, (params as Id).id, body as PumpAroundBody),
  },
  {
    method: 'put',
    path: '/pump-arounds/:id',
    access: 'geometry.edit',
    summary: 'Edit a pump-around (optimistic lock on version)',
    params: uuidParams,
    body: updatePumpAroundBody,
    handler: async ({ ds, user, params, body }) => updatePumpAround(ds, user, (params as Id).id, body as UpdatePumpAroundBody),
  },
  {
    method: 'delete',
    path: '/pump-arounds/:id',
    access: 'geometry.edit',
    summary: 'Delete a pump-around (?version=N)',
    params: uuidParams,
    query: versionQuery,
    handler: async ({ ds, user, params, query }) =>
      deletePumpAround(ds, user, (params as Id).id, (query as { version: number }).version),
  },
]);
