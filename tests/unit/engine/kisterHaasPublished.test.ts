/**
 * Kister & Haas (1990) jet flood against what is printed in published sources.
 *
 * Seen (web copies of the printed pages, OCR with superscripts lost; addresses in /work/notes/kister-haas.md):
 * - Perry's Chemical Engineers' Handbook 8th ed., Sec. 14, eq. (14-81): C_SB,flood = 0.0277 (d_H² σ/ρL)^0.125
 *   (ρG/ρL)^0.1 (TS/h_ct)^0.5, d_H mm, σ mN/m, ρ kg/m³, TS and h_ct mm; C_SB,flood on the net area;
 *   h_ct from the corrected Jeronimo & Sawistowski correlation, eqs. (14-82) to (14-84).
 * - Kister, Distillation Design (1992), §6.5.3, preliminary sizing of a depropanizer with Eq. (6.12), bottom
 *   section: C_SB = 0.144 (0.5² × 2.84/27.19)^0.125 (3.614/27.19)^0.1 (24/h_ct)^0.5 = 0.231 ft/s
 *   (d_H in, σ dyn/cm, ρ lb/ft³, TS in). The h_ct value of that line is not legible in the copy.
 * Not seen: the h_ct coefficients of eqs. (14-82)–(14-84), and the numbers of Perry 8th Example 9.
 */
import { describe, expect, it } from 'vitest';
import { kisterHaasFloodCapacity, transitionClearLiquidHeightKisterHaas } from '../../../server/engine/flooding.js';
import { FT_S, IN, LB_FT3, rel } from './fixtures.js';

/** Kister (1992) §6.5.3, bottom section, printed inputs (English units). */
const KISTER_BOTTOM = { dH_in: 0.5, sigma: 2.84, rhoL_lb: 27.19, rhoV_lb: 3.614, ts_in: 24 } as const;

/** English form with the constant printed in Kister (1992) §6.5.3 (Eq. 6.12): C_SB in ft/s. */
function kisterEnglish(dIn: number, sigma: number, rhoL: number, rhoV: number, tsIn: number, hctIn: number): number {
  return 0.144 * Math.pow((dIn * dIn * sigma) / rhoL, 0.125) * Math.pow(rhoV / rhoL, 0.1) * Math.sqrt(tsIn / hctIn);
}

describe("Kister & Haas C_SB,flood as printed (Perry's 8th ed. eq. 14-81; Kister 1992 §6.5.3)", () => {
  it('SI constant 0.0277 (Perry 8th eq. 14-81) and English constant 0.144 (Kister 1992 §6.5.3) give the same C_SB through our function, ±0.5 %', () => {
    // Kister 1992 §6.5.3 bottom-section inputs; its h_ct is not legible, so the check sweeps h_ct.
    // The units of (d_H² σ/ρL) make the two constants agree only if d_H is squared and the group carries 0.125.
    const k = KISTER_BOTTOM;
    for (const hctIn of [1.5, 2.5, 4]) {
      const si = kisterHaasFloodCapacity(k.dH_in * IN, k.sigma, k.rhoL_lb * LB_FT3, k.rhoV_lb * LB_FT3, k.ts_in * IN, hctIn * IN);
      const english = kisterEnglish(k.dH_in, k.sigma, k.rhoL_lb, k.rhoV_lb, k.ts_in, hctIn) * FT_S;
      expect(Math.abs(rel(si, english))).toBeLessThan(0.005);
    }
  });

  it('carries the exponents printed in Perry 8th eq. (14-81)', () => {
    // base case: Kister 1992 §6.5.3 bottom-section inputs in SI, h_ct 63.5 mm (any value serves here)
    const d = 12.7,
      s = 2.84,
      rl = 27.19 * LB_FT3,
      rv = 3.614 * LB_FT3,
      ts = 609.6,
      h = 63.5;
    const base = kisterHaasFloodCapacity(d, s, rl, rv, ts, h);
    expect(kisterHaasFloodCapacity(d, s, rl, rv, 2 * ts, h) / base).toBeCloseTo(Math.pow(2, 0.5), 6); // (TS/h_ct)^0.5
    expect(kisterHaasFloodCapacity(d, s, rl, rv, ts, 2 * h) / base).toBeCloseTo(Math.pow(2, -0.5), 6);
    expect(kisterHaasFloodCapacity(d, s, rl, 2 * rv, ts, h) / base).toBeCloseTo(Math.pow(2, 0.1), 6); // (ρG/ρL)^0.1
    expect(kisterHaasFloodCapacity(d, 2 * s, rl, rv, ts, h) / base).toBeCloseTo(Math.pow(2, 0.125), 6); // σ^0.125
    expect(kisterHaasFloodCapacity(2 * d, s, rl, rv, ts, h) / base).toBeCloseTo(Math.pow(2, 0.25), 6); // (d_H²)^0.125
    expect(kisterHaasFloodCapacity(d, s, 2 * rl, rv, ts, h) / base).toBeCloseTo(Math.pow(2, -0.225), 6); // ρL^(−0.125−0.1)
  });

  it("h_ct reproduces Kister's (1992) sizing example as quoted with Perry's 8th ed. eqs. (14-82)–(14-84)", () => {
    // A secondary source reproducing Perry's 8th ed. eqs. 14-82 to 14-84 (seen; the printed page itself not seen)
    // quotes Kister (1992): h_ct of water ≈ 0.94 in at d_H 0.5 in, A_f 0.1, Q_L 6.45 gpm/in. ±1 %.
    const hct = transitionClearLiquidHeightKisterHaas(0.5 * IN, 0.1, 6.45 * 8.942, 996);
    expect(Math.abs(rel(hct / IN, 0.94))).toBeLessThan(0.01);
    // the secondary source's English leading coefficient 0.294 is about 1.5 % (1.52 %) above ours in English
    // units (0.497 × 25.4^−0.167 = 0.2896, derived)
    expect(Math.abs(rel(0.294, 0.497 / Math.pow(25.4, 1 - 0.833)))).toBeLessThan(0.016);
  });
  it.todo(
    "h_ct, Perry's 8th ed. eqs. (14-82)–(14-84): compare coefficients with the printed page (not seen in the stored copies)",
  );
  it.todo(
    "Perry's 8th ed. Sec. 14 Example 9 (2.5-m ethylbenzene/styrene sieve tray): inputs and printed C_SB not legible in the stored copy",
  );
});
