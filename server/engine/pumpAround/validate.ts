/**
 * validateStudyInput: JSON Schema (shared/schemas/pumpAroundStudy.ts, defaults filled in) then the
 * cross-field checks (faults.ts). Does not mutate its input. Errors have the rating request's form:
 * a JSON-pointer path and a message naming the field (and the tray for tray entries).
 */
import { Ajv, type ErrorObject } from 'ajv';
import { pumpAroundStudySchema } from '../../../shared/schemas/pumpAroundStudy.js';
import type { StudyInput, StudyValidation } from '../../../shared/types/pumpAround.js';
import { studyInputFaults } from './faults.js';
import { engineFieldError } from '../../../shared/contract/fieldErrors.js';

const ajv = new Ajv({ useDefaults: true, allErrors: true, strict: true });
const schemaCheck = ajv.compile<StudyInput>(pumpAroundStudySchema);

/** One ajv error as a field error: JSON-pointer path and a message naming the field (and the tray). */
export const ajvFieldError = (raw: unknown, e: ErrorObject): { path: string; message: string } =>
  engineFieldError(raw, e, ['trays'], '(study)');

export function validateStudyInput(json: unknown): StudyValidation {
  const copy: unknown = json === undefined ? undefined : structuredClone(json);
  if (!schemaCheck(copy)) return { ok: false, errors: (schemaCheck.errors ?? []).map((e) => ajvFieldError(json, e)) };
  const faults = studyInputFaults(copy);
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: copy };
}
