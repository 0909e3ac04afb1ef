/**
 * Errors of multipart uploads (multer and the busboy parser under it) as 4xx answers naming the field,
 * for every upload route: a missing boundary, a truncated body, a file in the wrong field, two files.
 */
import multer from 'multer';
import type { HttpFault } from './dbErrors.js';

// busboy raises plain Errors; these are its messages for a malformed multipart body
const MALFORMED =
  /^(Multipart: Boundary not found|Malformed part header|Malformed content type|Malformed urlencoded form|Unexpected end of (form|file)|Missing Content-Type|Unsupported content type|Request (aborted|closed))/;

const MULTER_MESSAGES: Record<string, string> = {
  LIMIT_FILE_SIZE: 'exceeds the size limit',
  LIMIT_FILE_COUNT: 'only one file may be sent',
  LIMIT_UNEXPECTED_FILE: 'is not the expected file field, or holds more than one file',
  LIMIT_PART_COUNT: 'the form has too many parts',
  LIMIT_FIELD_KEY: 'field name too long',
  LIMIT_FIELD_VALUE: 'is too long',
  LIMIT_FIELD_COUNT: 'the form has too many fields',
  MISSING_FIELD_NAME: 'a part of the form has no field name',
};

export function uploadFault(err: unknown): HttpFault | null {
  if (err instanceof multer.MulterError) {
    const status = err.code === 'LIMIT_FILE_SIZE' ? 413 : 400;
    return {
      status,
      error: status === 413 ? 'Upload too large' : 'Invalid upload',
      details: [{ path: err.field || '(form)', message: MULTER_MESSAGES[err.code] ?? err.message }],
    };
  }
  const message = err instanceof Error ? err.message : '';
  if (MALFORMED.test(message))
    return {
      status: 400,
      error: 'Malformed multipart upload',
      details: [{ path: '(form)', message: `${message}: send multipart/form-data with its boundary` }],
    };
  return null;
}
