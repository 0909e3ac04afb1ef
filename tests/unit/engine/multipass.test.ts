/**
 * Multipass trays. One check reproduces a printed example (Kister 1992, named beside it); the others
 * are derived: exact circle geometry (chords, segments) and the definitions of weir loading, split and
 * imbalance, computed here independently of the engine's formulas.
 */
import { describe, expect, it } from 'vitest';
import {
  areaBetweenChords,
  chordLength,
  passImbalancePercent,
  passTray,
  preparePasses,
} from '../../../server/engine/multipass.js';
import { rateTray } from '../../../server/engine/rateTray.js';
import { operatingWindow } from '../../../server/engine/operatingWindow.js';
import { validateRatingRequest } from '../../../server/engine/validate.js';
import { crestOverWeirFrancis, weirLoadingVolumetric } from '../../../server/engine/weir.js';
import { aerationFactorFrothDensity } from '../../../server/engine/aeration.js';
import { clearLiquidHeightBennett } from '../../../server/engine/pressureDrop.js';
import type { SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';
import { IN, inventedRequest, rel } from './fixtures.js';

/** Segment area beyond a chord at distance d from the centre: R² acos(d/R) − d sqrt(R² − d²) (derived, textbook circle geometry). */
const segment = (r: number, d: number): number => r * r * Math.acos(d / r) - d * Math.sqrt(r * r - d * d);

/** Width of a side segment holding `fraction` of the circle area (bisection on the formula above). */
function segmentWidth(r: number, fraction: number): number {
  let lo = 0;
  let hi = r;
  for (let i = 0; i < 80; i++) {
    const m = (lo + hi) / 2;
    if (segment(r, r - m) / (Math.PI * r * r) < fraction) lo = m;
    else hi = m;
  }
  return lo;
}

const twoPass = (): SectionGeometry => ({
  ...inventedRequest().section,
  passLayout: { sideDowncomerWidth_mm: 490, centreDowncomerWidth_mm: 330, oddTrayOutlets: 'side' },
});

/** Invented four-pass crude tray, 6 m: off-centre downcomers placed for equal flow paths (0.95 m, derived). */
const fourPass = (liquidSplit?: number[]): SectionGeometry => ({
  trayType: 'fixed-valve',
  passes: 4,
  columnDiameter_m: 6,
  traySpacing_mm: 760,
  activeArea_m2: 19,
  downcomerTopArea_m2: 4.4,
  downcomerBottomArea_m2: 4.4,
  outletWeirLength_m: 21,
  weirHeight_mm: 50,
  downcomerClearance_mm: 50,
  holeArea_m2: 2.6,
  holeDiameter_mm: 39,
  deckThickness_mm: 3,
  passLayout: {
    sideDowncomerWidth_mm: 500,
    centreDowncomerWidth_mm: 400,
    offCentreDowncomerWidth_mm: 400,
    offCentreDowncomerOffset_mm: 1350,
    oddTrayOutlets: 'side',
    ...(liquidSplit ? { liquidSplit } : {}),
  },
});

const load = (tray: number, liquid = 400000): TrayLoad => ({
  tray,
  vapourMassFlow_kg_h: 250000,
  liquidMassFlow_kg_h: liquid,
  vapourDensity_kg_m3: 3.5,
  liquidDensity_kg_m3: 700,
  surfaceTension_mN_m: 15,
});

describe('circle geometry (derived identities)', () => {
  it('chords and areas between chords', () => {
    expect(chordLength(1, 0)).toBeCloseTo(2, 12);
    expect(chordLength(1, 0.6)).toBeCloseTo(1.6, 12);
    expect(areaBetweenChords(1.3, -1.3, 1.3)).toBeCloseTo(Math.PI * 1.69, 12);
    expect(areaBetweenChords(1.3, 0, 1.3)).toBeCloseTo((Math.PI * 1.69) / 2, 12);
    // chord at half the radius cuts a 120° segment: R² (π/3 − √3/4)
    expect(areaBetweenChords(2, 1, 2)).toBeCloseTo(4 * (Math.PI / 3 - Math.sqrt(3) / 4), 12);
  });
});

describe('two-pass layout', () => {
  it('reproduces the printed total weir length of a two-pass tray (Kister, Distillation Design, 1992, §6.5)', () => {
    // Kister (1992) §6.5 depropanizer, bottom section, two passes, D 6.5 ft: side downcomers 12.8 % of the
    // tower area each, centre downcomer 25.6 %; printed total outlet weir length L_w = 121.4 in (the two
    // side weirs). Tolerance 0.5 % (the printed percentages are rounded).
    const r = (6.5 * 12 * IN) / 2000;
    const ws = segmentWidth(r, 0.128);
    let lo = 0;
    let hi = 2 * r;
    for (let i = 0; i < 80; i++) {
      const m = (lo + hi) / 2;
      if (areaBetweenChords(r, -m / 2, m / 2) / (Math.PI * r * r) < 0.256) lo = m;
      else hi = m;
    }
    const section: SectionGeometry = {
      ...twoPass(),
      columnDiameter_m: 2 * r,
      passLayout: { sideDowncomerWidth_mm: ws * 1000, centreDowncomerWidth_mm: lo * 1000, oddTrayOutlets: 'side' },
    };
    const side = passTray(section, section.passLayout!, 'side');
    const total = side.panels.reduce((a, p) => a + p.weirLength, 0);
    expect(Math.abs(rel(total / (IN / 1000), 121.4))).toBeLessThan(0.005);
    expect(side.downcomers).toHaveLength(2);
    expect(side.downcomers[0]!.area / (Math.PI * r * r)).toBeCloseTo(0.128, 6);
  });

  it('alternates side and centre outlets and rates each pass on its own weir (derived)', () => {
    const s = twoPass();
    const r = 1.6;
    const sideChord = 2 * Math.sqrt(r * r - (r - 0.49) ** 2);
    const centreChord = 2 * Math.sqrt(r * r - 0.165 ** 2);
    const odd = rateTray(s, load(11, 140000));
    const even = rateTray(s, load(12, 140000));
    const qPass = 70000 / 700 / 3600; // half the liquid, m³/s
    expect(odd.details.pass1WeirLength_m).toBeCloseTo(sideChord, 9);
    expect(even.details.pass1WeirLength_m).toBeCloseTo(centreChord, 9);
    expect(odd.details.pass2WeirLoading_m3_h_m).toBeCloseTo((qPass * 3600) / sideChord, 9);
    expect(odd.checks.weirLoading.value).toBeCloseTo((qPass * 3600) / sideChord, 9);
    expect(even.checks.liquidLoad.value).toBeCloseTo(664 * Math.pow(qPass / centreChord, 2 / 3), 9);
    // flow path: side downcomer edge to centre downcomer edge
    expect(odd.details.pass1FlowPathLength_m).toBeCloseTo(r - 0.49 - 0.165, 12);
    // each side downcomer takes one pass; the centre downcomer both
    expect(odd.details.pass1DowncomerInletVelocity_m_s).toBeCloseTo(qPass / segment(r, r - 0.49), 9);
    expect(even.details.pass1DowncomerInletVelocity_m_s).toBeCloseTo((2 * qPass) / areaBetweenChords(r, -0.165, 0.165), 9);
    expect(odd.details.passImbalance_percent).toBeCloseTo(0, 9);
  });

  it('leaves sections without a layout as they were (equal shares of the totals)', () => {
    const req = inventedRequest();
    const t = rateTray(req.section, req.trays[0]!);
    expect(t.details.pass1WeirLength_m).toBeUndefined();
    expect(t.details.weirLoading_m3_h_m).toBeCloseTo(weirLoadingVolumetric(140000 / 690 / 3600, 4.6), 9);
  });
});

describe('four-pass layout', () => {
  it('panels, flow paths, outlets and downcomer sharing (derived)', () => {
    const s = fourPass();
    const r = 3;
    const odd = passTray(s, s.passLayout!, 'side');
    const even = passTray(s, s.passLayout!, 'inner');
    for (const p of odd.panels) expect(p.flowPathLength).toBeCloseTo(0.95, 12);
    const outer = segment(r, 1.55) - segment(r, 2.5);
    const inner = segment(r, 0.2) - segment(r, 1.15);
    expect(odd.panels[0]!.areaFraction).toBeCloseTo(outer / (2 * (outer + inner)), 12);
    expect(odd.panels[1]!.areaFraction).toBeCloseTo(inner / (2 * (outer + inner)), 12);
    // odd trays: outer passes to the side weirs, inner passes to the centre weirs (centre downcomer shared)
    expect(odd.panels.map((p) => p.weirLength)).toEqual([
      chordLength(r, 2.5),
      chordLength(r, 0.2),
      chordLength(r, 0.2),
      chordLength(r, 2.5),
    ]);
    expect(odd.downcomers.map((d) => d.kind)).toEqual([0, 1, 0]);
    expect(odd.panels.map((p) => p.downcomer)).toEqual([0, 1, 1, 2]);
    // even trays: every pass to an off-centre downcomer, outer passes over its outer wall
    expect(even.panels.map((p) => p.weirLength)).toEqual([
      chordLength(r, 1.55),
      chordLength(r, 1.15),
      chordLength(r, 1.15),
      chordLength(r, 1.55),
    ]);
    expect(even.downcomers.map((d) => d.kind)).toEqual([2, 2]);
    expect(even.downcomers[0]!.area).toBeCloseTo(segment(r, 1.15) - segment(r, 1.55), 12);
  });

  it('equal split on unequal panels is an imbalance; a split matching the areas is none (derived)', () => {
    const pp = preparePasses(fourPass())!;
    const a = pp.odd.panels.map((p) => p.areaFraction);
    const expected = 100 * Math.max(...a.map((x) => Math.abs(0.25 / x - 1)));
    expect(pp.imbalance_percent).toBeCloseTo(expected, 12);
    expect(passImbalancePercent([0.25, 0.25, 0.25, 0.25], [0.22, 0.28, 0.28, 0.22])).toBeCloseTo(13.636, 3);
    // exactly at the 10 % limit (0.55 of the liquid on half the area) is not beyond it
    const atLimit = rateTray(
      { ...twoPass(), passLayout: { ...twoPass().passLayout!, liquidSplit: [0.45, 0.55] } },
      load(1, 140000),
    );
    expect(atLimit.details.passImbalance_percent).toBeCloseTo(10, 9);
    expect(atLimit.warnings.some((w) => w.code === 'pass-imbalance')).toBe(false);
    expect(pp.imbalance_percent).toBeGreaterThan(10); // equal flow paths give unequal panel areas
    const warned = rateTray(fourPass(), load(1));
    expect(warned.warnings.find((w) => w.code === 'pass-imbalance')?.message).toMatch(/imbalance 16\.7 % exceeds 10 %/);
    const matched = fourPass(a.map((x) => Number(x.toFixed(6))));
    const m = rateTray(matched, load(1));
    expect(m.details.passImbalance_percent).toBeLessThan(0.01);
    expect(m.warnings.some((w) => w.code === 'pass-imbalance')).toBe(false);
  });

  it('rates the worst pass: the odd tray with the shorter side weirs controls weir loading (derived)', () => {
    const split = [0.2, 0.3, 0.3, 0.2];
    const t = rateTray(fourPass(split), load(3));
    const q = 400000 / 700 / 3600;
    const loads = [0, 1, 2, 3].map((i) => weirLoadingVolumetric(split[i]! * q, t.details[`pass${i + 1}WeirLength_m`]!));
    expect(t.checks.weirLoading.value).toBeCloseTo(Math.max(...loads), 9);
    expect(t.details.pass2CrestOverWeir_mm).toBeCloseTo(crestOverWeirFrancis(0.3 * q, chordLength(3, 0.2)), 9);
    expect(t.checks.liquidLoad.value).toBeCloseTo(
      Math.min(...[0, 1, 2, 3].map((i) => t.details[`pass${i + 1}CrestOverWeir_mm`]!)),
      9,
    );
    // even tray: one off-centre downcomer takes passes 1 and 2 (half the liquid)
    const e = rateTray(fourPass(split), load(4));
    expect(e.details.pass1DowncomerInletVelocity_m_s).toBeCloseTo((0.5 * q) / (segment(3, 1.15) - segment(3, 1.55)), 9);
    expect(e.checks.downcomerBackup.value).toBeCloseTo(
      Math.max(e.details.pass1DowncomerBackupPercent!, e.details.pass2DowncomerBackupPercent!),
      9,
    );
  });

  it("draws the operating window's weir-loading line where the worst pass reaches the limit", () => {
    const s = fourPass([0.2, 0.3, 0.3, 0.2]);
    const w = operatingWindow(s, load(3), undefined, { points: 3 });
    const line = w.curves.find((c) => c.limit === 'maxWeirLoading')!;
    const at = rateTray(s, load(3, line.liquid_kg_h[0]));
    expect(at.checks.weirLoading.value).toBeCloseTo(at.checks.weirLoading.limit, 6);
  });
});

describe('passes and layout input', () => {
  it('warns (never blocks) on passes unusual for the diameter', () => {
    const req = inventedRequest();
    const small = {
      ...req.section,
      passes: 4 as const,
      columnDiameter_m: 2.5,
      activeArea_m2: 3,
      downcomerTopArea_m2: 0.9,
      downcomerBottomArea_m2: 0.8,
      outletWeirLength_m: 6,
    };
    expect(validateRatingRequest({ section: small, trays: req.trays }).ok).toBe(true);
    expect(rateTray(small, req.trays[0]!).warnings.some((w) => w.code === 'passes-for-diameter')).toBe(true);
    expect(rateTray(req.section, req.trays[0]!).warnings.some((w) => w.code === 'passes-for-diameter')).toBe(false);
  });

  it('rejects layouts that do not fit or do not match the passes, naming the field', () => {
    const req = inventedRequest();
    const errs = (section: SectionGeometry) => {
      const r = validateRatingRequest({ section, trays: req.trays });
      return r.ok ? [] : r.errors;
    };
    const onePass = errs({ ...twoPass(), passes: 1, outletWeirLength_m: 2.3 });
    expect(onePass).toHaveLength(1);
    expect(onePass[0]).toMatchObject({ path: '/section/passLayout' });
    expect(onePass[0]!.message).toMatch(/two- and four-pass/);
    const noDeck = errs({
      ...twoPass(),
      passLayout: { sideDowncomerWidth_mm: 1200, centreDowncomerWidth_mm: 900, oddTrayOutlets: 'side' },
    });
    expect(noDeck[0]?.path).toBe('/section/passLayout/centreDowncomerWidth_mm');
    const split = errs({ ...twoPass(), passLayout: { ...twoPass().passLayout!, liquidSplit: [0.5, 0.6] } });
    expect(split[0]?.path).toBe('/section/passLayout/liquidSplit');
    expect(split[0]!.message).toMatch(/add up to 1/);
    const count = errs({ ...twoPass(), passLayout: { ...twoPass().passLayout!, liquidSplit: [0.3, 0.3, 0.4] } });
    expect(count[0]!.message).toMatch(/one fraction per pass \(2\)/);
    const four = fourPass();
    const missing = errs({ ...four, passLayout: { ...four.passLayout!, offCentreDowncomerOffset_mm: undefined } });
    expect(missing.map((e) => e.path)).toContain('/section/passLayout/offCentreDowncomerOffset_mm');
    const overlap = errs({ ...four, passLayout: { ...four.passLayout!, offCentreDowncomerOffset_mm: 300 } });
    expect(overlap[0]?.path).toBe('/section/passLayout/offCentreDowncomerOffset_mm');
    expect(errs(four)).toEqual([]);
    expect(errs({ ...twoPass(), passLayout: { ...twoPass().passLayout!, oddTrayOutlets: 'centre' as 'side' } })[0]?.path).toBe(
      '/section/passLayout/oddTrayOutlets',
    );
  });
});

describe("per-pass liquid: each pass's own clear liquid, crest and head", () => {
  it('valve tray, unequal split: pass head = dry head + β (h_w + own crest); backup from its own head (derived)', () => {
    const s: SectionGeometry = { ...twoPass(), passLayout: { ...twoPass().passLayout!, liquidSplit: [0.6, 0.4] } };
    const t = rateTray(s, load(12, 140000)); // even tray: both passes drain to the centre downcomer
    const d = t.details;
    const beta = aerationFactorFrothDensity(d.bubblingAreaVelocity_m_s!, 3.5, 700);
    for (const n of [1, 2]) {
      const crest = d[`pass${n}CrestOverWeir_mm`]!;
      expect(d[`pass${n}ClearLiquidHeight_mm`]).toBeCloseTo(beta * (50 + crest), 9);
      expect(d[`pass${n}TrayHead_mm`]).toBeCloseTo(d.dryPressureDrop_mm + d[`pass${n}ClearLiquidHeight_mm`]!, 9);
    }
    expect(d.pass1TrayHead_mm!).toBeGreaterThan(d.pass2TrayHead_mm!);
    // same downcomer, same apron loss: the backups differ by exactly the head and crest differences
    const diff = d.pass1DowncomerClearBackup_mm! - d.pass2DowncomerClearBackup_mm!;
    const expected = d.pass1TrayHead_mm! - d.pass2TrayHead_mm! + d.pass1CrestOverWeir_mm! - d.pass2CrestOverWeir_mm!;
    expect(diff).toBeCloseTo(expected, 9);
    expect(d.downcomerClearBackup_mm).toBeCloseTo(d.pass1DowncomerClearBackup_mm!, 9);
  });

  it("sieve tray: each pass's clear liquid is Bennett's on the pass's own liquid and weir (derived)", () => {
    const s: SectionGeometry = {
      ...twoPass(),
      trayType: 'sieve',
      holeDiameter_mm: 12.7,
      deckThickness_mm: 3,
      passLayout: { ...twoPass().passLayout!, liquidSplit: [0.55, 0.45] },
    };
    delete s.valves;
    const t = rateTray(s, load(11, 140000));
    const d = t.details;
    for (const [n, share] of [
      [1, 0.55],
      [2, 0.45],
    ] as const) {
      const q = (share * 140000) / 700 / 3600;
      const hl = clearLiquidHeightBennett(d.bubblingAreaVelocity_m_s!, 3.5, 700, 50, q, d[`pass${n}WeirLength_m`]!);
      expect(d[`pass${n}ClearLiquidHeight_mm`]).toBeCloseTo(hl, 9);
      expect(d[`pass${n}TrayHead_mm`]).toBeCloseTo(d.dryPressureDrop_mm + hl + d.residualHead_mm, 9);
    }
  });

  it("Kister & Haas takes the liquid load on the tray's own total weir length, per kind of tray (Kister 1992 §6.5)", () => {
    // Kister's two-pass example checks centre-to-side and side-to-centre trays apart, with the liquid load on
    // the tray's total outlet weir ("single pass ... will roughly double the liquid load because the weir
    // length will be halved"). Here: the layout tray equals a tray without a layout whose entered weir length
    // is that tray's total.
    const s = twoPass();
    const methods = { jetFlood: 'kister-haas' as const };
    for (const tray of [11, 12]) {
      const t = rateTray(s, load(tray, 140000), methods);
      const own = (t.details.pass1WeirLength_m ?? 0) + (t.details.pass2WeirLength_m ?? 0);
      const plain = rateTray({ ...s, passLayout: undefined, outletWeirLength_m: own }, load(tray, 140000), methods);
      expect(t.details.percentFloodKisterHaas).toBeCloseTo(plain.details.percentFloodKisterHaas!, 9);
    }
    const odd = rateTray(s, load(11, 140000), methods).details.percentFloodKisterHaas!;
    const even = rateTray(s, load(12, 140000), methods).details.percentFloodKisterHaas!;
    expect(odd).not.toBeCloseTo(even, 6);
  });
});

describe('layout against the entered totals', () => {
  it("accepts an entered outlet weir within the span of the two kinds of tray's weirs; warns far outside it (derived)", () => {
    const s = twoPass(); // r 1.6: side weirs 2 × 2.305 = 4.61 m, centre weirs 2 × 3.183 = 6.37 m (derived)
    const pp = preparePasses(s)!;
    expect(pp.odd.weirLength).toBeLessThan(pp.even.weirLength);
    const warns = (weir: number) =>
      rateTray({ ...s, outletWeirLength_m: weir }, load(11, 140000)).warnings.filter(
        (w) => w.code === 'pass-layout-mismatch' && w.message.includes('outlet weir'),
      );
    expect(warns((pp.odd.weirLength + pp.even.weirLength) / 2)).toEqual([]);
    expect(warns(pp.odd.weirLength * 0.95)).toEqual([]);
    expect(warns(pp.odd.weirLength * 0.8)).toHaveLength(1);
    expect(warns(pp.even.weirLength * 1.2)).toHaveLength(1);
  });

  it("a layout tray's own weirs carry its tray-level crest and liquid (the entered total does not)", () => {
    const s = twoPass();
    const a = rateTray({ ...s, outletWeirLength_m: 5 }, load(12, 140000)).details;
    const b = rateTray({ ...s, outletWeirLength_m: 6.5 }, load(12, 140000)).details;
    expect(a.totalHead_mm).toBeCloseTo(b.totalHead_mm!, 12);
    expect(a.clearLiquidHeight_mm).toBeCloseTo(b.clearLiquidHeight_mm, 12);
  });
});
