/** Tray pressure drop: dry tray (sieve orifice, Klein valve branches), Bennett clear liquid, residual head. */
import kleinTable from '../../reference-tables/klein-valve-k.json' with { type: 'json' };
import { G } from './units.js';
import { method } from './meta.js';

/**
 * Sieve-tray orifice coefficient, Hughmark & O'Connell fit of the Liebson, Kelley & Bullington chart
 * (Perry 8th ed. Fig. 14-35), as given in Perry Sec. 14 (recalled, from memory):
 *   C_v = 0.74 (A_h/A_a) + exp[0.29 (t_t/d_H) − 0.56]
 * @param holeAreaRatio A_h/A_a [-]; @param thicknessOverDiameter t_t/d_H [-]
 * @returns C_v [-]. Example: (0.10, 1.0) → 0.837 (Sinnott chart 0.84, from memory).
 * Range: the chart spans A_h/A_a about 0.05–0.20 and t_t/d_H about 0.1–1.2 (from memory).
 */
export const orificeCoefficientHughmarkOConnell = method(
  'orificeCoefficientHughmarkOConnell',
  function orificeCoefficientHughmarkOConnell(holeAreaRatio: number, thicknessOverDiameter: number): number {
    return 0.74 * holeAreaRatio + Math.exp(0.29 * thicknessOverDiameter - 0.56);
  },
  {
    label: "Hughmark & O'Connell orifice coefficient",
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14, fit of Fig. 14-35 (Liebson, Kelley & Bullington, Pet. Refiner 36(3) 288 (1957)) [from memory]",
    equation: 'Cv = 0.74 Ah/Aa + exp(0.29 t/dH - 0.56)',
    provenance: 'recalled',
    ranges: { holeAreaRatio: [0.05, 0.2], thicknessOverDiameter: [0.1, 1.2] },
    trayTypes: ['sieve'],
  },
);

/**
 * Dry-tray head of an orifice deck: h_d = 50.8 (u_h/C_v)² ρV/ρL  [mm liquid].
 * Source: Holland eq. 12-10 / Seader & Henley h_d = 0.186 (u_o/C_o)² ρV/ρL in (seen); 0.186 × 25.4/0.3048²
 * = 50.85 (derived); Perry K = 50.8/C_v² (recalled). Also used, with K in place of 50.8/C_v², for
 * fixed valves (see dryTrayHeadK).
 * @param holeVelocity_m_s u_h [m/s]; @param orificeCoefficient C_v [-]
 * @returns h_d [mm liquid]. Example: Seader & Henley 7.48 bottom, u_o 75.0 ft/s, C_o 0.73,
 * ρV/ρL 0.0408/59.5 → 34.2 mm = 1.346 in (solution: 1.35 in).
 */
export const dryTrayHeadOrifice = method(
  'dryTrayHeadOrifice',
  function dryTrayHeadOrifice(
    holeVelocity_m_s: number,
    orificeCoefficient: number,
    vapourDensity: number,
    liquidDensity: number,
  ): number {
    const r = holeVelocity_m_s / orificeCoefficient;
    return (50.8 * r * r * vapourDensity) / liquidDensity;
  },
  {
    label: 'Dry-tray orifice head',
    source: 'Holland, Fundamentals of Multicomponent Distillation eq. 12-10; Seader & Henley (1998); Perry 8th ed. Sec. 14',
    equation: 'h_d = 50.8 (u_h/Cv)^2 rhoV/rhoL',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['sieve'],
  },
);

type Shape = 'flat' | 'venturi';
const K_CLOSED: Record<Shape, number> = { flat: 0, venturi: 0 };
const K_OPEN_VENTURI = { value: 0 };
const K_OPEN_FLAT: { t: number; k: number }[] = [];
/** Klein's eddy loss coefficient C_vw [-] (Ludwig Example 8-41: 1.3); read from the table below */
const EDDY = { value: 0 };
for (const row of kleinTable) {
  const shape = row.orificeShape as Shape;
  if (row.coefficient === 'eddy') EDDY.value = row.K_si;
  else if (row.coefficient === 'closed') K_CLOSED[shape] = row.K_si;
  else if (shape === 'venturi') K_OPEN_VENTURI.value = row.K_si;
  else if (row.deckThickness_mm !== null) K_OPEN_FLAT.push({ t: row.deckThickness_mm, k: row.K_si });
}
K_OPEN_FLAT.sort((a, b) => a.t - b.t);

