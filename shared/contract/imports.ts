/**
 * Contracts of the tray-profile import (CSV/XLSX): upload → preview → check → commit. The request payloads are
 * declared in shared/contract/importPayloads.ts.
 */
import { Type, type Static } from '@sinclair/typebox';
import {
  ImportCheckBodySchema,
  ImportCommitBodySchema,
  ImportMappingSchema,
  ImportNumberingSchema,
  ImportUnitsSchema,
} from './importPayloads.js';
import { TrayLoadSchema } from './rating.js';
import { ImportRowErrorSchema, ImportRowsErrorBodySchema } from './importRows.js';
import { LoadCaseRecordSchema } from './loads.js';
import { route, type RouteContract } from './route.js';
import { FilePart, IdParams, Nullable, Obj, StringEnum } from './schema.js';

/** The uploaded file: one part named "file", CSV or XLSX (size limit IMPORT_MAX_BYTES). */
export const ImportFileForm = Obj({ file: FilePart({ description: 'CSV or XLSX' }) });
export const ImportSheetQuery = Obj({ sheet: Type.Optional(Type.String({ maxLength: 100 })) });
export const ImportFormatSchema = StringEnum(['csv', 'xlsx'] as const);

/** What every file preview tells: where the header was found, how much was read, and every row error. */
export const previewFields = {
  /** pass back to check and commit instead of re-sending the rows; valid for 30 minutes, same user and column */
  token: Type.String(),
  fileName: Type.String(),
  format: ImportFormatSchema,
  sheet: Nullable(Type.String()),
  /** 1-based row of the detected header */
  headerRow: Type.Integer(),
  headers: Type.Array(Type.String()),
  /** data rows read (the token keeps them all) */
  rowCount: Type.Integer({ minimum: 0 }),
  /** set when the file was cut at the row limit: the last row read (the file continues after it) */
  cutAfterRow: Nullable(Type.Integer()),
  /** the first row errors (IMPORT_LIMITS.listedErrors) */
  errors: Type.Array(ImportRowErrorSchema),
  /** how many row errors there are */
  errorCount: Type.Integer({ minimum: 0 }),
  /** notes on reading and detection (rows cut, unmapped columns, assumed units, guessed direction) */
  notes: Type.Array(Type.String()),
};

export const ImportPreviewSchema = Obj({
  ...previewFields,
  /** the first data rows as read (cells as text, long ones clipped), after the header: IMPORT_LIMITS.previewRows */
  rows: Type.Array(Type.Array(Type.String())),
  mapping: ImportMappingSchema,
  units: ImportUnitsSchema,
  numbering: ImportNumberingSchema,
  /** loads converted to SI with stored tray numbers (rows with errors left out) */
  loads: Type.Array(TrayLoadSchema),
});
export type ImportPreview = Static<typeof ImportPreviewSchema>;

/** Answer of the check: the converted loads (SI, stored tray numbers), the first row errors and their count. */
export const ImportCheckResultSchema = Obj({
  loads: Type.Array(TrayLoadSchema),
  errors: Type.Array(ImportRowErrorSchema),
  errorCount: Type.Integer({ minimum: 0 }),
});
export type ImportCheckResult = Static<typeof ImportCheckResultSchema>;

export const importContract = {
  preview: route({
    method: 'post',
    path: '/columns/:id/imports',
    access: 'loads.edit',
    summary:
      'Upload a tray profile (multipart field "file", CSV or XLSX; ?sheet=) and get a preview: mapping, units, numbering, row errors',
    params: IdParams,
    query: ImportSheetQuery,
    form: ImportFileForm,
    response: ImportPreviewSchema,
  }),
  check: route({
    method: 'post',
    path: '/columns/:id/imports/check',
    access: 'loads.edit',
    summary:
      'Re-check the previewed rows with a changed mapping, units or numbering: converted loads and every row error; stores nothing',
    params: IdParams,
    body: ImportCheckBodySchema,
    response: ImportCheckResultSchema,
  }),
  commit: route({
    method: 'post',
    path: '/columns/:id/imports/commit',
    access: 'loads.edit',
    summary:
      'Store the confirmed import as a new load case, all or nothing (any row error → 400 with the first rowErrors and errorCount, nothing stored)',
    params: IdParams,
    body: ImportCommitBodySchema,
    status: 201,
    response: LoadCaseRecordSchema,
    otherResponses: { 400: ImportRowsErrorBodySchema },
  }),
} satisfies Record<string, RouteContract>;
