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
    source: "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14, fit of Fig. 14-35 (Liebson, Kelley & Bullington, Pet. Refiner 36(3) 288 (1957)) [from memory]",
    equation: 'Cv = 0.74 Ah/Aa + exp(0.29 t/dH - 0.56)',
    provenance: 'recalled',
    ranges: { holeAreaRatio: [0.05, 0.2], thicknessOverDiameter: [0.1, 1.2] },
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
  function dryTrayHeadOrifice(holeVelocity_m_s: number, orificeCoefficient: number, vapourDensity: number, liquidDensity: number): number {
    const r = holeVelocity_m_s / orificeCoefficient;
    return (50.8 * r * r * vapourDensity) / liquidDensity;
  },
  {
    label: 'Dry-tray orifice head',
    source: 'Holland, Fundamentals of Multicomponent Distillation eq. 12-10; Seader & Henley (1998); Perry 8th ed. Sec. 14',
    equation: 'h_d = 50.8 (u_h/Cv)^2 rhoV/rhoL',
    provenance: 'seen',
    ranges: {},
  },
);

type Shape = 'flat' | 'venturi';
const K_CLOSED: Record<Shape, number> = { flat: 0, venturi: 0 };
const K_OPEN_VENTURI = { value: 0 };
const K_OPEN_FLAT: { t: number; k: number }[] = [];
for (const row of kleinTable) {
  const shape = row.orificeShape as Shape;
  if (row.coefficient === 'closed') K_CLOSED[shape] = row.K_si;
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
    source: "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 form h_d = K rhoV/rhoL U^2 [from memory]; fixed valve = open moving valve [common practice]",
    equation: 'h_d = K rhoV/rhoL u_h^2',
    provenance: 'common-practice',
    ranges: {},
  },
);

/** Klein balance (partly open) head R_vw t_v ρ_M/ρL [mm] (Perry 8th Sec. 14 form, recalled). Example: 1.25, 1.5, 8000, 700 → 21.4 mm. */
export function kleinBalanceHead(legFactor: number, valveThickness_mm: number, metalDensity: number, liquidDensity: number): number {
  return (legFactor * valveThickness_mm * metalDensity) / liquidDensity;
}

/**
 * Hole velocity at which moving valves start to open (closed-valve balance point, Klein point A):
 *   U_h,closed = [R_vw t_v ρ_M/(K_c ρV)]^0.5   [m/s]
 * Source: Klein, Chem. Eng., May 3 1982, p. 81, as in Perry 8th ed. Sec. 14 (form recalled; derived by
 * equating the closed and balance branches). Example: R_vw 1.25, t_v 1.5 mm, ρ_M 8000, K_c 1682,
 * ρV 3 → 1.72 m/s.
 */
export const kleinClosedBalanceVelocity = method(
  'kleinClosedBalanceVelocity',
  function kleinClosedBalanceVelocity(legFactor: number, valveThickness_mm: number, metalDensity: number, closedK: number, vapourDensity: number): number {
    return Math.sqrt((legFactor * valveThickness_mm * metalDensity) / (closedK * vapourDensity));
  },
  {
    label: 'Klein closed-valve balance point',
    source: "Klein, Chem. Eng. May 3 1982 p. 81; Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 [form from memory]",
    equation: 'U_closed = [Rvw tv rhoM/(Kc rhoV)]^0.5',
    provenance: 'recalled',
    ranges: {},
  },
);

/**
 * Moving-valve dry head, Klein (1982) after Bolles (1976): closed branch K_c, balance branch
 * R_vw t_v ρ_M/ρL while the valves open, open branch K_o (continuous at both break points).
 * @returns h_d [mm liquid]. Example: R_vw 1.25, t_v 1.5 mm, ρ_M 8000, ρV 3, ρL 700, flat 12 ga:
 * 3 m/s → 21.4 mm (balance); 1 m/s → 7.2 mm (closed); 6 m/s → 39.2 mm (open).
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
    source: 'Klein, Chem. Eng. May 3 1982 p. 81; Bolles, CEP 72(9) 43 (1976); Ludwig Vol. 2 3rd ed. Table 8-23',
    equation: 'closed Kc rhoV/rhoL U^2; balance Rvw tv rhoM/rhoL; open Ko rhoV/rhoL U^2',
    provenance: 'recalled',
    ranges: {},
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
    source: 'Bennett, Agrawal & Cook, AIChE J. 29(3) 434 (1983) [citation from memory]; form as used in Seader & Henley (1998) solutions',
    equation: 'h_L = phi_e [h_w + C_l (q/(L_w phi_e))^(2/3)]',
    provenance: 'seen',
    ranges: {},
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
    ranges: {},
  },
);

/** Head of liquid [mm] to pressure [Pa]: ΔP = 1e-3 h ρL g. Example: 100 mm, ρL 1000 → 981 Pa. */
export function headToPascal(head_mm: number, liquidDensity: number): number {
  return 1e-3 * head_mm * liquidDensity * G;
}
