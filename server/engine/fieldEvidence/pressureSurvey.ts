/**
 * Pressure-drop survey against the rating: measured ΔP between two taps (or over a section) against the
 * sum of the predicted tray ΔP of the trays between them, same load case; the ratio, a flag, and the ΔP
 * per tray a flooded section would show. The input must have passed validatePressureDropSurveyInput.
 */
import type {
  PressureDropMeasurement,
  PressureDropSurveyInput,
  PressureDropSurveyResult,
  PressureDropSurveyRow,
  TrayElevation,
} from '../../../shared/types/fieldEvidence.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';
import { method } from '../meta.js';
import { G } from '../units.js';
import { prepareSection, type PreparedSection } from '../index.js';
import { sectionForTray } from '../pumpAround/column.js';
import { trayDeckElevations } from './elevations.js';
import { predictTray } from './prediction.js';

/** ratio bands of "as predicted" (our screening band, common practice) */
export const LOW_RATIO = 0.7;
export const HIGH_RATIO = 1.3;
/**
 * measured ΔP per tray at or above this fraction of the flooded-tray ΔP is flagged as flooding (common
 * practice): the flooded-tray value leaves out the dry-tray loss, so a section that reaches it holds at
 * least a froth-filled spacing of liquid
 */
export const FLOODING_FRACTION = 1;

/**
 * Static head of the vapour between two pressure taps, ρV·g·Δz [Pa]. A ΔP read between taps at different
 * elevations includes it; with dense vapour it is not negligible and is subtracted before comparing with
 * tray ΔP (field practice: "Pressure drop measurements on distillation columns", AIChE Spring Meeting 2009,
 * paper 64d). Example: ρV 30 kg/m³, Δz 6 m → 1766 Pa (17.7 mbar).
 */
export const vapourStaticHead = method(
  'vapourStaticHead',
  function vapourStaticHead(vapourDensity_kg_m3: number, heightDifference_m: number): number {
    return vapourDensity_kg_m3 * G * heightDifference_m;
  },
  {
    label: 'Vapour static head between pressure taps',
    source:
      'Hydrostatics; correction named in "Pressure drop measurements on distillation columns", AIChE Spring Meeting 2009, paper 64d',
    equation: 'dP_static = rhoV g dz',
    provenance: 'derived',
    ranges: {},
  },
);

/**
 * Pressure drop per tray of a flooded section [Pa], derived here: froth of relative density φ fills the
 * whole tray spacing, so each tray holds a froth column of weight φ(ρL − ρV)·g·TS per unit area above the
 * vapour's own static head; dry-tray and friction losses (which add to it) are left out, so this is the
 * lower side of what a flooded tray shows. φ is taken as the foaming class's downcomer aeration factor
 * (our assumption). Example: φ 0.5, ρL 700, ρV 4, TS 610 mm → 2082 Pa per tray.
 */
export const floodedTrayPressureDrop = method(
  'floodedTrayPressureDrop',
  function floodedTrayPressureDrop(
    liquidDensity_kg_m3: number,
    vapourDensity_kg_m3: number,
    traySpacing_mm: number,
    relativeFrothDensity: number,
  ): number {
    return relativeFrothDensity * (liquidDensity_kg_m3 - vapourDensity_kg_m3) * G * (traySpacing_mm / 1000);
  },
  {
    label: 'Pressure drop per tray of a flooded section (froth-filled spacing)',
    source: 'Derived (hydrostatic head of froth filling the tray spacing)',
    equation: 'dP_flood = phi (rhoL - rhoV) g TS',
    provenance: 'derived',
    ranges: {},
    uncertainty: 'A hydrostatic estimate with an assumed froth density; a flooded section may show more.',
  },
);

/** The trays a measurement spans: decks strictly between the taps, or the named section's trays (top first). */
export function traysBetween(m: PressureDropMeasurement, decks: readonly TrayElevation[]): TrayElevation[] {
  if (m.section !== undefined) return decks.filter((d) => d.section === m.section);
  const lo = Math.min(m.lowerElevation_m!, m.upperElevation_m!);
  const hi = Math.max(m.lowerElevation_m!, m.upperElevation_m!);
  return decks.filter((d) => d.deckElevation_m > lo && d.deckElevation_m < hi);
}

const f0 = (x: number): string => String(Math.round(x));

