/** Outlet weir: Francis crest and weir loading. */
import { S_PER_H } from './units.js';
import { method } from './meta.js';

/**
 * Crest over a straight outlet weir, Francis formula as given in Perry 8th ed. Sec. 14 (recalled):
 *   h_ow = 664 F_w (q/L_w)^(2/3)   [mm]
 * F_w (Bolles weir-constriction correction) is taken as 1: we do not correct for the segmental
 * weir constriction. The English form 0.48 F_w (gpm/in)^(2/3) in converts to 664.7 (derived); the
 * plain Francis weir Q = 1.84 L h^1.5 gives 666 (derived).
 * @param liquid_m3_s q [m³/s]; @param weirLength_m L_w [m] (all passes); @param fw F_w [-]
 * @returns h_ow [mm]. Example: q/L_w = 3.09 m³/(h·m) → 6.0 mm.
 * Range (crest_mm): 6–67.2 mm, see the metadata; outside it the crest is reported as computed, never capped.
 */
export const crestOverWeirFrancis = method(
  'crestOverWeirFrancis',
  function crestOverWeirFrancis(liquid_m3_s: number, weirLength_m: number, fw = 1): number {
    return 664 * fw * Math.pow(liquid_m3_s / weirLength_m, 2 / 3);
  },
  {
    label: 'Francis weir crest',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 (Francis weir, F_w = 1) [from memory]; Holland, Fundamentals of Multicomponent Distillation Ch. 12",
    equation: 'h_ow = 664 Fw (q/Lw)^(2/3)',
    provenance: 'recalled',
    // 6 mm: below about 1/4 in crest a straight weir is replaced by a notched one (Holland Ch. 12, after
    // Fair et al.; seen); 67.2 mm: the crest at 13 gpm/in = 116 m³/(h·m), the top of Kister's 7–13 gpm/in
    // weir-load rule (Distillation Design 1992 §6.5; seen; crest derived with this formula)
    ranges: { crest_mm: [6, 67.2] },
  },
);

/** Weir loading q/L_w expressed in m³/(h·m). Example: 2.484e-3 m³/(s·m) → 8.94 (1 gpm/in). */
export const weirLoadingVolumetric = method(
  'weirLoadingVolumetric',
  function weirLoadingVolumetric(liquid_m3_s: number, weirLength_m: number): number {
    return (liquid_m3_s * S_PER_H) / weirLength_m;
  },
  {
    label: 'Weir loading',
    source: "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14, weir load definition",
    equation: 'q_w = 3600 q/L_w',
    provenance: 'seen',
    ranges: {},
  },
);

/** Inverse of the Francis crest: weir loading [m³/(h·m)] that gives crest h_ow [mm] (F_w = 1). */
export function weirLoadingForCrestFrancis(crest_mm: number): number {
  return Math.pow(crest_mm / 664, 1.5) * S_PER_H;
}
