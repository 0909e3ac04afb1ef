/**
 * Jet (entrainment) flooding: Fair (1961) through the Lygeros & Magoulas fit, its hole-area and
 * surface-tension corrections, the Souders–Brown flood velocity, and Kister & Haas (1990).
 */
import holeAreaTable from '../../reference-tables/fair-hole-area-correction.json' with { type: 'json' };
import { method } from './meta.js';

/**
 * Fair's flood capacity factor C_sbf at σ = 20 mN/m, Lygeros & Magoulas curve fit of Fair's chart.
 *
 * Source: Lygeros, A.I., Magoulas, K.G., Hydrocarbon Process. 65(12), 43 (1986), as printed in
 * Perry's Chemical Engineers' Handbook 8th ed., Sec. 14, eq. (14-90) (tag seen). Chart: Fair, J.R.,
 * Petro/Chem Eng. 33(10), 45 (1961); Perry 8th Fig. 14-31.
 *
 *   C_sbf = 0.0105 + 8.127e-4 · TS^0.755 · exp(−1.463 · F_LV^0.842)
 *
 * @param flowParameter F_LV = (L/V)(ρV/ρL)^0.5 with mass flows [-], chart 0.01–1.0
 * @param traySpacing_mm TS [mm], chart curves 152–914 mm (6–36 in)
 * @returns C_sbf [m/s] on the net area
 * Caveat: dC/dF_LV < 0 everywhere, whereas the chart rises at low F_LV for wide spacings; agrees with
 * chart readings to about ±10 %.
 * Example: TS 609.6 mm, F_LV 0.10 → 0.0939 m/s (reference sheet §2.3 table).
 */
export const fairFloodCapacityLygerosMagoulas = method(
  'fairFloodCapacityLygerosMagoulas',
  function fairFloodCapacityLygerosMagoulas(flowParameter: number, traySpacing_mm: number): number {
    return 0.0105 + 8.127e-4 * Math.pow(traySpacing_mm, 0.755) * Math.exp(-1.463 * Math.pow(flowParameter, 0.842));
  },
  {
    label: 'Fair (1961) jet flood, Lygeros & Magoulas fit',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. eq. (14-90); Lygeros & Magoulas, Hydrocarbon Process. 65(12) 43 (1986); Fair, Petro/Chem Eng. 33(10) 45 (1961). Beyond the chart's flow parameter 1 the fit is followed (lower capacity than at the chart edge). Hole-area correction (Ludwig Vol. 2 3rd ed. p. 189) on the open slot area for valve trays (Perry's definition)",
    equation: 'C_sbf = 0.0105 + 8.127e-4 TS^0.755 exp(-1.463 F_LV^0.842)',
    provenance: 'seen',
    ranges: {
      flowParameter: [0.01, 1.0],
      traySpacing_mm: [152, 914],
      holeDiameter_mm: [0, 12.7],
      holeAreaRatio: [0.06, 1],
      weirHeightOverTraySpacing: [0, 0.15],
    },
  },
);

const HOLE_ROWS = [...holeAreaTable].sort((a, b) => a.holeAreaRatio - b.holeAreaRatio);
const HA0 = HOLE_ROWS[0]!;
const HA1 = HOLE_ROWS[1]!;
const HA_TOP = HOLE_ROWS[HOLE_ROWS.length - 1]!;

/**
 * Fair's hole-area correction to C_sbf for A_h/A_a below 0.10.
 *
 * Source: Ludwig, Applied Process Design Vol. 2, 3rd ed., p. 189 (table with Fig. 8-137) (seen):
 * 1.00 at 0.10, 0.90 at 0.08, 0.80 at 0.06; linear interpolation between rows. Below 0.06 the last
 * segment is extrapolated linearly (our choice; reaches 0.5 at zero hole area) and a warning is given.
 * @param holeAreaRatio A_h/A_a [-]
 * @returns multiplier on C_sbf [-]
 * Example: 0.07 → 0.85.
 */
