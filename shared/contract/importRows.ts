/** Row errors of the file imports (tray profiles, gamma scans) and the 400 answer of a refused commit. */
import { Type, type Static } from '@sinclair/typebox';
import { ErrorDetail, Obj } from './schema.js';

export const ImportRowErrorSchema = Obj({
  /** 1-based row number in the file (as a spreadsheet shows it) */
  row: Type.Integer(),
  /** header text of the file column, or the field name when the column is missing */
  column: Type.String(),
  message: Type.String(),
});
export type ImportRowError = Static<typeof ImportRowErrorSchema>;

/** A 400 of an import commit: any error, or with row errors the first of them and how many there are (nothing stored). */
export const ImportRowsErrorBodySchema = Obj(
  {
    error: Type.String(),
    details: Type.Optional(Type.Array(ErrorDetail)),
    rowErrors: Type.Optional(Type.Array(ImportRowErrorSchema)),
    errorCount: Type.Optional(Type.Integer({ minimum: 0 })),
  },
  { title: 'ImportRowsError' },
);
