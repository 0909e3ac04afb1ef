/**
 * validateSimulationCases: the simulation cases given for calibrating a (valid) plan. JSON Schema
 * (shared/schemas/heatPlan.ts, simulationCasesSchema), then: one duty per pump-around, every tray of the
 * base case present once, vapour lighter than liquid, and at least one duty moved from its base value.
 * Paths start at /cases.
 */
import { Ajv } from 'ajv';
import { simulationCasesSchema } from '../../../shared/schemas/heatPlan.js';
import type { HeatPlanInput, SimulationCase } from '../../../shared/types/heatPlan.js';
import type { FieldError } from '../index.js';
import { DUTY_MATCH_KW } from './calibration.js';
import { ajvFieldError } from '../pumpAround/validate.js';

const ajv = new Ajv({ allErrors: true, strict: true });
const schemaCheck = ajv.compile<SimulationCase[]>(simulationCasesSchema);

export type CasesValidation = { ok: true; value: SimulationCase[] } | { ok: false; errors: FieldError[] };

export function validateSimulationCases(input: HeatPlanInput, json: unknown): CasesValidation {
  if (!schemaCheck(json))
    return {
      ok: false,
      errors: (schemaCheck.errors ?? []).map((e) => {
        const f = ajvFieldError({}, e);
        const path = `/cases${f.path === '/' ? '' : f.path}`;
        return {
          path,
          message:
            f.message === '(study): must NOT have fewer than 2 items'
              ? 'cases: at least two simulation cases are needed'
              : f.message.replace(/^\(study\)/, 'cases'),
        };
      }),
    };
  const faults: FieldError[] = [];
  const n = input.pumpArounds.length;
  json.forEach((c, i) => {
    if (c.duties_kW.length !== n)
      faults.push({
        path: `/cases/${i}/duties_kW`,
        message: `duties_kW: case ${i + 1} needs ${n} duties (one per pump-around, in the plan's order); got ${c.duties_kW.length}`,
      });
    const seen = new Set<number>();
    c.trays.forEach((t, j) => {
      if (seen.has(t.tray))
        faults.push({ path: `/cases/${i}/trays/${j}/tray`, message: `tray ${t.tray}, tray: appears twice in case ${i + 1}` });
      seen.add(t.tray);
      if (!(t.vapourDensity_kg_m3 < t.liquidDensity_kg_m3))
        faults.push({
          path: `/cases/${i}/trays/${j}/vapourDensity_kg_m3`,
          message: `tray ${t.tray}, vapourDensity_kg_m3: must be below the liquid density`,
        });
    });
    const missing = input.trays.filter((t) => !seen.has(t.tray)).map((t) => t.tray);
    if (missing.length)
      faults.push({
        path: `/cases/${i}/trays`,
        message: `trays: case ${i + 1} has no load for tray${missing.length > 1 ? 's' : ''} ${missing.join(', ')} of the base case`,
      });
  });
  if (
    !faults.length &&
    !json.some((c) => c.duties_kW.some((q, i) => Math.abs(q - input.pumpArounds[i]!.baseDuty_kW) > DUTY_MATCH_KW))
  )
    faults.push({ path: '/cases', message: 'cases: no case moves a pump-around duty from its base value: nothing to fit' });
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: json };
}
