/**
 * Load cases: defined once, as schemas, in shared/contract/loads.ts (these are their types). Per-tray rows
 * are the engine's TrayLoad (SI, properties at actual conditions).
 */
import type { Static } from '@sinclair/typebox';
import type { PumpAroundDutyTagSchema } from '../contract/heatPlans.js';

export { LOAD_BASES, LOAD_SOURCES } from '../contract/loads.js';
export type {
  CreateLoadCaseBody,
  LoadBasis,
  LoadCaseRecord,
  LoadCaseSummary,
  LoadSource,
  PutLoadsBody,
  StageMapEntry,
  UpdateLoadCaseBody,
} from '../contract/loads.js';

/**
 * The duty of one of the column's pump-arounds at which a load case (usually a simulation case) was made.
 * Tagged cases calibrate a heat-recovery plan's traffic model (issue 17); PUT /load-cases/:id/pump-around-duties.
 */
export type PumpAroundDutyTag = Static<typeof PumpAroundDutyTagSchema>;
