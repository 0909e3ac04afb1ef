/** Downcomer: apron head loss, backup, aeration, inlet velocity, residence time, seal. */
import { method } from './meta.js';

/**
 * Head loss under the downcomer apron, h_da = 165.2 (Q/A_da)² [mm liquid], Q in m³/s, A_da in m²
 * (Perry 8th ed. Sec. 14, from memory; equals Kister's English 0.03 (gpm/(100 A_da))² in, derived;
 * Sinnott's 166 [L/(ρL A_m)]² is the same equation). A_da = the most restrictive area under the
 * apron: min(clearance × apron length, downcomer bottom area).
 * Range: apron underflow velocity up to 0.45 m/s (common practice); Kister (1992 §6.5, seen) calls an
 * apron loss of 1.25 in (32 mm) "quite high". Above the range the value is reported with a warning.
 * Example: Q 2.54/954 m³/s, A_da 0.024 m² → 2.04 mm (Sinnott: "2 mm", from memory).
 */
export const apronHeadLoss = method(
  'apronHeadLoss',
  function apronHeadLoss(liquid_m3_s: number, apronArea_m2: number): number {
    const r = liquid_m3_s / apronArea_m2;
    return 165.2 * r * r;
  },
  {
    label: 'Apron head loss',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 [from memory]; Kister, Distillation Design (1992) Ch. 6; Sinnott C&R Vol. 6 4th ed.",
    equation: 'h_da = 165.2 (Q/A_da)^2',
    provenance: 'recalled',
    ranges: { underflowVelocity_m_s: [0, 0.45] },
  },
);

/**
 * Clear-liquid downcomer backup h_dc = h_t + h_w + h_ow + h_da [mm] (hydraulic gradient neglected,
 * Perry 8th ed. eq. 14-108 context, seen); aerated (froth) backup h_dc/φ_dc with the downcomer
 * aeration factor of the foaming class (Kister 1992 Table 6.4, values from memory).
 * Example: h_t 100, h_w 50, h_ow 15, h_da 5 mm → 170 mm clear; φ 0.5 → 340 mm froth.
 */
export const downcomerBackupClear = method(
  'downcomerBackupClear',
  function downcomerBackupClear(trayHead_mm: number, weirHeight_mm: number, crest_mm: number, apronLoss_mm: number): number {
    return trayHead_mm + weirHeight_mm + crest_mm + apronLoss_mm;
  },
  {
    label: 'Downcomer backup (clear liquid, aerated by phi_dc)',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14; Kister, Distillation Design (1992) §6.5 (80 % of TS + hw); Table 6.4 aeration [from memory]",
    equation: 'h_dc = h_t + h_w + h_ow + h_da; froth = h_dc/phi_dc',
    provenance: 'seen',
    ranges: {},
  },
);

/**
 * Downcomer entrance (choke) velocity: clear liquid flow over the downcomer top area [m/s], compared
 * with the foaming-class limit (Kister 1992 Table 6.5; Lieberman). Example: 0.01 m³/s over 0.1 m² → 0.1 m/s.
 */
export const downcomerInletVelocity = method(
  'downcomerInletVelocity',
  function downcomerInletVelocity(liquid_m3_s: number, downcomerTopArea_m2: number): number {
    return liquid_m3_s / downcomerTopArea_m2;
  },
  {
    label: 'Downcomer inlet velocity',
    source: 'Kister, Distillation Design (1992) Table 6.5; Lieberman, A Working Guide to Process Equipment',
    equation: 'v = Q_L/A_d,top',
    provenance: 'seen',
    ranges: {},
  },
);

/**
 * Apparent downcomer residence time (Kister 1992, from memory): downcomer volume over clear liquid
 * flow, volume = mean of top and bottom areas × tray spacing. Returns Infinity at zero liquid (the
 * caller caps reported values). Example: areas 0.2/0.1 m², TS 600 mm, 0.01 m³/s → 9 s.
 */
export const downcomerResidenceTimeApparent = method(
  'downcomerResidenceTimeApparent',
  function downcomerResidenceTimeApparent(
    topArea_m2: number,
    bottomArea_m2: number,
    traySpacing_mm: number,
    liquid_m3_s: number,
  ): number {
    return (0.5 * (topArea_m2 + bottomArea_m2) * traySpacing_mm * 1e-3) / liquid_m3_s;
  },
  {
    label: 'Downcomer apparent residence time',
    source: 'Kister, Distillation Design (1992) Ch. 6, apparent residence time, clear liquid [from memory]',
    equation: 't = 0.5 (A_top + A_bottom) TS / Q_L',
    provenance: 'recalled',
    ranges: {},
  },
);

/**
 * Downcomer seal margin: clear liquid in the downcomer above the bottom edge of the apron,
 * h_dc − clearance [mm]. When the clearance exceeds the outlet weir height, Kister (1992 §6.5, seen)
 * requires this to be at least 2 in (51 mm); when it does not, the outlet weir pool seals statically.
 * Example: clear backup 170 mm, clearance 60 mm → 110 mm.
 */
export const downcomerSealKister = method(
  'downcomerSealKister',
  function downcomerSealKister(clearBackup_mm: number, clearance_mm: number): number {
    return clearBackup_mm - clearance_mm;
  },
  {
    label: 'Downcomer seal (Kister 2-in rule)',
    source: 'Kister, Distillation Design (1992) §6.5 seal check',
    equation: 'seal = h_dc - clearance >= 51 mm when clearance > h_w',
    provenance: 'seen',
    ranges: {},
  },
);
