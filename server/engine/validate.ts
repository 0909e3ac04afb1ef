/**
 * Validation of a rating request: the JSON Schema (ajv, defaults applied) and then physics checks.
 * Every error names the field by JSON path and, for tray entries, the tray number in the message.
 */
import { Ajv, type ErrorObject } from 'ajv';
import { engineFieldError, fieldInEntry } from '../../shared/contract/fieldErrors.js';
import { ratingRequestSchema } from '../../shared/schemas/ratingRequest.js';
import { densityFault, trayGivenTwice } from '../../shared/trayLoadRules.js';
import type { RatingRequest, SectionGeometry } from '../../shared/types/rating.js';

export interface FieldError {
  path: string;
  message: string;
}
export type ValidationResult = { ok: true; value: RatingRequest } | { ok: false; errors: FieldError[] };

const ajv = new Ajv({ useDefaults: true, allErrors: true, strict: true });
const validateSchema = ajv.compile<RatingRequest>(ratingRequestSchema);

function describe(raw: unknown, path: string, message: string): FieldError {
  return { path: path || '/', message: `${fieldInEntry(raw, path, ['trays'], '(request)')}: ${message}` };
}

const fromAjv = (raw: unknown, e: ErrorObject): FieldError => engineFieldError(raw, e, ['trays'], '(request)');

/** Physics consistency of a schema-valid request; each error names the tray (if any) and the field. */
export function physicsErrors(req: RatingRequest): FieldError[] {
  const errors: FieldError[] = [];
  const s = req.section;
  const add = (path: string, message: string): void => {
    errors.push(describe(req, path, message));
  };
  const columnArea = (Math.PI / 4) * s.columnDiameter_m ** 2;
  const used = s.activeArea_m2 + s.downcomerTopArea_m2 + s.downcomerBottomArea_m2;
  if (used > columnArea * 1.005) {
    add(
      '/section/activeArea_m2',
      `active area + downcomer top and bottom areas (${used.toPrecision(4)} m²) do not fit in the column cross-section (${columnArea.toPrecision(4)} m² for ${s.columnDiameter_m} m diameter)`,
    );
  }
  if (s.holeArea_m2 >= s.activeArea_m2)
    add('/section/holeArea_m2', `hole area (${s.holeArea_m2} m²) must be smaller than the active area (${s.activeArea_m2} m²)`);
  if (s.weirHeight_mm >= s.traySpacing_mm)
    add('/section/weirHeight_mm', `weir height (${s.weirHeight_mm} mm) must be below the tray spacing (${s.traySpacing_mm} mm)`);
  if (s.downcomerClearance_mm >= s.traySpacing_mm)
    add(
      '/section/downcomerClearance_mm',
      `downcomer clearance (${s.downcomerClearance_mm} mm) must be below the tray spacing (${s.traySpacing_mm} mm)`,
    );
  if (s.outletWeirLength_m > s.passes * s.columnDiameter_m * 1.001) {
    add(
      '/section/outletWeirLength_m',
      `outlet weir length (${s.outletWeirLength_m} m) exceeds ${s.passes} pass(es) × column diameter (${s.columnDiameter_m} m)`,
    );
  }
  passLayoutErrors(s, add);
  if (s.slotArea_m2 !== undefined && s.trayType === 'sieve')
    add('/section/slotArea_m2', "applies to valve trays only (a sieve tray's open area is its hole area)");
  if (s.slotArea_m2 !== undefined && s.slotArea_m2 >= s.activeArea_m2)
    add('/section/slotArea_m2', `slot area (${s.slotArea_m2} m²) must be smaller than the active area (${s.activeArea_m2} m²)`);
  if (s.trayType === 'moving-valve' && !s.valves)
    add(
      '/section/valves',
      'is required for moving-valve trays (count, orifice diameter, valve thickness, material density, leg factor, orifice shape)',
    );
  const seen = new Map<number, number>();
  req.trays.forEach((t, i) => {
    const p = `/trays/${i}`;
    const density = densityFault(t);
    if (density) add(`${p}/vapourDensity_kg_m3`, density);
    const first = seen.get(t.tray);
    if (first !== undefined) add(`${p}/tray`, trayGivenTwice(t.tray, first + 1));
    else seen.set(t.tray, i);
  });
  return errors;
}

/** A pass layout must fit the column: every panel of positive width, one split entry per pass summing to 1. */
function passLayoutErrors(s: SectionGeometry, add: (path: string, message: string) => void): void {
  const l = s.passLayout;
  if (!l) return;
  const at = '/section/passLayout';
  if (s.passes === 1) {
    add(at, 'applies to two- and four-pass trays only (passes is 1)');
    return;
  }
  const r = (s.columnDiameter_m * 1000) / 2;
  const edge = r - l.sideDowncomerWidth_mm;
  const half = l.centreDowncomerWidth_mm / 2;
  if (edge <= half) {
    add(
      `${at}/centreDowncomerWidth_mm`,
      `side downcomers (${l.sideDowncomerWidth_mm} mm each) and the centre downcomer (${l.centreDowncomerWidth_mm} mm) leave no tray deck in a ${s.columnDiameter_m} m column`,
    );
  }
  if (s.passes === 4) {
    const w = l.offCentreDowncomerWidth_mm;
    const x = l.offCentreDowncomerOffset_mm;
    if (w === undefined) add(`${at}/offCentreDowncomerWidth_mm`, 'is required for four-pass trays');
    if (x === undefined) add(`${at}/offCentreDowncomerOffset_mm`, 'is required for four-pass trays');
    if (w !== undefined && x !== undefined && !(x - w / 2 > half && x + w / 2 < edge)) {
      add(
        `${at}/offCentreDowncomerOffset_mm`,
        `off-centre downcomers (${w} mm wide at ${x} mm from the axis) must lie between the centre downcomer (edge at ${half} mm) and the side downcomer (edge at ${formatMm(edge)} mm), with deck on both sides`,
      );
    }
  } else {
    if (l.offCentreDowncomerWidth_mm !== undefined) add(`${at}/offCentreDowncomerWidth_mm`, 'applies to four-pass trays only');
    if (l.offCentreDowncomerOffset_mm !== undefined) add(`${at}/offCentreDowncomerOffset_mm`, 'applies to four-pass trays only');
  }
  const split = l.liquidSplit;
  if (split) {
    const sum = split.reduce((a, b) => a + b, 0);
    if (split.length !== s.passes) add(`${at}/liquidSplit`, `needs one fraction per pass (${s.passes}), got ${split.length}`);
    else if (Math.abs(sum - 1) > 0.001)
      add(`${at}/liquidSplit`, `fractions must add up to 1 (they add up to ${Number(sum.toPrecision(4))})`);
  }
}

const formatMm = (x: number): string => String(Number(x.toPrecision(4)));

/** Validate unknown JSON as a RatingRequest: schema (defaults filled in) then physics. Does not mutate its input. */
export function validateRatingRequest(json: unknown): ValidationResult {
  const copy: unknown = json === undefined ? undefined : structuredClone(json);
  if (!validateSchema(copy)) {
    return { ok: false, errors: (validateSchema.errors ?? []).map((e) => fromAjv(json, e)) };
  }
  const errors = physicsErrors(copy);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, value: copy };
}
