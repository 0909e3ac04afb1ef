/**
 * Liquid on valve trays: the aerated liquid head of Fair's method as printed for valve trays,
 * h'_L = β h_ds (Perry's Chemical Engineers' Handbook 8th ed. eq. 14-106; Klein 1982 in Ludwig Vol. 2
 * 3rd ed. eq. 8-318), with the aeration factor β from the froth density by Hutchinson's relation.
 */
import { bennettEffectiveDensity } from './pressureDrop.js';
import { method } from './meta.js';
import { KG_M3_PER_LB_FT3, M_PER_FT } from '../../shared/units.js';

/** 1 (ft/s)(lb/ft³)^0.5 in (m/s)(kg/m³)^0.5 = 0.3048 × 16.01846^0.5 (derived from shared/units.ts) */
const F_FACTOR_SI_PER_US = M_PER_FT * Math.sqrt(KG_M3_PER_LB_FT3);

/**
 * Aeration factor β of the liquid on the tray, from the relative froth density φ by Hutchinson's
 * relation β = (1 + φ)/2, which Klein (1982) uses to draw Fair's β curve from the froth-density curve
 * (Ludwig, Applied Process Design Vol. 2 3rd ed. p. 210: relation cited there, seen; its form
 * (1 + φ)/2 from memory, Hutchinson, Buron & Miller 1949). φ is taken from Bennett et al. (1983),
 * φ_e = exp(−12.55 K_s^0.91), K_s on the bubbling area, in place of reading Fair's froth-density chart.
 * @param bubblingVelocity_m_s U_a [m/s]; densities [kg/m³]
 * @returns β [-], between 0.5 (φ → 0) and 1 (no vapour).
 * Example: Seader & Henley 7.48 bottom, K_s 0.196 ft/s, printed φ_e 0.381 → β = 0.690.
 * Range: Fair's aeration-factor chart (Ludwig Fig. 8-150, Perry Fig. 14-37) spans F_a = U_a ρV^0.5
 * 0–2.5 (ft/s)(lb/ft³)^0.5 = 0–3.05 (m/s)(kg/m³)^0.5 (axis seen; SI derived).
 * Not a fit of the chart: we hold no readings of Perry Fig. 14-37 (only its existence and axis are
 * seen), and Perry's sieve-tray fit of β (the sentence introducing it is seen; its form as recalled gave
 * implausibly low β, about 0.44, and is unconfirmed) is not used. The uncertainty is stated once in the
 * methods list (`uncertainty` below). Replace this form by a fit of the chart when readings are at hand.
 */
export const aerationFactorFrothDensity = method(
  'aerationFactorFrothDensity',
  function aerationFactorFrothDensity(bubblingVelocity_m_s: number, vapourDensity: number, liquidDensity: number): number {
    const ks = bubblingVelocity_m_s * Math.sqrt(vapourDensity / (liquidDensity - vapourDensity));
    return 0.5 * (1 + bennettEffectiveDensity(ks));
  },
  {
    label: 'Aeration factor of the tray liquid',
    source:
      "Fair's aeration factor for valve and sieve trays (Perry's Chemical Engineers' Handbook 8th ed. Fig. 14-37; Ludwig, Applied Process Design Vol. 2 3rd ed. Fig. 8-150, after Klein, Chem. Eng. May 3 1982 p. 81), computed from the froth density by Hutchinson's relation beta = (1 + phi)/2 with the froth density of Bennett, Agrawal & Cook, AIChE J. 29(3) 434 (1983)",
    equation: 'beta = (1 + phi_e)/2, phi_e = exp(-12.55 Ks^0.91)',
    provenance: 'derived',
    ranges: { fFactorBubbling_Pa05: [0, 2.5 * F_FACTOR_SI_PER_US] },
    uncertainty:
      "Fair's aeration-factor chart is not read: the aeration factor is computed as (1 + phi)/2, the relation to the froth density attributed to Hutchinson, Buron & Miller (1949) as commonly quoted, with the froth density of Bennett et al., a sieve-tray correlation. The result has not been compared with the chart point by point, so the liquid part of a valve-tray pressure drop (and the downcomer backup built on it) is approximate; the dry part (Klein) is not affected.",
  },
);

/**
 * Aerated liquid head on a valve tray, h'_L = β h_ds with the dynamic seal h_ds = h_w + h_ow (+ h_hg/2;
 * the hydraulic gradient is dropped, as Perry's 8th ed. allows for most sieve and valve trays).
 * Perry's 8th ed. eq. 14-100/14-106: total tray head h_t = h_d + h'_L (no separate residual head).
 * @param aerationFactor β [-]; @param weirHeight_mm h_w; @param crest_mm h_ow (Francis)
 * @returns h'_L [mm liquid]. Example: β 0.69, h_w 50.8 mm, h_ow 20 mm → 48.9 mm.
 */
export const aeratedLiquidHeadFair = method(
  'aeratedLiquidHeadFair',
  function aeratedLiquidHeadFair(aerationFactor: number, weirHeight_mm: number, crest_mm: number): number {
    return aerationFactor * (weirHeight_mm + crest_mm);
  },
  {
    label: 'Aerated liquid head (valve trays)',
    source:
      "Perry's Chemical Engineers' Handbook 8th ed. eqs. 14-100 and 14-106 (valve and sieve trays); Ludwig, Applied Process Design Vol. 2 3rd ed. eq. 8-318 after Klein (1982); hydraulic gradient neglected",
    equation: "h'_L = beta (h_w + h_ow)",
    provenance: 'seen',
    ranges: {},
  },
);

/** F-factor on the bubbling area [(m/s)(kg/m³)^0.5]. Example: 1 m/s, 4 kg/m³ → 2. */
export function bubblingFFactor(bubblingVelocity_m_s: number, vapourDensity: number): number {
  return bubblingVelocity_m_s * Math.sqrt(vapourDensity);
}
