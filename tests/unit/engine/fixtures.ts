/**
 * Published worked examples converted to SI for the engine tests.
 * Seader & Henley, Separation Process Principles (1998), solutions manual, Exercises 7.48 and 7.49
 * (sieve tray: 3/16-in holes, h_w 2 in, L_w 42.5 in, A_h 2.26 ft², A_B 22.6 ft², C_o 0.73).
 * Column area: not printed with these data; D = 6 ft with A_d = 0.10 A_T is assumed (it reproduces
 * A_B = A_T − 2 A_d = 22.6 ft²; derived, not published).
 */
import type { RatingRequest, SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';
import { KG_M3_PER_LB_FT3, KG_PER_LB, M2_PER_FT2, M3_S_PER_USGPM, MM_PER_IN } from '../../../shared/units.js';

export const IN = MM_PER_IN;
export const FT_S = 0.3048;
export const LB_FT3 = KG_M3_PER_LB_FT3;

const columnArea_ft2 = (Math.PI / 4) * 6 * 6;

export const seaderTray: SectionGeometry = {
  trayType: 'sieve',
  passes: 1,
  columnDiameter_m: 6 * 0.3048,
  traySpacing_mm: 24 * IN,
  activeArea_m2: 22.6 * M2_PER_FT2,
  downcomerTopArea_m2: 0.1 * columnArea_ft2 * M2_PER_FT2,
  downcomerBottomArea_m2: 0.1 * columnArea_ft2 * M2_PER_FT2,
  outletWeirLength_m: (42.5 * IN) / 1000,
  weirHeight_mm: 2 * IN,
  downcomerClearance_mm: 1.5 * IN, // h_w − 0.5 in, as in the solution's A_da = L_w (h_w − 0.5 in)
  holeArea_m2: 2.26 * M2_PER_FT2,
  holeDiameter_mm: (3 / 16) * IN,
  deckThickness_mm: 2.0,
  orificeCoefficient: 0.73,
  systemFactor: 1,
  foaming: 'low',
};

/** 7.48 bottom tray: V 1376 lbmol/h × 18.1, ρV 0.0408 lb/ft³, ρL 59.5 lb/ft³ (954 kg/m³ for h_σ), 97.9 gpm, σ 58 mN/m. */
export const seader748Bottom: TrayLoad = {
  tray: 1,
  vapourMassFlow_kg_h: 1376 * 18.1 * KG_PER_LB,
  liquidMassFlow_kg_h: 97.9 * M3_S_PER_USGPM * 3600 * 59.5 * LB_FT3,
  vapourDensity_kg_m3: 0.0408 * LB_FT3,
  liquidDensity_kg_m3: 59.5 * LB_FT3,
  surfaceTension_mN_m: 58,
};

/** 7.49 top tray: V 1944 lbmol/h × 30.9, ρV 0.0703, ρL 47.2 lb/ft³ (756 kg/m³), 77.2 gpm, σ 20 mN/m. */
export const seader749Top: TrayLoad = {
  tray: 2,
  vapourMassFlow_kg_h: 1944 * 30.9 * KG_PER_LB,
  liquidMassFlow_kg_h: 77.2 * M3_S_PER_USGPM * 3600 * 47.2 * LB_FT3,
  vapourDensity_kg_m3: 0.0703 * LB_FT3,
  liquidDensity_kg_m3: 47.2 * LB_FT3,
  surfaceTension_mN_m: 20,
};

export function seaderRequest(): RatingRequest {
  return { section: { ...seaderTray }, trays: [{ ...seader748Bottom }, { ...seader749Top }] };
}

/** Invented valid request (demo-style numbers, not from any source) used by the validation and CLI tests. */
export function inventedRequest(): RatingRequest {
  return {
    section: {
      trayType: 'moving-valve',
      passes: 2,
      columnDiameter_m: 3.2,
      traySpacing_mm: 610,
      activeArea_m2: 5.9,
      downcomerTopArea_m2: 1.05,
      downcomerBottomArea_m2: 0.9,
      outletWeirLength_m: 4.6,
      weirHeight_mm: 50,
      downcomerClearance_mm: 45,
      holeArea_m2: 0.78,
      holeDiameter_mm: 39,
      deckThickness_mm: 2.7,
      valves: {
        count: 650,
        orificeDiameter_mm: 39,
        valveThickness_mm: 1.5,
        materialDensity_kg_m3: 8000,
        legFactor: 1.2,
        orificeShape: 'flat',
      },
    },
    trays: [
      {
        tray: 11,
        vapourMassFlow_kg_h: 98000,
        liquidMassFlow_kg_h: 140000,
        vapourDensity_kg_m3: 4.2,
        liquidDensity_kg_m3: 690,
        surfaceTension_mN_m: 14,
      },
      {
        tray: 12,
        vapourMassFlow_kg_h: 101000,
        liquidMassFlow_kg_h: 146000,
        vapourDensity_kg_m3: 4.4,
        liquidDensity_kg_m3: 685,
        surfaceTension_mN_m: 13.5,
      },
    ],
  };
}

/** Relative difference a/b − 1. */
export const rel = (a: number, b: number): number => a / b - 1;
