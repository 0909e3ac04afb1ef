/**
 * Stored heat-recovery plans (issue 17): build the engine's HeatPlanInput from the column, validate it, run
 * the plan, store the inputs snapshot, the result by field name and each grid point's trays, in one
 * transaction; reviewed like pump-around studies (planReview.ts).
 */
import type { DataSource, EntityManager } from 'typeorm';
import { HeatPlan } from '../../db/entities/HeatPlan.js';
import { HeatPlanPoint } from '../../db/entities/HeatPlanPoint.js';
import { ValidationError } from '../../errors.js';
import { validateHeatPlanInput } from '../../engine/heatPlan/index.js';
import { assertColumnVisible } from '../access/access.js';
import { audit } from '../audit/audit.js';
import { getHeatPlan } from './planRead.js';
import { loadPlanParts, planInputFrom } from './planInputs.js';
import { calibratePlan } from './planCalibration.js';
import { runStoredPlan } from './planResult.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { CreateHeatPlanBody, HeatPlanInputsSnapshot, HeatPlanRecord } from '../../../shared/types/heatPlans.js';

/** Stored plans keep at most this many grid points (41 × 41), to bound their size. */
export const STORED_PLAN_MAX_POINTS = 1681;

/** Engine field path → request field: the form's own name where the value came from the request. */
export function planRequestPath(enginePath: string): string {
  const p = enginePath.replace(/^\//, '').split('/');
  if (p[0] === 'pumpArounds' && ['name', 'drawTray', 'returnTray'].includes(p[2] ?? ''))
    return `pumpArounds.${p[1]}.pumpAroundId (${p[2]})`;
  if (p[0] === 'sections') return `column sections.${p.slice(1).join('.')}`;
  if (p[0] === 'trays') return `loadCaseId (loads).${p.slice(1).join('.')}`;
  if (p[0] === 'fractionationThreshold') return 'liquidToVapourThreshold';
  return p.join('.') || '(root)';
}

export async function buildPlan(db: DataSource | EntityManager, columnId: string, body: CreateHeatPlanBody) {
  const points = body.pumpArounds.reduce((n, p) => n * (p.sweep.steps + 1), 1);
  if (points > STORED_PLAN_MAX_POINTS)
    throw new ValidationError('The duty grid is too large to store', [
      {
        path: `pumpArounds.${body.pumpArounds.length - 1}.sweep.steps`,
        message: `the grid would have ${points} points; a stored plan keeps at most ${STORED_PLAN_MAX_POINTS} (fewer steps per pump-around)`,
      },
    ]);
  const parts = await loadPlanParts(db, columnId, body);
  const { input: raw, source } = planInputFrom(parts, body);
  const checked = validateHeatPlanInput(raw);
  if (!checked.ok)
    throw new ValidationError(
      'The plan input is not valid',
      checked.errors.map((e) => ({ path: planRequestPath(e.path), message: e.message })),
    );
  // with simulation cases, the plan is rated on the model calibrated against them
  const calibrated = parts.simulations.length
    ? calibratePlan(parts, source, checked.value, body.zoneLiquidIncludesCirculation === true)
    : null;
  const input = calibrated?.input ?? checked.value;
  const { result, gridTrays } = runStoredPlan(input, calibrated?.cases);
  if (calibrated) {
    result.calibration = calibrated.view;
    result.notes.push(...calibrated.notes);
  }
  const inputs: HeatPlanInputsSnapshot = { source, input };
  return { parts, inputs, result, gridTrays };
}

/** Store a built plan as a draft by its author, audited, inside the caller's transaction. */
export async function insertPlan(
  em: EntityManager,
  authorId: string,
  body: CreateHeatPlanBody,
  built: Awaited<ReturnType<typeof buildPlan>>,
): Promise<HeatPlan> {
  const { parts, inputs, result, gridTrays } = built;
  const row = await em.save(
    HeatPlan,
    em.create(HeatPlan, {
      columnId: parts.column.id,
      loadCaseId: parts.base.id,
      pumpAroundIds: parts.pumpArounds.map((p) => p.id),
      label: body.label?.trim() || `${parts.pumpArounds.map((p) => p.name).join(' + ')} heat recovery`,
      inputs,
      results: result,
      suggestedDuties_kW: result.suggestion?.duties_kW ?? null,
      recoveredAbove_kW: result.suggestion?.recoveredAboveTemperature_kW ?? null,
      authorId,
      status: 'draft',
      reviews: [],
    }),
  );
  // one statement per 200 points keeps each insert small
  for (let i = 0; i < gridTrays.length; i += 200)
    await em.insert(
      HeatPlanPoint,
      gridTrays.slice(i, i + 200).map((trays, k) => ({ planId: row.id, idx: i + k, trays })),
    );
  await audit(em, authorId, 'create', 'heat_plan', row.id, {
    label: row.label,
    pumpAroundIds: row.pumpAroundIds,
    loadCaseId: row.loadCaseId,
  });
  return row;
}

export async function createHeatPlan(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: CreateHeatPlanBody,
): Promise<HeatPlanRecord> {
  await assertColumnVisible(ds, user, columnId);
  const built = await buildPlan(ds, columnId, body);
  const row = await ds.transaction((em) => insertPlan(em, user.id, body, built));
  return getHeatPlan(ds, user, row.id);
}