/**
 * Klein's closed-valve loss coefficient K_c [s²·mm/m²] (Ludwig Vol. 2 Table 8-23 from Klein 1982, seen;
 * SI = 273.4 × English, derived): flat (rectangular) orifice 1682, venturi 841.
 */
export const kleinClosedValveK = method(
  'kleinClosedValveK',
  function kleinClosedValveK(orificeShape: Shape): number {
    return K_CLOSED[orificeShape];
  },
  {
    label: 'Klein closed-valve K',
    source: 'Ludwig, Applied Process Design Vol. 2 3rd ed. Table 8-23, from Klein, Chem. Eng. May 3 1982 p. 81',
    equation: 'table',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/**
 * Klein's open-valve loss coefficient K_o [s²·mm/m²] (Ludwig Table 8-23, seen): flat orifice by deck
 * thickness 224 (3.40 mm, 10 ga), 254 (2.64 mm, 12 ga), 302 (1.88 mm, 14 ga), linear between and held
 * at the end rows outside (warned); venturi 122 for any deck.
 */
export const kleinOpenValveK = method(
  'kleinOpenValveK',
  function kleinOpenValveK(orificeShape: Shape, deckThickness_mm: number): number {
    if (orificeShape === 'venturi') return K_OPEN_VENTURI.value;
    const first = K_OPEN_FLAT[0]!;
    const last = K_OPEN_FLAT[K_OPEN_FLAT.length - 1]!;
    if (deckThickness_mm <= first.t) return first.k;
    if (deckThickness_mm >= last.t) return last.k;
    for (let i = 1; i < K_OPEN_FLAT.length; i++) {
      const hi = K_OPEN_FLAT[i]!;
      const lo = K_OPEN_FLAT[i - 1]!;
      if (deckThickness_mm <= hi.t) return lo.k + ((hi.k - lo.k) * (deckThickness_mm - lo.t)) / (hi.t - lo.t);
    }
    return last.k;
  },
  {
    label: 'Klein open-valve K',
    source: 'Ludwig, Applied Process Design Vol. 2 3rd ed. Table 8-23, from Klein, Chem. Eng. May 3 1982 p. 81',
    equation: 'table, linear in deck thickness',
    provenance: 'seen',
    ranges: { deckThickness_mm: [1.88, 3.4] },
    trayTypes: ['fixed-valve', 'moving-valve'],
  },
);

/**
 * Dry head with a loss coefficient K: h_d = K (ρV/ρL) u_h² [mm]. Used for fixed valves with Klein's
 * open-valve K_o: a fixed valve is treated as a permanently open moving valve (common practice,
 * from memory); no published fixed-valve coefficient is used here.
 * Example: K 254, ρV 3, ρL 700, u_h 5 m/s → 27.2 mm.
 */
export const dryTrayHeadK = method(
  'dryTrayHeadK',
  function dryTrayHeadK(holeVelocity_m_s: number, k: number, vapourDensity: number, liquidDensity: number): number {
    return (k * vapourDensity * holeVelocity_m_s * holeVelocity_m_s) / liquidDensity;
  },
  {
    label: 'Dry head from a loss coefficient (fixed valve as open valve)',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 form h_d = K rhoV/rhoL U^2 [from memory]; fixed valve = open moving valve [common practice]",
    equation: 'h_d = K rhoV/rhoL u_h^2',
    provenance: 'common-practice',
    ranges: {},
    trayTypes: ['fixed-valve'],
  },
);

/**
 * Klein's eddy loss coefficient C_vw [-] of the valve force balance (Ludwig Vol. 2 3rd ed. p. 208
 * nomenclature, "C_vw = eddy loss coefficient, dimensionless, Table 8-22", and Example 8-41, which uses
 * C_vw = 1.3 for a venturi-orifice valve; seen). The rectangular-orifice value of Table 8-22 was not
 * seen: 1.3 is used for both orifice shapes. Perry's 8th ed. eq. (14-104) lists no C_vw, i.e. it is
 * the same balance with C_vw = 1 (about 12 % lower opening velocity: non-conservative for weeping).
 */
export const kleinEddyLossCoefficient = method(
  'kleinEddyLossCoefficient',
  function kleinEddyLossCoefficient(_orificeShape: Shape): number {
    return EDDY.value;
  },
  {
    label: 'Klein eddy loss coefficient C_vw',
    source:
      'Ludwig, Applied Process Design Vol. 2 3rd ed. p. 208 and Example 8-41 (C_vw = 1.3, printed for a venturi-orifice valve and applied here to rectangular orifices as well), after Klein, Chem. Eng. May 3 1982 p. 81',
    equation: 'C_vw = 1.3',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/**
 * Dry head while the valves are partly open (between Klein's balance points A and B): the valve
 * weight per unit orifice area, as liquid head, times the eddy loss coefficient:
 *   h_d = C_vw R_vw t_v ρ_M/ρL   [mm]
 * Source: Klein (1982) as in Ludwig Vol. 2 3rd ed. (variables and C_vw seen, eq. 8-311 context); the
 * form follows from the printed balance-point velocity (continuity with the closed branch at point A,
 * derived). Perry's 8th ed. form is the same without C_vw.
 * @param legFactor R_vw [-]; @param valveThickness_mm t_v [mm]; @param metalDensity ρ_M [kg/m³]
 * @param liquidDensity ρL [kg/m³]; @param eddyLossCoefficient C_vw [-]
 * @returns h_d [mm liquid]. Example: Ludwig Example 8-41 inputs (t_v 0.060 in, R_vw 1.45, C_vw 1.3,
 * ρ_M 490, ρL 31.0 lb/ft³) → 45.4 mm = 1.79 in (computed here; not a printed answer).
 */
export const kleinBalanceHead = method(
  'kleinBalanceHead',
  function kleinBalanceHead(
    legFactor: number,
    valveThickness_mm: number,
    metalDensity: number,
    liquidDensity: number,
    eddyLossCoefficient: number,
  ): number {
    return (eddyLossCoefficient * legFactor * valveThickness_mm * metalDensity) / liquidDensity;
  },
  {
    label: 'Klein partly-open valve dry head',
    source:
      'Klein, Chem. Eng. May 3 1982 p. 81, as in Ludwig, Applied Process Design Vol. 2 3rd ed. pp. 208-210 (with the eddy loss coefficient C_vw)',
    equation: 'h_d = C_vw R_vw t_v rhoM/rhoL',
    provenance: 'derived',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/**
 * Hole velocity at which moving valves start to open (closed balance point, Klein's point A):
 *   U_h,A = [t_v R_vw (C_vw/K_c) (ρ_M/ρV)]^0.5   [m/s]
 * Source: Ludwig, Applied Process Design Vol. 2 3rd ed. Example 8-41 (after Klein 1982; seen), English
 * units there (t_v in, K_c s²·in/ft², ft/s); in SI with t_v in mm and K_c in s²·mm/m² the same form
 * gives m/s. Perry's 8th ed. eq. (14-104) prints it without C_vw (that is C_vw = 1).
 * @param legFactor R_vw [-] (about 1.1–1.5 legged, 1.0 caged); @param valveThickness_mm t_v [mm]
 * @param metalDensity ρ_M [kg/m³] (steel ≈ 7850–8000); @param closedK K_c [s²·mm/m²]
 * @param vapourDensity ρV [kg/m³]; @param eddyLossCoefficient C_vw [-]
 * @returns U_h,A on the deck-orifice area [m/s].
 * Example: Ludwig Example 8-41, venturi valve, t_v 0.060 in, R_vw 1.45, C_vw 1.3, K_c 3.077,
 * ρ_M 490, ρV 1.91 lb/ft³ → 3.07 ft/s (printed: 3.06 ft/s).
 */
export const kleinClosedBalanceVelocity = method(
  'kleinClosedBalanceVelocity',
  function kleinClosedBalanceVelocity(
    legFactor: number,
    valveThickness_mm: number,
    metalDensity: number,
    closedK: number,
    vapourDensity: number,
    eddyLossCoefficient: number,
  ): number {
    return Math.sqrt((eddyLossCoefficient * legFactor * valveThickness_mm * metalDensity) / (closedK * vapourDensity));
  },
  {
    label: 'Klein closed-valve balance point (valves start to open)',
    source:
      "Klein, Chem. Eng. May 3 1982 p. 81, as printed in Ludwig, Applied Process Design Vol. 2 3rd ed. Example 8-41; Perry's Chemical Engineers' Handbook 8th ed. eq. (14-104) gives the same balance without C_vw",
    equation: 'U_A = [t_v R_vw (C_vw/Kc) (rhoM/rhoV)]^0.5',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/**
 * Hole velocity at which all valves are open (Klein's point B): U_h,B = U_h,A (K_c/K_o)^0.5 [m/s]
 * (Ludwig Vol. 2 3rd ed. Example 8-41, after Klein 1982; seen; Perry's 8th ed. eq. 14-105 form).
 * Example: Ludwig Example 8-41, 3.06 ft/s, K_c 3.077, K_o 0.448 (venturi) → 8.02 ft/s (printed: 8.01 ft/s).
 */
export const kleinOpenBalanceVelocity = method(
  'kleinOpenBalanceVelocity',
  function kleinOpenBalanceVelocity(closedBalanceVelocity_m_s: number, closedK: number, openK: number): number {
    return closedBalanceVelocity_m_s * Math.sqrt(closedK / openK);
  },
  {
    label: 'Klein open-valve balance point (all valves open)',
    source:
      "Klein, Chem. Eng. May 3 1982 p. 81, as printed in Ludwig, Applied Process Design Vol. 2 3rd ed. Example 8-41; Perry's Chemical Engineers' Handbook 8th ed. Sec. 14",
    equation: 'U_B = U_A (Kc/Ko)^0.5',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/**
 * Moving-valve dry head, Klein (1982) after Bolles (1976): closed branch K_c, balance branch
 * C_vw R_vw t_v ρ_M/ρL while the valves open, open branch K_o (continuous at both break points).
 * @returns h_d [mm liquid]. Example: R_vw 1.25, t_v 1.5 mm, ρ_M 8000, C_vw 1.3, ρV 3, ρL 700, flat
 * 12 ga: balance 27.9 mm; 1 m/s → 7.2 mm (closed); 3 m/s → 27.9 mm (partly open); 6 m/s → 39.2 mm (open).
 */
export const dryTrayHeadKleinValve = method(
  'dryTrayHeadKleinValve',
  function dryTrayHeadKleinValve(
    holeVelocity_m_s: number,
    vapourDensity: number,
    liquidDensity: number,
    closedK: number,
    openK: number,
    balanceHead_mm: number,
  ): number {
    const q = (vapourDensity * holeVelocity_m_s * holeVelocity_m_s) / liquidDensity;
    const closed = closedK * q;
    if (closed <= balanceHead_mm) return closed;
    const open = openK * q;
    return open >= balanceHead_mm ? open : balanceHead_mm;
  },
  {
    label: 'Klein moving-valve dry pressure drop',
    source:
      'Klein, Chem. Eng. May 3 1982 p. 81; Bolles, CEP 72(9) 43 (1976); Ludwig, Applied Process Design Vol. 2 3rd ed. pp. 208-210, Table 8-23',
    equation: 'closed Kc rhoV/rhoL U^2; partly open C_vw Rvw tv rhoM/rhoL; open Ko rhoV/rhoL U^2',
    provenance: 'seen',
    ranges: {},
    trayTypes: ['moving-valve'],
  },
);

/** Bennett et al. effective relative froth density φ_e = exp(−12.55 K_s^0.91), K_s [m/s] on the bubbling area. */
export function bennettEffectiveDensity(capacityFactor_m_s: number): number {
  return Math.exp(-12.55 * Math.pow(capacityFactor_m_s, 0.91));
}

/** Bennett et al. weir constant C_l = 0.501 + 0.438 exp(−137.8 h_w), h_w [m] (given here in mm). */
export function bennettWeirConstant(weirHeight_mm: number): number {
  return 0.501 + 0.438 * Math.exp(-0.1378 * weirHeight_mm);
}

/**
 * Bennett, Agrawal & Cook (1983) effective liquid density and weir constant, SI constants (derived from
 * the English form used by Seader & Henley, seen):
 *   φ_e = exp(−12.55 K_s^0.91),  K_s = U_a [ρV/(ρL − ρV)]^0.5,
 *   C_l = 0.501 + 0.438 exp(−137.8 h_w),
 *   h_L = φ_e [h_w + C_l (q/(L_w φ_e))^(2/3)] = φ_e h_w + C_l (q/L_w)^(2/3) φ_e^(1/3)   (h in m, q m³/s, L_w m)
 * @param bubblingVelocity_m_s U_a on the active area [m/s]; @param weirHeight_mm h_w [mm]
 * @param liquid_m3_s q [m³/s]; @param weirLength_m L_w [m]
 * @returns h_L [mm liquid]. Example: Seader & Henley 7.48 bottom (U_a 7.5 ft/s, h_w 2 in, 97.9 gpm,
 * L_w 42.5 in, ρ 0.0408/59.5 lb/ft³) → 30.9 mm = 1.217 in (solution: 1.22 in).
 * Validity: sieve trays in the froth regime; Kister (1992, Ch. 6) notes it is not applicable to the spray
 * regime. The engine takes the spray regime as a clear liquid height below the Kister & Haas froth-to-spray
 * transition height h_ct (range h_ct/h_L ≤ 1) and warns there; its tray types (sieve) are data too.
 * Valve trays use the aerated liquid head of aeration.ts instead.
 */
export const clearLiquidHeightBennett = method(
  'clearLiquidHeightBennett',
  function clearLiquidHeightBennett(
    bubblingVelocity_m_s: number,
    vapourDensity: number,
    liquidDensity: number,
    weirHeight_mm: number,
    liquid_m3_s: number,
    weirLength_m: number,
  ): number {
    const phi = bennettEffectiveDensity(bubblingVelocity_m_s * Math.sqrt(vapourDensity / (liquidDensity - vapourDensity)));
    const cl = bennettWeirConstant(weirHeight_mm);
    return 1000 * phi * (weirHeight_mm / 1000) + 1000 * cl * Math.pow(liquid_m3_s / weirLength_m, 2 / 3) * Math.cbrt(phi);
  },
  {
    label: 'Bennett et al. (1983) clear liquid height',
    source:
      'Bennett, Agrawal & Cook, AIChE J. 29(3) 434 (1983), form as used in Seader & Henley (1998) solutions; a sieve-tray, froth-regime correlation (Kister, Distillation Design 1992 Ch. 6: not applicable to the spray regime)',
    equation: 'h_L = phi_e [h_w + C_l (q/(L_w phi_e))^(2/3)]',
    provenance: 'seen',
    ranges: { transitionOverClearLiquid: [0, 1] },
    trayTypes: ['sieve'],
  },
);

/**
 * Residual (surface-tension) head, Bennett form h_σ = 6σ/(g ρL d_H) → 611.6 σ/(ρL d_H) mm
 * (σ mN/m, d_H mm) (Seader & Henley 1998, seen; SI constant derived). Valid in the froth regime.
 * Example: σ 58 mN/m, ρL 954, d_H 4.7625 mm → 7.8 mm = 0.308 in (solution: 0.31 in).
 */
export const residualHeadBennett = method(
  'residualHeadBennett',
  function residualHeadBennett(surfaceTension_mN_m: number, liquidDensity: number, holeDiameter_mm: number): number {
    return (6000 * surfaceTension_mN_m) / (G * liquidDensity * holeDiameter_mm);
  },
  {
    label: 'Bennett residual (surface-tension) head',
    source: 'Seader & Henley, Separation Process Principles (1998), h_sigma = 6 sigma/(g rhoL dH); Bennett et al. (1983)',
    equation: 'h_sigma = 6 sigma/(g rhoL dH)',
    provenance: 'seen',
    ranges: { transitionOverClearLiquid: [0, 1] },
    trayTypes: ['sieve'],
  },
);

/** Head of liquid [mm] to pressure [Pa]: ΔP = 1e-3 h ρL g. Example: 100 mm, ρL 1000 → 981 Pa. */
export function headToPascal(head_mm: number, liquidDensity: number): number {
  return 1e-3 * head_mm * liquidDensity * G;
}