export const fairHoleAreaCorrection = method(
  'fairHoleAreaCorrection',
  function fairHoleAreaCorrection(holeAreaRatio: number): number {
    if (holeAreaRatio >= HA_TOP.holeAreaRatio) return HA_TOP.factor;
    for (let i = 1; i < HOLE_ROWS.length; i++) {
      const hi = HOLE_ROWS[i]!;
      const lo = HOLE_ROWS[i - 1]!;
      if (holeAreaRatio >= lo.holeAreaRatio) {
        return lo.factor + ((hi.factor - lo.factor) * (holeAreaRatio - lo.holeAreaRatio)) / (hi.holeAreaRatio - lo.holeAreaRatio);
      }
    }
    const slope = (HA1.factor - HA0.factor) / (HA1.holeAreaRatio - HA0.holeAreaRatio);
    return HA0.factor + slope * (holeAreaRatio - HA0.holeAreaRatio);
  },
  {
    label: 'Fair hole-area correction (Ludwig table)',
    source: 'Ludwig, Applied Process Design Vol. 2 3rd ed. p. 189, table with Fig. 8-137',
    equation: 'factor = 1.00 (A_h/A_a >= 0.10), 0.90 (0.08), 0.80 (0.06), linear between',
    provenance: 'seen',
    ranges: { holeAreaRatio: [0.06, 1] },
  },
);

/**
 * Fair's surface-tension correction (σ/20)^0.2 (σ in mN/m), Perry 8th ed. Sec. 14 with Fig. 14-31 (seen).
 * Range 5–80 mN/m: common practice, the surface-tension span of the tray flood data banks (Perry 8th ed.
 * Table 14-10); outside it the power law is extrapolated (warned).
 * Example: σ 57 mN/m → 1.2328.
 */
export const fairSurfaceTensionCorrection = method(
  'fairSurfaceTensionCorrection',
  function fairSurfaceTensionCorrection(surfaceTension_mN_m: number): number {
    return Math.pow(surfaceTension_mN_m / 20, 0.2);
  },
  {
    label: 'Fair surface-tension correction',
    source: "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14, with Fig. 14-31",
    equation: '(sigma/20)^0.2',
    provenance: 'seen',
    ranges: { surfaceTension_mN_m: [5, 80] },
  },
);

/**
 * Souders–Brown flood velocity u_flood = C · [(ρL − ρV)/ρV]^0.5.
 * Source: Souders & Brown, Ind. Eng. Chem. 26(1), 98 (1934), as in Perry 8th ed. Sec. 14 (seen).
 * Range: ρV/ρL up to 0.067 (= 30/450, the corner of the data span of Perry 8th ed. Table 14-10, derived;
 * used as a common-practice bound for both flood correlations): as the vapour density approaches the
 * liquid density near the critical point the flood correlations are extrapolated (warned).
 * @param capacityFactor_m_s C (already corrected) [m/s]
 * @returns u_flood [m/s]
 * Example: C 0.0925 m/s, ρL 954, ρV 0.72 kg/m³ → 3.37 m/s.
 */
export const floodVelocitySoudersBrown = method(
  'floodVelocitySoudersBrown',
  function floodVelocitySoudersBrown(capacityFactor_m_s: number, liquidDensity: number, vapourDensity: number): number {
    return capacityFactor_m_s * Math.sqrt((liquidDensity - vapourDensity) / vapourDensity);
  },
  {
    label: 'Souders–Brown flood velocity',
    source: "Souders & Brown, Ind. Eng. Chem. 26(1) 98 (1934); Perry's Chemical Engineers' Handbook 8th ed. Sec. 14",
    equation: 'u_flood = C [(rhoL - rhoV)/rhoV]^0.5',
    provenance: 'seen',
    ranges: { vapourToLiquidDensityRatio: [0, 0.067] },
  },
);

