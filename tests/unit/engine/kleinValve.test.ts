/**
 * Moving-valve trays, Klein (1982) as printed in Ludwig, Applied Process Design for Chemical and
 * Petrochemical Plants Vol. 2, 3rd ed., pp. 208-210, Example 8-41 ("Procedure for calculating valve tray
 * pressure drop (after Klein)"): venturi-type valve tray, valve 16 gauge (0.060 in), 4 legs, R_vw 1.45,
 * C_vw 1.3, K_c 3.077, K_o 0.448 s²·in/ft², ρ_vm 490 lb/ft³ (carbon steel), ρV 1.91 lb/ft³, ρL 31.0 lb/ft³.
 * Printed answers: V_pt,A = 3.06 ft/s (valves start to open), V_pt,B = 8.01 ft/s (all open), actual hole
 * velocity 4.40 ft/s (valves partly open). The partly-open dry head is not quoted here as a printed value.
 */
import { describe, expect, it } from 'vitest';
import kTable from '../../../reference-tables/klein-valve-k.json' with { type: 'json' };
import {
  dryTrayHeadKleinValve,
  kleinBalanceHead,
  kleinClosedBalanceVelocity,
  kleinClosedValveK,
  kleinEddyLossCoefficient,
  kleinOpenBalanceVelocity,
  kleinOpenValveK,
} from '../../../server/engine/pressureDrop.js';
import { rateTray } from '../../../server/engine/index.js';
import { FT_S, IN, LB_FT3, rel } from './fixtures.js';
import type { SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';

const tv = 0.06 * IN; // mm
const Rvw = 1.45;
const rhoM = 490 * LB_FT3;
const rhoV = 1.91 * LB_FT3;
const rhoL = 31.0 * LB_FT3;

describe('Klein moving-valve balance points, Ludwig Vol. 2 3rd ed. Example 8-41', () => {
  it('uses the printed eddy loss coefficient C_vw = 1.3 and the Table 8-23 venturi K values', () => {
    expect(kleinEddyLossCoefficient('venturi')).toBe(1.3);
    // K_c 3.077 and K_o 0.448 s²·in/ft² (Table 8-23, venturi) × 273.4 → s²·mm/m²
    expect(Math.abs(rel(kleinClosedValveK('venturi'), 3.077 * 273.4))).toBeLessThan(0.002);
    expect(Math.abs(rel(kleinOpenValveK('venturi', 2), 0.448 * 273.4))).toBeLessThan(0.005);
    for (const r of kTable) expect(r.source.length).toBeGreaterThan(10);
  });

  it('reproduces V_pt,A = 3.06 ft/s (valves start to open), within 1 %', () => {
    const uA = kleinClosedBalanceVelocity(Rvw, tv, rhoM, kleinClosedValveK('venturi'), rhoV, kleinEddyLossCoefficient('venturi'));
    // printed: 3.06 ft/s
    expect(Math.abs(rel(uA / FT_S, 3.06))).toBeLessThan(0.01);
    // Perry's form without C_vw (C_vw = 1) reads about 12 % low against the printed answer
    const perryForm = kleinClosedBalanceVelocity(Rvw, tv, rhoM, kleinClosedValveK('venturi'), rhoV, 1);
    expect(rel(perryForm / FT_S, 3.06)).toBeLessThan(-0.1);
  });

  it('reproduces V_pt,B = 8.01 ft/s (all valves open), within 1 %', () => {
    const uA = 3.06 * FT_S;
    // printed: 3.06 (3.077/0.448)^0.5 = 8.01 ft/s
    expect(Math.abs(rel(kleinOpenBalanceVelocity(uA, 3.077, 0.448) / FT_S, 8.01))).toBeLessThan(0.01);
    const uB = kleinOpenBalanceVelocity(
      kleinClosedBalanceVelocity(Rvw, tv, rhoM, kleinClosedValveK('venturi'), rhoV, 1.3),
      kleinClosedValveK('venturi'),
      kleinOpenValveK('venturi', 2),
    );
    expect(Math.abs(rel(uB / FT_S, 8.01))).toBeLessThan(0.015);
  });

  it('puts the printed operating hole velocity 4.40 ft/s between the balance points, on the partly-open branch', () => {
    const Kc = kleinClosedValveK('venturi');
    const Ko = kleinOpenValveK('venturi', 2);
    const bal = kleinBalanceHead(Rvw, tv, rhoM, rhoL, 1.3);
    // computed here (not a printed value): C_vw R_vw t_v ρ_M/ρL = 1.3 × 1.45 × 0.060 × 490/31.0 = 1.788 in
    expect(Math.abs(rel(bal / IN, 1.788))).toBeLessThan(0.002);
    const h = dryTrayHeadKleinValve(4.4 * FT_S, rhoV, rhoL, Kc, Ko, bal);
    expect(h).toBeCloseTo(bal, 9);
    // continuity at the printed balance points (±1 % on the printed velocities)
    const closedAtA = Kc * (rhoV / rhoL) * (3.07 * FT_S) ** 2;
    expect(Math.abs(rel(closedAtA, bal))).toBeLessThan(0.02);
    const openAtB = Ko * (rhoV / rhoL) * (8.03 * FT_S) ** 2;
    expect(Math.abs(rel(openAtB, bal))).toBeLessThan(0.02);
  });
});

describe('moving-valve tray rating reports the Klein balance points', () => {
  // invented section; vapour and liquid properties of Ludwig Example 8-41 so the balance points can be checked
  const section: SectionGeometry = {
    trayType: 'moving-valve',
    passes: 1,
    columnDiameter_m: 1.8,
    traySpacing_mm: 610,
    activeArea_m2: 1.9,
    downcomerTopArea_m2: 0.3,
    downcomerBottomArea_m2: 0.3,
    outletWeirLength_m: 1.3,
    weirHeight_mm: 50,
    downcomerClearance_mm: 38,
    holeArea_m2: 0.26,
    holeDiameter_mm: 39,
    deckThickness_mm: 2.64,
    valves: {
      count: 218,
      orificeDiameter_mm: 39,
      valveThickness_mm: tv,
      materialDensity_kg_m3: rhoM,
      legFactor: Rvw,
      orificeShape: 'venturi',
    },
  };
  const load: TrayLoad = {
    tray: 1,
    vapourMassFlow_kg_h: 20000,
    liquidMassFlow_kg_h: 20000,
    vapourDensity_kg_m3: rhoV,
    liquidDensity_kg_m3: rhoL,
    surfaceTension_mN_m: 10,
  };
  it('weep limit = V_pt,A of Ludwig Example 8-41 (3.06 ft/s), all-open velocity and partly-open head reported', () => {
    const t = rateTray(section, load);
    expect(Math.abs(rel(t.details.weepPointHoleVelocity_m_s / FT_S, 3.06))).toBeLessThan(0.01);
    expect(Math.abs(rel(t.details.valvesStartOpenVelocity_m_s! / FT_S, 3.06))).toBeLessThan(0.01);
    expect(Math.abs(rel(t.details.valvesAllOpenVelocity_m_s! / FT_S, 8.01))).toBeLessThan(0.015);
    expect(Math.abs(rel(t.details.valvePartlyOpenDryHead_mm! / IN, 1.788))).toBeLessThan(0.002);
    expect(t.checks.weeping.method).toBe('weepPointMovingValveClosedBalance');
  });
});
