/**
 * Prediction from the rating for the field-evidence overlays: froth height on each tray and the aerated
 * downcomer backup, from the engine's own results for the same load case.
 */
import type { TrayFrothPrediction } from '../../../shared/types/fieldEvidence.js';
import type { MethodOptions, TrayLoad } from '../../../shared/types/rating.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';
import { method } from '../meta.js';
import { prepareSection, rateTrayPrepared, type PreparedSection } from '../index.js';
import { bennettEffectiveDensity } from '../pressureDrop.js';
import { sectionForTray } from '../pumpAround/column.js';

/**
 * Froth height from clear liquid height and mean relative froth density, h_f = h_L / φ [mm] (φ = h_L/h_f
 * is the definition of the mean relative froth density; Kister, Distillation Design 1992, Ch. 6).
 * The engine takes φ as Bennett, Agrawal & Cook's (1983) effective relative froth density φ_e, the one its
 * clear-liquid height uses.
 * Example: h_L 30.9 mm, φ 0.38 → 81.3 mm.
 */
export const frothHeightFromClearLiquid = method(
  'frothHeightFromClearLiquid',
  function frothHeightFromClearLiquid(clearLiquid_mm: number, relativeFrothDensity: number): number {
    return clearLiquid_mm / relativeFrothDensity;
  },
  {
    label: 'Froth height (clear liquid over relative froth density)',
    source:
      'Definition of the relative froth density (Kister, Distillation Design, McGraw-Hill 1992, Ch. 6), with the effective froth density of Bennett, Agrawal & Cook, AIChE J. 29(3) 434 (1983)',
    equation: 'h_f = h_L / phi_e',
    provenance: 'derived',
    ranges: {},
    uncertainty:
      'A screening froth height: a mean froth density taken from a clear-liquid correlation; froth regime only, real froth thins gradually upward.',
  },
);

/** Sections prepared once; each tray rated with the section that holds it. */
export function predictTrays(
  sections: readonly StudySection[],
  loads: readonly TrayLoad[],
  methods?: MethodOptions,
): Map<number, TrayFrothPrediction> {
  const prepared = new Map<StudySection, PreparedSection>();
  const out = new Map<number, TrayFrothPrediction>();
  for (const load of loads) {
    const s = sectionForTray(sections, load.tray);
    if (!s) continue;
    let p = prepared.get(s);
    if (!p) prepared.set(s, (p = prepareSection(s, methods)));
    out.set(load.tray, predictTray(p, load));
  }
  return out;
}

export function predictTray(p: PreparedSection, load: TrayLoad): TrayFrothPrediction {
  const r = rateTrayPrepared(p, load);
  const d = r.details;
  const rhoV = load.vapourDensity_kg_m3;
  const rhoL = load.liquidDensity_kg_m3;
  const ks = (d.bubblingAreaVelocity_m_s ?? 0) * Math.sqrt(rhoV / (rhoL - rhoV));
  const phi = bennettEffectiveDensity(ks);
  const hL = d.clearLiquidHeight_mm ?? 0;
  return {
    tray: load.tray,
    clearLiquidHeight_mm: hL,
    relativeFrothDensity: phi,
    frothHeight_mm: hL > 0 ? frothHeightFromClearLiquid(hL, phi) : 0,
    downcomerAeratedBackup_mm: d.downcomerAeratedBackup_mm ?? 0,
    totalPressureDrop_Pa: d.totalPressureDrop_Pa ?? 0,
    percentFlood: r.checks.jetFlood.value,
  };
}
