/**
 * Weeping: the weep point of each tray type, explicit (WEEP_METHODS). Sieve trays: Eduljee (own fit of its
 * chart constant K2) and Fair's weep criterion, the higher governing; fixed valves: Fair's criterion on the
 * valves taken as held open (common practice); moving valves: Klein's closed balance point (common practice).
 */
import type { TrayType } from '../../shared/types/rating.js';
import { method } from './meta.js';
import { brent } from './solve.js';
import { bennettEffectiveDensity, bennettWeirConstant, kleinClosedBalanceVelocity } from './pressureDrop.js';

/** coefficients of our own K2 fit (see eduljeeK2OwnFit) */
export const EDULJEE_K2_FIT = { a: 31.4, b: 4.39, c: 38.06 } as const;

/**
 * Eduljee weep-point constant K2 against clear liquid head above the deck h_w + h_ow [mm] —
 * OUR OWN FIT, not a published one:
 *   K2 = 31.40 − 4.39 exp(−x/38.06),   x = h_w + h_ow [mm]
 * Fitted (weighted least squares) to the points in reference-tables/eduljee-k2-points.json: Sinnott
 * Ex. 11.11 (66 mm → 30.6, from memory), a student design report (90 mm → 31.0, seen, not authoritative)
 * and four shape points of Sinnott Fig. 11.30 read from memory (0 → 27.0, 20 → 28.8, 40 → 29.9,
 * 120 → 31.2, ±0.5). Errors: +0.04 %, +0.02 %, −0.12 %, +0.08 %, −0.04 %, +0.04 % respectively.
 * Chart basis: Sinnott, C&R Vol. 6 4th ed. Fig. 11.30, after Eduljee, Brit. Chem. Eng. 4, 320 (1959).
 * Monotone increasing in x (more liquid → higher weep-point velocity). Range: chart axis 0–120 mm.
 * Example: x 66 mm → 30.63.
 */
export const eduljeeK2OwnFit = method(
  'eduljeeK2OwnFit',
  function eduljeeK2OwnFit(headAboveDeck_mm: number): number {
    const { a, b, c } = EDULJEE_K2_FIT;
    return a - b * Math.exp(-headAboveDeck_mm / c);
  },
  {
    label: "Eduljee K2 (Frothline's own fit of Sinnott Fig. 11.30)",
    source:
      "own fit; chart Sinnott, Coulson & Richardson's Chemical Engineering Vol. 6 4th ed. Fig. 11.30 after Eduljee, Brit. Chem. Eng. 4 320 (1959); points from Ex. 11.11 [from memory] and a student report [seen]",
    equation: 'K2 = 31.40 - 4.39 exp(-(hw + how)/38.06)',
    provenance: 'own-fit',
    ranges: { headAboveDeck_mm: [0, 120] },
    trayTypes: ['sieve'],
  },
);

/**
 * Minimum (weep-point) hole velocity of a sieve plate, Eduljee form as given by Sinnott:
 *   u_h,min = [K2 − 0.90 (25.4 − d_h)] / ρV^0.5   [m/s]
 * Source: Sinnott, C&R Vol. 6 4th ed. eq. 11.84 (from memory; formula seen applied in a student
 * design report). @param k2 [-]; @param holeDiameter_mm d_h [mm] (2.5–12 typical);
 * @param vapourDensity ρV [kg/m³]. @returns u_h,min [m/s] (never negative).
 * Examples: K2 30.6, d_h 5, ρV 0.72 → 14.42 m/s; K2 31, d_h 5, ρV 58.13 → 1.658 m/s (report: 1.66).
 */
export const weepPointHoleVelocityEduljee = method(
  'weepPointHoleVelocityEduljee',
  function weepPointHoleVelocityEduljee(k2: number, holeDiameter_mm: number, vapourDensity: number): number {
    const num = k2 - 0.9 * (25.4 - holeDiameter_mm);
    return num > 0 ? num / Math.sqrt(vapourDensity) : 0;
  },
  {
    label: 'Eduljee weep point (Sinnott form)',
    source:
      "Sinnott, Coulson & Richardson's Chemical Engineering Vol. 6 4th ed. eq. 11.84 [from memory]; Eduljee, Brit. Chem. Eng. 4 320 (1959)",
    equation: 'u_h,min = [K2 - 0.90 (25.4 - d_h)]/rhoV^0.5',
    provenance: 'recalled',
    ranges: { holeDiameter_mm: [2.5, 12.7] },
    trayTypes: ['sieve'],
  },
);