export function runPressureDropSurvey(input: PressureDropSurveyInput): PressureDropSurveyResult {
  const decks = trayDeckElevations(input.sections, input.numbering ?? 'top-down', input.datum);
  const prepared = new Map<StudySection, PreparedSection>();
  const loads = new Map<number, TrayLoad>(input.trays.map((t) => [t.tray, t]));
  const perTray = (tray: number) => {
    const s = sectionForTray(input.sections, tray)!;
    let p = prepared.get(s);
    if (!p) prepared.set(s, (p = prepareSection(s, input.methods)));
    const load = loads.get(tray)!;
    const pred = predictTray(p, load);
    const flood = floodedTrayPressureDrop(
      load.liquidDensity_kg_m3,
      load.vapourDensity_kg_m3,
      s.traySpacing_mm,
      p.limits.aerationFactor,
    );
    return { dp: pred.totalPressureDrop_Pa, flood, rhoV: load.vapourDensity_kg_m3, spacing_m: s.traySpacing_mm / 1000 };
  };
  const rows = input.measurements.map((m, i): PressureDropSurveyRow => {
    const span = traysBetween(m, decks);
    const t = span.map((d) => perTray(d.tray));
    const n = t.length;
    const dz =
      m.section !== undefined ? t.reduce((a, x) => a + x.spacing_m, 0) : Math.abs(m.upperElevation_m! - m.lowerElevation_m!);
    const rhoV = t.reduce((a, x) => a + x.rhoV, 0) / n;
    const head = vapourStaticHead(rhoV, dz);
    const corrected = m.measured_Pa - (m.vapourHeadCorrected ? 0 : head);
    const predicted = t.reduce((a, x) => a + x.dp, 0);
    const floodPerTray = t.reduce((a, x) => a + x.flood, 0) / n;
    const ratio = corrected / predicted;
    const perTrayMeasured = corrected / n;
    const trays = span.map((d) => d.tray);
    const range = n === 1 ? `tray ${trays[0]}` : `trays ${trays[0]}–${trays[n - 1]}`;
    let flag: PressureDropSurveyRow['flag'];
    let reason: string;
    if (perTrayMeasured >= FLOODING_FRACTION * floodPerTray) {
      flag = 'flooding';
      reason = `${f0(perTrayMeasured)} Pa per tray over ${range} reaches the ${f0(floodPerTray)} Pa of a froth-filled (flooded) tray.`;
    } else if (ratio > HIGH_RATIO) {
      flag = 'high';
      reason = `Measured ${ratio.toFixed(2)} times the predicted ${f0(predicted)} Pa over ${range}: fouling, higher loads than the case, or approach to flood.`;
    } else if (ratio < LOW_RATIO) {
      flag = 'low';
      reason = `Measured ${ratio.toFixed(2)} times the predicted ${f0(predicted)} Pa over ${range}: damaged or missing trays, vapour bypassing, lower loads, or a gauge error.`;
    } else {
      flag = 'as-predicted';
      reason = `Measured ${ratio.toFixed(2)} times the predicted ${f0(predicted)} Pa over ${range}.`;
    }
    return {
      label: m.label ?? (m.section !== undefined ? `section ${m.section}` : `measurement ${i + 1}`),
      trays,
      measured_Pa: m.measured_Pa,
      vapourStaticHead_Pa: head,
      corrected_Pa: corrected,
      predicted_Pa: predicted,
      ratio,
      measuredPerTray_Pa: perTrayMeasured,
      predictedPerTray_Pa: predicted / n,
      floodingPerTray_Pa: floodPerTray,
      flag,
      reason,
    };
  });
  return {
    rows,
    notes: [
      'Screening comparison: an operating change based on it goes through management-of-change review; confirm with the internals vendor and licensed engineers.',
      `Measured ΔP is compared after subtracting the static head of the vapour between the taps (unless the reading already excludes it). Flags: within ${LOW_RATIO}–${HIGH_RATIO} times the prediction "as predicted"; "flooding" when the measured ΔP per tray reaches ${FLOODING_FRACTION === 1 ? '' : `${FLOODING_FRACTION * 100} % of `}the head of froth filling the tray spacing, at the froth density of the system's foaming class (our screening bands).`,
      'A pressure drop found as the difference of two large readings carries both gauges’ errors; read both taps with the same gauge or cross-checked transmitters, and keep impulse lines free of condensate.',
    ],
  };
}
