/**
 * `npm run -s cli -- gamma-scan scan.json`: read a gamma scan tray by tray against the column (and the
 * rating, when loads are given) and print `{ threshold, trays, floodedRegions, notes }` on stdout (exit 0);
 * a missing file, bad JSON or invalid input prints `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { runGammaScan, validateGammaScanInput } from '../engine/fieldEvidence/index.js';
import { jsonFileCommand } from './types.js';

export const gammaScanCommand = jsonFileCommand('gamma-scan <scan.json>', validateGammaScanInput, (input) => {
  const { profile: _profile, ...result } = runGammaScan(input);
  return result;
});
