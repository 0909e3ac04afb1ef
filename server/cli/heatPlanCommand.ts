/**
 * `npm run -s cli -- heat-plan plan.json`: validate a heat-recovery plan, run it and print the
 * HeatPlanResult JSON on stdout (exit 0); a missing file, bad JSON or invalid input prints
 * `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { runHeatPlan, validateHeatPlanInput } from '../engine/heatPlan/index.js';
import { jsonFileCommand } from './types.js';

export const heatPlanCommand = jsonFileCommand('heat-plan <plan.json>', validateHeatPlanInput, runHeatPlan);
