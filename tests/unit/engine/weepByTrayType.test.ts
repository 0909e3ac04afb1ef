/**
 * The weep check of each tray type, explicit (issue 13): sieve trays, the higher of Fair's criterion and
 * Eduljee; fixed valves, Fair's criterion with the valves taken as open (common practice, warned as outside
 * the criterion's sieve-tray basis); moving valves, Klein's closed balance point (common practice, after the
 * reference behaviour "valves close at low rates, weeping and dumping follow", Lieberman).
 */
import { describe, expect, it } from 'vitest';
import {
  METHOD_METADATA,
  METHOD_USES,
  WEEP_METHODS,
  kleinClosedValveK,
  kleinEddyLossCoefficient,
  rateTray,
  weepPointFixedValveFair,
  weepPointHoleVelocityFair,
  weepPointMovingValveClosedBalance,
} from '../../../server/engine/index.js';
import type { SectionGeometry, TrayType } from '../../../shared/types/rating.js';
import { FT_S, IN, LB_FT3, inventedRequest, rel, seader748Bottom, seaderTray } from './fixtures.js';

const codes = (w: { code: string }[]): string[] => w.map((x) => x.code);
const FAIR_OFF_TYPE = 'range:weepPointHoleVelocityFair:trayType';

describe('weep check per tray type', () => {
  const valve = inventedRequest();
  const cases: [TrayType, SectionGeometry][] = [
    ['sieve', seaderTray],
    ['fixed-valve', { ...valve.section, trayType: 'fixed-valve' }],
    ['moving-valve', valve.section],
  ];
  for (const [type, section] of cases) {
    it(`${type}: the weeping check names a method of its tray type, whose metadata says it applies`, () => {
      const load = type === 'sieve' ? seader748Bottom : valve.trays[0]!;
      const t = rateTray(section, load);
      expect(WEEP_METHODS[type]).toContain(t.checks.weeping.method);
      for (const id of WEEP_METHODS[type]) expect(METHOD_METADATA[id]!.trayTypes, id).toContain(type);
    });
  }

  it('no tray type shares a weep method with another', () => {
    const all = Object.values(WEEP_METHODS).flat();
    expect(new Set(all).size).toBe(all.length);
  });

  it("sieve: Seader & Henley (1998) solution 7.48 bottom tray, printed 'no weeping' (h_d + h_σ 1.66 in > h_L 1.22 in)", () => {
    const t = rateTray(seaderTray, seader748Bottom);
    expect(t.checks.weeping.value).toBeGreaterThan(1);
    expect(t.checks.weeping.status).not.toBe('over');
    expect(codes(t.warnings)).not.toContain(FAIR_OFF_TYPE);
  });

  it('moving valves: the limit is the closed balance point of Ludwig Vol. 2 3rd ed. Example 8-41 (printed V_pt,A 3.06 ft/s)', () => {
    // Example 8-41: venturi valves, 0.060 in thick, R_vw 1.45, C_vw 1.3, ρ_M 490 lb/ft³, ρV 1.91 lb/ft³
    const u = weepPointMovingValveClosedBalance({
      legFactor: 1.45,
      valveThickness_mm: 0.06 * IN,
      metalDensity: 490 * LB_FT3,
      closedK: kleinClosedValveK('venturi'),
      vapourDensity: 1.91 * LB_FT3,
      eddyLossCoefficient: kleinEddyLossCoefficient('venturi'),
    });
    expect(Math.abs(rel(u / FT_S, 3.06))).toBeLessThan(0.01);
    const m = weepPointMovingValveClosedBalance.meta;
    // its use as a weep limit is common practice (valves start to open; weeping starts below), said once
    expect(m.provenance).toBe('common-practice');
    expect(m.uncertainty).toMatch(/safe side/);
    expect(METHOD_USES[m.id]).toContain('kleinClosedBalanceVelocity');
    const t = rateTray(valve.section, valve.trays[0]!);
    expect(t.details.weepPointHoleVelocity_m_s).toBe(t.details.valvesStartOpenVelocity_m_s);
    expect(codes(t.warnings)).not.toContain(FAIR_OFF_TYPE);
  });

  it("fixed valves: Fair's criterion with the open-valve K, warned once per section as outside its sieve-tray basis", () => {
    const fixed: SectionGeometry = { ...valve.section, trayType: 'fixed-valve' };
    const load = valve.trays[0]!;
    const t = rateTray(fixed, load);
    expect(t.checks.weeping.method).toBe('weepPointFixedValveFair');
    // the same velocity as Fair's criterion on the same inputs (common practice: fixed valve = open valve)
    expect(t.details.weepPointHoleVelocity_m_s).toBe(t.details.weepPointFair_m_s);
    expect(t.details.weepPointHoleVelocity_m_s).toBeGreaterThan(0);
    const w = t.warnings.filter((x) => x.code === FAIR_OFF_TYPE);
    expect(w).toHaveLength(1);
    expect(w[0]!.tray).toBeUndefined(); // a section warning, not one per tray
    expect(w[0]!.message).toMatch(/developed for sieve trays/);
    expect(weepPointHoleVelocityFair.meta.trayTypes).toEqual(['sieve']);
    const m = weepPointFixedValveFair.meta;
    expect(m.provenance).toBe('common-practice');
    expect(m.uncertainty).toMatch(/indication only/);
  });
});
