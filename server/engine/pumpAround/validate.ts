/**
 * validateStudyInput: JSON Schema (shared/schemas/pumpAroundStudy.ts, defaults filled in) then the
 * cross-field checks (faults.ts). Does not mutate its input. Errors have the rating request's form:
 * a JSON-pointer path and a message naming the field (and the tray for tray entries).
 */
import { Ajv, type ErrorObject } from 'ajv';
import { pumpAroundStudySchema } from '../../../shared/schemas/pumpAroundStudy.js';
import type { StudyInput, StudyValidation } from '../../../shared/types/pumpAround.js';
import { studyInputFaults } from './faults.js';

const ajv = new Ajv({ useDefaults: true, allErrors: true, strict: true });
const schemaCheck = ajv.compile<StudyInput>(pumpAroundStudySchema);

/** One ajv error as a field error: JSON-pointer path and a message naming the field (and the tray). */
export function ajvFieldError(raw: unknown, e: ErrorObject): { path: string; message: string } {
  let path = e.instancePath;
  let message = e.message ?? 'is invalid';
  const params = e.params as Record<string, unknown>;
  if (e.keyword === 'required') {
    path = `${path}/${String(params.missingProperty)}`;
    message = 'is required';
  } else if (e.keyword === 'additionalProperties') {
    path = `${path}/${String(params.additionalProperty)}`;
    message = 'is not a known field';
  } else if (e.keyword === 'enum') {
    message = `must be one of ${(params.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(', ')}`;
  }
  const field = path.split('/').filter(Boolean).pop() ?? '(study)';
  const m = /^\/trays\/(\d+)(?:\/|$)/.exec(path);
  const tray = m ? (raw as { trays?: { tray?: unknown }[] }).trays?.[Number(m[1])]?.tray : undefined;
  const where = m ? `${typeof tray === 'number' ? `tray ${tray}` : `trays[${m[1]}]`}, ${field}` : field;
  return { path: path || '/', message: `${where}: ${message}` };
}

export function validateStudyInput(json: unknown): StudyValidation {
  const copy: unknown = json === undefined ? undefined : structuredClone(json);
  if (!schemaCheck(copy)) return { ok: false, errors: (schemaCheck.errors ?? []).map((e) => ajvFieldError(json, e)) };
  const faults = studyInputFaults(copy);
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: copy };
}
