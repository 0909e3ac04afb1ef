/**
 * validateHeatPlanInput: JSON Schema (shared/schemas/heatPlan.ts, defaults filled in) then the cross-field
 * checks (faults.ts). Does not mutate its input. Errors: a JSON-pointer path and a message naming the field.
 */
import { Ajv } from 'ajv';
import { heatPlanSchema } from '../../../shared/schemas/heatPlan.js';
import type { HeatPlanInput, HeatPlanValidation } from '../../../shared/types/heatPlan.js';
import { ajvFieldError } from '../pumpAround/validate.js';
import { driftFaults, heatPlanFaults } from './faults.js';

const ajv = new Ajv({ useDefaults: true, allErrors: true, strict: true });
const schemaCheck = ajv.compile<HeatPlanInput>(heatPlanSchema);

export function validateHeatPlanInput(json: unknown): HeatPlanValidation {
  const copy: unknown = json === undefined ? undefined : structuredClone(json);
  if (!schemaCheck(copy)) return { ok: false, errors: (schemaCheck.errors ?? []).map((e) => ajvFieldError(json, e)) };
  const faults = [...heatPlanFaults(copy), ...driftFaults(copy)];
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: copy };
}