/**
 * Clear liquid height at the froth-to-spray transition for Kister & Haas, corrected Jeronimo &
 * Sawistowski form, named for eq. (14-81) by Perry 8th ed. as eqs. (14-82) to (14-84) (seen).
 *
 *   h_ct,H2O = 0.497 A_f^−0.791 d_H^0.833 / (1 + 0.013 Q_L^−0.59 A_f^−1.79)    [mm]
 *   h_ct = h_ct,H2O (996/ρL)^(0.5(1 − n)),  n = 0.00091 d_H/A_f
 * Provenance: a secondary source reproducing Perry's 8th ed. eqs. 14-82 to 14-84 (seen) has the same
 * structure and exponents, its leading coefficient within 1.5 % (English 0.294 against 0.2896 here,
 * derived from 0.497), and quotes Kister's (1992) sizing example h_ct(water) ≈ 0.94 in at d_H 0.5 in,
 * A_f 0.1, Q_L 6.45 gpm/in, which this form reproduces (0.936 in). The printed page itself has not been
 * checked: the leading coefficient is uncertain by about 1.5 %. SI and English sets agree within 0.4 %.
 * Surface tension: the same secondary source states that σ is capped at 25 mN/m as the authors recommend;
 * that statement was not found in a printed source, so σ is used as given and the rating warns above
 * 25 mN/m (hydraulics.ts).
 * A_f for valve trays = open slot area / bubbling area (Perry 8th ed. definition).
 * @param holeDiameter_mm d_H [mm]; @param fractionalHoleArea A_f [-]
 * @param weirLoad_m3_h_m Q_L [m³/(h·m)]; @param liquidDensity ρL [kg/m³]
 * @returns h_ct [mm]. Example: d_H 12.7 mm, A_f 0.1, Q_L 57.7 m³/(h·m) (6.45 gpm/in), ρL 996 → 23.8 mm
 * = 0.936 in (sizing example as quoted there: ≈ 0.94 in).
 */
export const transitionClearLiquidHeightKisterHaas = method(
  'transitionClearLiquidHeightKisterHaas',
  function transitionClearLiquidHeightKisterHaas(
    holeDiameter_mm: number,
    fractionalHoleArea: number,
    weirLoad_m3_h_m: number,
    liquidDensity: number,
  ): number {
    const hWater =
      (0.497 * Math.pow(fractionalHoleArea, -0.791) * Math.pow(holeDiameter_mm, 0.833)) /
      (1 + 0.013 * Math.pow(weirLoad_m3_h_m, -0.59) * Math.pow(fractionalHoleArea, -1.79));
    const n = (0.00091 * holeDiameter_mm) / fractionalHoleArea;
    return hWater * Math.pow(996 / liquidDensity, 0.5 * (1 - n));
  },
  {
    label: 'Kister & Haas froth-to-spray transition height (corrected Jeronimo & Sawistowski)',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. Sec. 14 eqs. (14-82) to (14-84), after Jeronimo & Sawistowski as corrected by Kister & Haas (1990). Taken from a secondary source reproducing those equations (same structure and exponents, leading coefficient within 1.5 %), which quotes Kister's (1992) sizing example h_ct ≈ 0.94 in of water at d_H 0.5 in, A_f 0.1, Q_L 6.45 gpm/in; this form gives 0.936 in. Uncertainty: the leading coefficient, about 1.5 %",
    equation: 'h_ct = 0.497 Af^-0.791 dH^0.833/(1 + 0.013 QL^-0.59 Af^-1.79) (996/rhoL)^(0.5(1-n))',
    provenance: 'seen',
    ranges: { weirLoad_m3_h_m: [3, 40] },
  },
);