export interface FairWeepInput {
  /** dry-head coefficient K = h_d/(u_h² ρV/ρL) [s²·mm/m²] (50.8/C_v² for sieve decks) */
  dryK: number;
  /** A_h/A_a: converts hole velocity to bubbling-area velocity */
  holeAreaRatio: number;
  vapourDensity: number;
  liquidDensity: number;
  weirHeight_mm: number;
  liquid_m3_s: number;
  weirLength_m: number;
  residualHead_mm: number;
}

/**
 * Hole velocity at Fair's simplified weep criterion h_d + h_σ = h_L (Bennett h_L), as used by Seader &
 * Henley (1998): "no weeping if h_d + h_σ > h_L" (seen). Fair's full chart (Kister 1992 Fig. 6.18)
 * plots h_d + h_σ against h_w + h_ow; this simplified form is what we implement.
 * Solved with the shared Brent solver; returns 0 when h_σ alone exceeds h_L (no weeping at any rate).
 * @returns weep-point hole velocity [m/s]
 * Example: Seader & Henley 7.48 bottom (h_d 1.35 + h_σ 0.31 = 1.66 in > h_L 1.22 in at u_o 75 ft/s):
 * weep point about 19 m/s against 22.9 m/s operating.
 */
export const weepPointHoleVelocityFair = method(
  'weepPointHoleVelocityFair',
  function weepPointHoleVelocityFair(p: FairWeepInput): number {
    // h_L(u) = φ h_w + C_l (q/L_w)^(2/3) φ^(1/3), φ = φ_e(K_s) with K_s = u (A_h/A_a) [ρV/(ρL − ρV)]^0.5
    const ksPerU = p.holeAreaRatio * Math.sqrt(p.vapourDensity / (p.liquidDensity - p.vapourDensity));
    const crestTerm = 1000 * bennettWeirConstant(p.weirHeight_mm) * Math.pow(p.liquid_m3_s / p.weirLength_m, 2 / 3);
    const dry = (p.dryK * p.vapourDensity) / p.liquidDensity;
    const hL0 = p.weirHeight_mm + crestTerm;
    if (p.residualHead_mm >= hL0) return 0;
    // h_d alone reaches h_L(0) ≥ h_L(u) here, so the residual is positive at this upper end.
    const hi = Math.sqrt(hL0 / dry) * 1.0001;
    // residual h_d(u) + h_σ − h_L(u), written inline: a named inner function would be wrapped by the
    // TypeScript loader's name-keeping helper on every call of this hot function (one per tray rated)
    const r = brent(
      (u) => {
        const phi = bennettEffectiveDensity(u * ksPerU);
        return dry * u * u + p.residualHead_mm - (phi * p.weirHeight_mm + crestTerm * Math.cbrt(phi));
      },
      0,
      hi,
      { xTol: 1e-6 * hi },
    );
    return r.converged ? r.root : hi;
  },
  {
    label: 'Fair weep criterion (h_d + h_sigma = h_L)',
    source:
      'Seader & Henley, Separation Process Principles (1998) solutions, simplified Fair criterion; Kister, Distillation Design (1992) Fig. 6.18',
    equation: 'h_d(u) + h_sigma = h_L(u)',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['sieve'],
  },
);

/**
 * Weep point of a fixed-valve tray: Fair's simplified criterion h_d + h_σ = h_L (weepPointHoleVelocityFair)
 * with the valves taken as permanently open, i.e. the dry head from Klein's open-valve K (dryTrayHeadK) and
 * Bennett's clear liquid. Common practice: no published weep correlation for fixed valves is used here,
 * and both Fair's criterion and Bennett's clear liquid were developed for sieve trays, so the section
 * carries a range warning (`range:weepPointHoleVelocityFair:trayType`). Fixed valves have large
 * openings with a cover over them; their weeping depends on the valve design (supplier data governs).
 * @returns weep-point velocity on the deck-orifice area [m/s]
 */
