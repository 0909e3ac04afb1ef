/**
 * Tolerance checks of installed-tray measurements against a rule set (pure; the server stores the
 * results and the inspection page gives the same feedback as the inspector types).
 * Published set: PIP VEFV1102 / VEFV1102M, reference-tables/tolerances-pip-vefv1102.json.
 */
import pip from '../reference-tables/tolerances-pip-vefv1102.json' with { type: 'json' };
import { publishedSource } from './labels.js';
import type {
  InspectionRuleChoice,
  MeasurementCheck,
  ToleranceItem,
  ToleranceRule,
  ToleranceRuleSet,
  TrayDesign,
  TrayMeasurements,
} from './types/inspections.js';

/** The published set as users read it: its sources without our provenance tags (shared/labels.ts). */
function forReaders(set: ToleranceRuleSet): ToleranceRuleSet {
  return {
    ...set,
    source: publishedSource(set.source),
    ...(set.note === undefined ? {} : { note: publishedSource(set.note) }),
    rules: set.rules.map((r) => ({ ...r, source: publishedSource(r.source) })),
  };
}

export const PUBLISHED_TOLERANCES = forReaders(pip as ToleranceRuleSet);

/** The rule set an inspection checks against. */
export function ruleSetFor(choice: InspectionRuleChoice): ToleranceRuleSet {
  return choice.kind === 'project' && choice.project ? choice.project : PUBLISHED_TOLERANCES;
}

/** Largest allowed levelness (high − low) for a column diameter and class [mm], or null when not defined. */
export function levelnessLimit(rule: ToleranceRule, diameter_mm: number | null, cls: 'A' | 'B'): number | null {
  if (rule.max_mm !== undefined) return rule.max_mm;
  if (!rule.byDiameter || diameter_mm === null) return null;
  const band = rule.byDiameter.find((b) => b.maxDiameter_mm === null || diameter_mm <= b.maxDiameter_mm);
  if (!band) return null;
  return cls === 'A' ? band.classA_mm : band.classB_mm;
}

const round = (x: number): number => Math.round(x * 100) / 100;

function plusMinus(
  item: ToleranceItem,
  rule: ToleranceRule | undefined,
  measured: number,
  design: number | null,
  point: number | null,
): MeasurementCheck {
  const tol = rule?.plusMinus_mm ?? null;
  const source = rule?.source ?? '';
  if (design === null || tol === null) {
    const why = design === null ? 'no design value in the tray section' : 'no tolerance in the rule set';
    return { item, point, measured, design, deviation: null, tolerance: tol, pass: null, source, message: `Not checked: ${why}` };
  }
  const deviation = round(measured - design);
  // a tiny allowance for floating-point noise (values are entered to 0.1 mm)
  const pass = Math.abs(deviation) <= tol + 1e-9;
  const message = `${deviation >= 0 ? '+' : ''}${deviation} mm from design ${design} mm (±${tol} mm)`;
  return { item, point, measured, design, deviation, tolerance: tol, pass, source, message };
}

/** Check every measured value of one tray/pass against its design values and the rule set. */
export function checkMeasurements(
  m: TrayMeasurements,
  design: TrayDesign,
  rules: ToleranceRuleSet,
  levelnessClass: 'A' | 'B',
): MeasurementCheck[] {
  const rule = (item: ToleranceItem) => rules.rules.find((r) => r.item === item);
  const out: MeasurementCheck[] = [];
  m.weirHeight_mm.forEach((v, i) => out.push(plusMinus('weirHeight', rule('weirHeight'), v, design.weirHeight_mm, i)));
  m.downcomerClearance_mm.forEach((v, i) =>
    out.push(plusMinus('downcomerClearance', rule('downcomerClearance'), v, design.downcomerClearance_mm, i)),
  );
  if (m.traySpacing_mm !== null)
    out.push(plusMinus('traySpacing', rule('traySpacing'), m.traySpacing_mm, design.traySpacing_mm, null));
  if (m.levelness_mm !== null) {
    const r = rule('levelness');
    const limit = r ? levelnessLimit(r, design.columnDiameter_mm, levelnessClass) : null;
    const pass = limit === null ? null : m.levelness_mm <= limit + 1e-9;
    out.push({
      item: 'levelness',
      point: null,
      measured: m.levelness_mm,
      design: null,
      deviation: m.levelness_mm,
      tolerance: limit,
      pass,
      source: r?.source ?? '',
      message:
        limit === null
          ? 'Not checked: no levelness limit for this diameter'
          : `high − low ${m.levelness_mm} mm (max ${limit} mm, class ${levelnessClass})`,
    });
  }
  return out;
}

/** Bad-input check for measurements; returns field-named messages (empty when valid). */
export function measurementErrors(m: TrayMeasurements, prefix: string): { path: string; message: string }[] {
  const errs: { path: string; message: string }[] = [];
  const ok = (v: number) => Number.isFinite(v) && v >= 0 && v <= 5000;
  m.weirHeight_mm.forEach(
    (v, i) => !ok(v) && errs.push({ path: `${prefix}.weirHeight_mm[${i}]`, message: 'must be a length between 0 and 5000 mm' }),
  );
  m.downcomerClearance_mm.forEach(
    (v, i) =>
      !ok(v) && errs.push({ path: `${prefix}.downcomerClearance_mm[${i}]`, message: 'must be a length between 0 and 5000 mm' }),
  );
  if (m.levelness_mm !== null && !ok(m.levelness_mm))
    errs.push({ path: `${prefix}.levelness_mm`, message: 'must be between 0 and 5000 mm' });
  if (m.traySpacing_mm !== null && !ok(m.traySpacing_mm))
    errs.push({ path: `${prefix}.traySpacing_mm`, message: 'must be between 0 and 5000 mm' });
  return errs;
}