/**
 * Kister & Haas (1990) entrainment (jet) flood capacity factor on the net area.
 *
 * Source: Kister, H.Z., Haas, J.R., Chem. Eng. Prog. 86(9), 63 (1990), as printed in Perry's 8th ed.
 * Sec. 14, eq. (14-81) (seen: constant 0.0277, exponents 0.125/0.1/0.5, units, "C_SB,flood is based on the
 * net area", ±15 % on the authors' data base; the copy seen lost its superscripts). English form constant
 * 0.144 seen in Kister, Distillation Design (1992) §6.5.3 (Eq. 6.12 applied: 0.144 (0.5² × 2.84/27.19)^0.125 …);
 * the two printed constants agree within 0.2 % with d_H squared, 27 % apart with d_H to the first power
 * (tests/unit/engine/kisterHaasPublished.test.ts). Perry's text introduces it "for sieve trays".
 * Range: Perry 8th Table 14-10 (seen; the weir-height row was not legible, 10–50 mm is from memory).
 *
 *   C_SB = 0.0277 (d_H² σ/ρL)^0.125 (ρV/ρL)^0.1 (TS/h_ct)^0.5    [m/s]
 * @param holeDiameter_mm [mm] 3–15; @param surfaceTension_mN_m [mN/m] 5–80
 * @param liquidDensity [kg/m³] 450–1500; @param vapourDensity [kg/m³] 0.5–30
 * @param traySpacing_mm [mm] 400–900; @param transitionHeight_mm h_ct [mm]
 * @returns C_SB,flood [m/s] on the net area; apply the system factor separately.
 * Example (computed here): d_H 12.7, σ 2.84, ρL 435.5, ρV 57.9, TS 609.6, h_ct 63.5 → 0.0706 m/s.
 */
export const kisterHaasFloodCapacity = method(
  'kisterHaasFloodCapacity',
  function kisterHaasFloodCapacity(
    holeDiameter_mm: number,
    surfaceTension_mN_m: number,
    liquidDensity: number,
    vapourDensity: number,
    traySpacing_mm: number,
    transitionHeight_mm: number,
  ): number {
    return (
      0.0277 *
      Math.pow((holeDiameter_mm * holeDiameter_mm * surfaceTension_mN_m) / liquidDensity, 0.125) *
      Math.pow(vapourDensity / liquidDensity, 0.1) *
      Math.sqrt(traySpacing_mm / transitionHeight_mm)
    );
  },
  {
    label: 'Kister & Haas (1990) jet flood',
    source:
      "Kister & Haas, Chem. Eng. Prog. 86(9) 63 (1990), as in Perry's Chemical Engineers' Handbook 8th ed. eq. (14-81); Kister, Distillation Design (1992) eq. 6.12; range Perry 8th ed. Table 14-10. The froth-to-spray transition height h_ct follows Perry's eqs. (14-82) to (14-84) as reproduced in a secondary source that also quotes Kister's (1992) sizing example (0.94 in of water); its leading coefficient is uncertain by about 1.5 %. For valve trays A_f is the open slot area over the bubbling area",
    equation: 'C_SB = 0.0277 (dH^2 sigma/rhoL)^0.125 (rhoV/rhoL)^0.1 (TS/h_ct)^0.5',
    provenance: 'seen',
    ranges: {
      pressure_kPa: [20, 1200],
      vapourDensity_kg_m3: [0.5, 30],
      liquidDensity_kg_m3: [450, 1500],
      surfaceTension_mN_m: [5, 80],
      liquidViscosity_mPa_s: [0.05, 2],
      traySpacing_mm: [400, 900],
      holeDiameter_mm: [3, 15],
      fractionalHoleArea: [0.07, 0.16],
      weirLoad_m3_h_m: [3, 40],
      weirHeight_mm: [10, 50],
    },
  },
);

/**
 * High-pressure derating (system) factor, Kister (1992) Table 6.7 (seen): SF = 1.21/ρV^0.32 with ρV in
 * lb/ft³, SI form 2.94/ρV^0.32 (derived), for ρV > 28.8 kg/m³; 1 below. Example: ρV 40 → 0.90.
 */
export const highPressureSystemFactorKister = method(
  'highPressureSystemFactorKister',
  function highPressureSystemFactorKister(vapourDensity: number): number {
    return vapourDensity > 28.8 ? Math.min(1, 2.94 / Math.pow(vapourDensity, 0.32)) : 1;
  },
  {
    label: 'Kister high-pressure system factor',
    source: 'Kister, Distillation Design (1992) Table 6.7 pp. 292-293',
    equation: 'SF = 2.94/rhoV^0.32 (rhoV > 28.8 kg/m3)',
    provenance: 'seen',
    ranges: {},
  },
);