export const weepPointFixedValveFair = method(
  'weepPointFixedValveFair',
  function weepPointFixedValveFair(p: FairWeepInput): number {
    return weepPointHoleVelocityFair(p);
  },
  {
    label: 'Fixed-valve weep point (Fair criterion, valves taken as open)',
    source:
      "Fair's simplified weep criterion (Seader & Henley, Separation Process Principles (1998) solutions; Kister, Distillation Design (1992) Fig. 6.18) applied to fixed valves taken as permanently open moving valves (Klein's open-valve loss coefficient, Ludwig, Applied Process Design Vol. 2 3rd ed. Table 8-23) [common practice]",
    equation: 'h_d(u) + h_sigma = h_L(u), h_d = Ko rhoV/rhoL u^2',
    provenance: 'common-practice',
    ranges: {},
    trayTypes: ['fixed-valve'],
    uncertainty:
      "No published weep correlation for fixed valves is used: Fair's weep criterion and the Bennett et al. clear liquid height were developed for sieve trays and are applied to the valves as if held open. The weep margin of a fixed-valve tray is an indication only; confirm turndown with the valve supplier's data.",
  },
);

/** Klein's valve data and the vapour density for the moving-valve weep limit. */
export interface MovingValveWeepInput {
  legFactor: number;
  valveThickness_mm: number;
  metalDensity: number;
  closedK: number;
  vapourDensity: number;
  eddyLossCoefficient: number;
}

/**
 * Weep limit of a moving-valve tray: the hole velocity at which the valves start to open, Klein's closed
 * balance point (kleinClosedBalanceVelocity, with C_vw as printed in Ludwig Vol. 2 3rd ed. Example 8-41).
 * Valves close at low vapour rates and weeping, then dumping, follow at still lower rates (Lieberman, A
 * Working Guide to Process Equipment); below the closed balance point every valve sits closed on its tabs
 * and the tray behaves like a sieve tray of small open area. Keeping the vapour above this point is common
 * practice, not a published weep correlation: the real weep point lies somewhere below it, so a margin on
 * this limit is on the safe side.
 * Example: Ludwig Example 8-41 inputs → 3.06 ft/s (0.93 m/s), as printed for V_pt,A.
 * @returns limit on the deck-orifice area [m/s]
 */
export const weepPointMovingValveClosedBalance = method(
  'weepPointMovingValveClosedBalance',
  function weepPointMovingValveClosedBalance(p: MovingValveWeepInput): number {
    return kleinClosedBalanceVelocity(
      p.legFactor,
      p.valveThickness_mm,
      p.metalDensity,
      p.closedK,
      p.vapourDensity,
      p.eddyLossCoefficient,
    );
  },
  {
    label: 'Moving-valve weep limit (valves start to open)',
    source:
      "Klein's closed balance point (Klein, Chem. Eng. May 3 1982 p. 81, as printed in Ludwig, Applied Process Design Vol. 2 3rd ed. Example 8-41) taken as the lowest vapour rate before weeping; valves close, then weep and dump at low rates (Lieberman, A Working Guide to Process Equipment) [common practice]",
    equation: 'U_weep = U_A = [t_v R_vw (C_vw/Kc) (rhoM/rhoV)]^0.5',
    provenance: 'common-practice',
    ranges: {},
    trayTypes: ['moving-valve'],
    uncertainty:
      'The limit is the velocity at which the valves start to open, not a measured weep point: weeping starts somewhere below it, depending on the valve design, so the margin is on the safe side.',
  },
);

/**
 * The weep-point methods of each tray type (registry ids), explicit: a sieve tray reports whichever of its
 * two governs (the higher weep-point velocity); a valve tray its one method.
 */
export const WEEP_METHODS: Readonly<Record<TrayType, readonly string[]>> = Object.freeze({
  sieve: [weepPointHoleVelocityEduljee.meta.id, weepPointHoleVelocityFair.meta.id],
  'fixed-valve': [weepPointFixedValveFair.meta.id],
  'moving-valve': [weepPointMovingValveClosedBalance.meta.id],
});
