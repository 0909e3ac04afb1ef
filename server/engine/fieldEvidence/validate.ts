/**
 * Validation of field-evidence inputs: the JSON Schema (shared/schemas/fieldEvidence.ts) then the
 * cross-field checks a schema cannot express. Errors have the rating request's form: a JSON-pointer path
 * and a message that starts with the field (and the tray, for tray entries). Inputs are not mutated.
 */
import { Ajv, type ErrorObject, type ValidateFunction } from 'ajv';
import { engineFieldError } from '../../../shared/contract/fieldErrors.js';
import type { TSchema } from '@sinclair/typebox';
import {
  gammaScanInputSchema,
  pressureDropSurveyInputSchema,
  temperatureSurveyInputSchema,
} from '../../../shared/schemas/fieldEvidence.js';
import type { GammaScanInput, PressureDropSurveyInput, TemperatureSurveyInput } from '../../../shared/types/fieldEvidence.js';
import type { SectionGeometry } from '../../../shared/types/rating.js';
import type { StudySection, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { physicsErrors, type FieldError } from '../index.js';
import { sectionForTray } from '../pumpAround/column.js';
import { traysTopDown, trayDeckElevations } from './elevations.js';
import { decksInSpan } from './reader.js';
import { traysBetween } from './pressureSurvey.js';
import { medianStep, sortedProfile } from './profile.js';

export type Validation<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

const ajv = new Ajv({ useDefaults: true, allErrors: true, strict: true });

const fromAjv = (raw: unknown, e: ErrorObject): FieldError => engineFieldError(raw, e, ['trays', 'measurements']);

function schemaValidator<T>(schema: TSchema): (json: unknown) => Validation<T> {
  let check: ValidateFunction<T> | undefined;
  return (json) => {
    check ??= ajv.compile<T>(schema);
    const copy: unknown = json === undefined ? undefined : structuredClone(json);
    if (!check(copy)) {
      // anyOf of literals reports one error per branch: keep the first per path
      const seen = new Set<string>();
      const errors = (check.errors ?? []).map((e) => fromAjv(json, e)).filter((e) => !seen.has(e.path) && seen.add(e.path));
      return { ok: false, errors };
    }
    return { ok: true, value: copy };
  };
}

const gammaSchema = schemaValidator<GammaScanInput>(gammaScanInputSchema);
const pressureSchema = schemaValidator<PressureDropSurveyInput>(pressureDropSurveyInputSchema);
const temperatureSchema = schemaValidator<TemperatureSurveyInput>(temperatureSurveyInputSchema);

/** The field a path names: its last segment, or `list[i]` for a list entry (`/scan/3` → `scan[3]`). */
function fieldOf(path: string): string {
  const parts = path.split('/').filter(Boolean);
  const last = parts.pop() ?? '(input)';
  return /^\d+$/.test(last) ? `${parts.pop() ?? ''}[${last}]` : last;
}

const add = (faults: FieldError[], path: string, message: string): void => {
  faults.push({ path, message: `${fieldOf(path)}: ${message}` });
};

function geometry(s: StudySection): SectionGeometry {
  const { name: _n, fromTray: _f, toTray: _t, ...g } = s;
  return g;
}

/** Sections (physics, overlaps, one contiguous tray range), the datum tray and the loads' trays. */
export function columnFaults(
  sections: readonly StudySection[],
  numbering: TrayNumbering,
  datumTray: number,
  trays: readonly { tray: number }[] | undefined,
  loadsForPhysics?: Parameters<typeof physicsErrors>[0]['trays'],
): FieldError[] {
  const faults: FieldError[] = [];
  const lo = (s: StudySection): number => Math.min(s.fromTray, s.toTray);
  const hi = (s: StudySection): number => Math.max(s.fromTray, s.toTray);
  sections.forEach((s, i) => {
    for (const e of physicsErrors({ section: geometry(s), trays: [] }))
      faults.push({ path: e.path.replace(/^\/section\//, `/sections/${i}/`), message: `section "${s.name}", ${e.message}` });
    sections.slice(0, i).forEach((o) => {
      if (lo(s) <= hi(o) && lo(o) <= hi(s))
        add(
          faults,
          `/sections/${i}/fromTray`,
          `trays ${lo(s)}–${hi(s)} of section "${s.name}" overlap section "${o.name}" (trays ${lo(o)}–${hi(o)})`,
        );
    });
  });
  if (faults.length) return faults;
  const all = traysTopDown(sections, numbering);
  const first = Math.min(...all);
  const last = Math.max(...all);
  if (last - first + 1 !== all.length)
    add(faults, '/sections', `the sections must cover one contiguous tray range; trays ${first}–${last} have gaps`);
  if (!sectionForTray(sections, datumTray))
    add(faults, '/datum/tray', `tray ${datumTray} is outside the column's sections (trays ${first}–${last})`);
  trays?.forEach((t, i) => {
    if (!sectionForTray(sections, t.tray))
      faults.push({
        path: `/trays/${i}/tray`,
        message: `tray ${t.tray}, tray: is not inside any section (sections cover trays ${first}–${last})`,
      });
  });
  if (loadsForPhysics?.length)
    for (const e of physicsErrors({ section: geometry(sections[0]!), trays: loadsForPhysics }))
      if (e.path.startsWith('/trays/')) faults.push(e);
  return faults;
}

/** Gamma-scan input: schema, column, densities, scan kind and calibration, coverage and resolution. */
export function validateGammaScanInput(json: unknown): Validation<GammaScanInput> {
  const v = gammaSchema(json);
  if (!v.ok) return v;
  const input = v.value;
  const numbering = input.numbering ?? 'top-down';
  const faults = columnFaults(input.sections, numbering, input.datum.tray, input.trays, input.trays);
  if (input.vapourDensity_kg_m3 >= input.liquidDensity_kg_m3)
    add(
      faults,
      '/vapourDensity_kg_m3',
      `must be below liquidDensity_kg_m3 (${input.liquidDensity_kg_m3}); got ${input.vapourDensity_kg_m3}`,
    );
  const kinds = new Set<string>();
  input.scan.forEach((p, i) => {
    const hasD = p.density_kg_m3 !== undefined;
    const hasC = p.countRate !== undefined;
    if (hasD === hasC) add(faults, `/scan/${i}`, `give exactly one of density_kg_m3 or countRate (at ${p.elevation_m} m)`);
    else kinds.add(hasD ? 'density' : 'countRate');
  });
  if (kinds.size > 1) add(faults, '/scan', 'mixes densities and count rates: give one kind for the whole scan');
  const c = input.calibration;
  if (kinds.has('countRate') && !c)
    add(faults, '/calibration', 'is required for a scan of count rates (vapourCountRate and liquidCountRate)');
  if (c && c.liquidCountRate >= c.vapourCountRate)
    add(
      faults,
      '/calibration/liquidCountRate',
      `must be below vapourCountRate (${c.vapourCountRate}): liquid absorbs more; got ${c.liquidCountRate}`,
    );
  if (faults.length) return { ok: false, errors: faults };

  const decks = trayDeckElevations(input.sections, numbering, input.datum);
  const profile = sortedProfile(input.scan.map((p) => ({ elevation_m: p.elevation_m, density_kg_m3: 0 })));
  const span = decksInSpan(profile, decks);
  const zLo = profile[0]!.elevation_m;
  const zHi = profile[profile.length - 1]!.elevation_m;
  if (span.length === 0) {
    const top = decks[0]!;
    const bottom = decks[decks.length - 1]!;
    add(
      faults,
      '/scan',
      `covers no whole tray space: scanned ${zLo}–${zHi} m, tray decks from ${bottom.deckElevation_m.toFixed(3)} m (tray ${bottom.tray}) to ${top.deckElevation_m.toFixed(3)} m (tray ${top.tray}); check the datum`,
    );
  } else {
    const step = medianStep(profile);
    const minSpace = Math.min(...span.map((d) => d.traySpacing_mm / 1000));
    if (step > minSpace / 4)
      add(
        faults,
        '/scan',
        `is too coarse: median step ${(step * 1000).toFixed(0)} mm; at most a quarter of the tray spacing (${(minSpace * 250).toFixed(0)} mm) is needed to read froth heights`,
      );
  }
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: input };
}

/** Pressure-drop survey: schema, column and loads, each measurement's span and the loads it needs. */
export function validatePressureDropSurveyInput(json: unknown): Validation<PressureDropSurveyInput> {
  const v = pressureSchema(json);
  if (!v.ok) return v;
  const input = v.value;
  const numbering = input.numbering ?? 'top-down';
  const faults = columnFaults(input.sections, numbering, input.datum.tray, input.trays, input.trays);
  if (faults.length) return { ok: false, errors: faults };
  const decks = trayDeckElevations(input.sections, numbering, input.datum);
  const loaded = new Set(input.trays.map((t) => t.tray));
  input.measurements.forEach((m, i) => {
    const at = `/measurements/${i}`;
    const hasTaps = m.lowerElevation_m !== undefined || m.upperElevation_m !== undefined;
    if (m.section !== undefined && hasTaps)
      return add(faults, `${at}/section`, 'give either section or the two tap elevations, not both');
    if (m.section === undefined) {
      if (m.lowerElevation_m === undefined) return add(faults, `${at}/lowerElevation_m`, 'is required unless section is given');
      if (m.upperElevation_m === undefined) return add(faults, `${at}/upperElevation_m`, 'is required unless section is given');
      if (m.upperElevation_m <= m.lowerElevation_m)
        return add(
          faults,
          `${at}/upperElevation_m`,
          `must be above lowerElevation_m (${m.lowerElevation_m} m); got ${m.upperElevation_m}`,
        );
    } else if (!input.sections.some((s) => s.name === m.section))
      return add(
        faults,
        `${at}/section`,
        `no section is named "${m.section}" (sections: ${input.sections.map((s) => `"${s.name}"`).join(', ')})`,
      );
    const span = traysBetween(m, decks);
    if (span.length === 0)
      return add(
        faults,
        at,
        `no tray deck lies between ${m.lowerElevation_m} and ${m.upperElevation_m} m; check the tap elevations and the datum`,
      );
    const missing = span.filter((d) => !loaded.has(d.tray)).map((d) => d.tray);
    if (missing.length)
      add(
        faults,
        at,
        `trays ${missing.join(', ')} between the taps have no loads in trays; the prediction needs every tray between them`,
      );
  });
  return faults.length ? { ok: false, errors: faults } : { ok: true, value: input };
}

/** Temperature survey: schema, then one measurement per tray. */
export function validateTemperatureSurveyInput(json: unknown): Validation<TemperatureSurveyInput> {
  const v = temperatureSchema(json);
  if (!v.ok) return v;
  const faults: FieldError[] = [];
  const seen = new Set<number>();
  v.value.measurements.forEach((m, i) => {
    if (seen.has(m.tray)) add(faults, `/measurements/${i}/tray`, `tray ${m.tray} is measured twice`);
    seen.add(m.tray);
  });
  const loads = new Set<number>();
  v.value.trays.forEach((t, i) => {
    if (loads.has(t.tray)) add(faults, `/trays/${i}/tray`, `tray ${t.tray} appears twice in the load case`);
    loads.add(t.tray);
  });
  return faults.length ? { ok: false, errors: faults } : v;
}
