/**
 * `npm run -s cli -- rate request.json`: validate a rating request, rate every tray and print the
 * RatingResult JSON on stdout (exit 0); invalid input prints `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { rateSection, validateRatingRequest } from '../engine/index.js';
import { jsonFileCommand } from './types.js';

export const rateCommand = jsonFileCommand('rate <request.json>', validateRatingRequest, rateSection);
