/**
 * `npm run -s cli -- pump-around study.json`: validate a pump-around duty study, run it and print the
 * StudyResult JSON on stdout (exit 0); a missing file, bad JSON or invalid input prints
 * `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { runStudy, validateStudyInput } from '../engine/pumpAround/index.js';
import { jsonFileCommand } from './types.js';

export const pumpAroundCommand = jsonFileCommand('pump-around <study.json>', validateStudyInput, runStudy);
