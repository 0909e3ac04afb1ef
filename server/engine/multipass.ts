/**
 * Multipass trays: the pass panels of a two- or four-pass tray from its downcomer widths (circle
 * geometry, exact), and each pass's liquid hydraulics (weir loading, crest, downcomer inlet velocity and
 * backup) from its share of the liquid.
 *
 * Geometry (derived, plane circle geometry): x runs across the tray in the flow direction from the
 * column axis, R the column radius. A chord at x is 2·sqrt(R² − x²) long; the area between chords at a
 * and b is F(b) − F(a) with F(x) = x·sqrt(R² − x²) + R²·asin(x/R). Downcomers are taken vertical, so
 * their top widths bound the pass panels (the bubbling area of each pass) on every tray, and a pass's
 * flow path runs from the inlet downcomer's wall to the outlet weir across its panel. The layout is
 * symmetric about the axis; the liquid split need not be.
 *
 * Two-pass: panels between the centre downcomer and each side downcomer. Four-pass: outer panels
 * between the side and off-centre downcomers, inner panels between the off-centre and centre ones.
 * Trays alternate: 'side' trays drain to the side downcomers (four-pass: and the centre one), 'inner'
 * trays to the centre downcomer (four-pass: the off-centre ones).
 */
import type { PassLayout, PassOutlets, SectionGeometry, TrayDetails } from '../../shared/types/rating.js';
import { crestOverWeirFrancis, weirLoadingVolumetric } from './weir.js';
import { clearLiquidHeightBennett } from './pressureDrop.js';
import { aeratedLiquidHeadFair } from './aeration.js';
import {
  apronHeadLoss,
  downcomerBackupClear,
  downcomerInletVelocity,
  downcomerResidenceTimeApparent,
  downcomerSealKister,
} from './downcomer.js';

/** Chord length [m] at distance x [m] from the centre of a circle of radius r [m]. Example: r 1, x 0.6 → 1.6. */
export function chordLength(radius_m: number, x_m: number): number {
  const h = radius_m * radius_m - x_m * x_m;
  return h > 0 ? 2 * Math.sqrt(h) : 0;
}

/** Area [m²] of the circle (radius r) between the chord lines at a and b (a ≤ b, both in [−r, r]). Example: r 1, −1 to 1 → π. */
export function areaBetweenChords(radius_m: number, a_m: number, b_m: number): number {
  const f = (x: number): number => {
    const c = Math.max(-radius_m, Math.min(radius_m, x));
    return c * Math.sqrt(radius_m * radius_m - c * c) + radius_m * radius_m * Math.asin(c / radius_m);
  };
  return f(b_m) - f(a_m);
}

/** What a downcomer of the layout is, for labels (0 side, 1 centre, 2 off-centre). */
export const DOWNCOMER_KINDS = ['side', 'centre', 'off-centre'] as const;

export interface PassDowncomer {
  kind: 0 | 1 | 2;
  /** top area [m²] */
  area: number;
  /** apron (discharge wall) length, every wall of it [m] */
  apronLength: number;
}

/** One pass of one kind of tray. */
export interface PassPanel {
  /** outlet weir length [m] */
  weirLength: number;
  /** inlet wall to outlet weir [m] */
  flowPathLength: number;
  /** the pass's share of the bubbling area (panel area over all panels) */
  areaFraction: number;
  /** index of the downcomer the pass drains into (PassTray.downcomers) */
  downcomer: number;
}

/** The passes of one kind of tray (odd- or even-numbered) and the downcomers they drain into. */
export interface PassTray {
  outlets: PassOutlets;
  /** total outlet weir length of this kind of tray, all passes [m] */
  weirLength: number;
  panels: PassPanel[];
  downcomers: PassDowncomer[];
}

/** Panel edges [m], across the tray: [inner or left edge, other edge] as signed x. */
function panelEdges(l: PassLayout, passes: 2 | 4, r: number): [number, number][] {
  const xs = r - l.sideDowncomerWidth_mm / 1000;
  const xc = l.centreDowncomerWidth_mm / 2000;
  if (passes === 2)
    return [
      [-xs, -xc],
      [xc, xs],
    ];
  const xo = (l.offCentreDowncomerOffset_mm ?? 0) / 1000;
  const wo = (l.offCentreDowncomerWidth_mm ?? 0) / 2000;
  return [
    [-xs, -(xo + wo)],
    [-(xo - wo), -xc],
    [xc, xo - wo],
    [xo + wo, xs],
  ];
}

/** The pass panels and downcomers of a tray whose passes drain to `outlets` (a geometry-only, per-section step). */
export function passTray(section: SectionGeometry, layout: PassLayout, outlets: PassOutlets): PassTray {
  const passes = section.passes === 4 ? 4 : 2;
  const r = section.columnDiameter_m / 2;
  const edges = panelEdges(layout, passes, r);
  const xs = r - layout.sideDowncomerWidth_mm / 1000;
  const xc = layout.centreDowncomerWidth_mm / 2000;
  const xo = (layout.offCentreDowncomerOffset_mm ?? 0) / 1000;
  const wo = (layout.offCentreDowncomerWidth_mm ?? 0) / 2000;
  const side: PassDowncomer = { kind: 0, area: areaBetweenChords(r, xs, r), apronLength: chordLength(r, xs) };
  const centre: PassDowncomer = { kind: 1, area: areaBetweenChords(r, -xc, xc), apronLength: 2 * chordLength(r, xc) };
  const off: PassDowncomer = {
    kind: 2,
    area: areaBetweenChords(r, xo - wo, xo + wo),
    apronLength: chordLength(r, xo - wo) + chordLength(r, xo + wo),
  };
  const areas = edges.map(([a, b]) => areaBetweenChords(r, a, b));
  const total = areas.reduce((s, a) => s + a, 0);
  const downcomers: PassDowncomer[] = [];
  const keys: string[] = [];
  const panels = edges.map(([a, b], i): PassPanel => {
    const outer = Math.max(Math.abs(a), Math.abs(b));
    const inner = Math.min(Math.abs(a), Math.abs(b));
    const left = b <= 0;
    const outerPass = passes === 2 || i === 0 || i === 3;
    // outlet weir position |x| and the downcomer behind it (one per shell side, the centre one shared)
    let outlet: number;
    let dc: PassDowncomer;
    let key: string;
    if (outlets === 'side') {
      outlet = outerPass ? outer : inner;
      dc = outerPass ? side : centre;
      key = outerPass ? (left ? 'sL' : 'sR') : 'c';
    } else if (passes === 2) {
      outlet = inner;
      dc = centre;
      key = 'c';
    } else {
      outlet = outerPass ? inner : outer;
      dc = off;
      key = left ? 'oL' : 'oR';
    }
    let d = keys.indexOf(key);
    if (d < 0) {
      d = downcomers.push({ ...dc }) - 1;
      keys.push(key);
    }
    return {
      weirLength: chordLength(r, outlet),
      flowPathLength: outer - inner,
      areaFraction: total > 0 ? areas[i]! / total : 0,
      downcomer: d,
    };
  });
  return { outlets, weirLength: panels.reduce((a, p) => a + p.weirLength, 0), panels, downcomers };
}

/** Both kinds of tray of a multipass section, the liquid split and the pass imbalance (per section). */
export interface PreparedPasses {
  odd: PassTray;
  even: PassTray;
  /** liquid fraction per pass, across the tray */
  split: number[];
  /** 100 × the largest |(liquid share / bubbling-area share) − 1| over the passes [%] */
  imbalance_percent: number;
}

/**
 * Pass imbalance: with the vapour shared by bubbling area (uniform vapour velocity over the deck), the
 * L/V ratio of a pass relative to the tray's is (liquid fraction)/(area fraction); the imbalance is the
 * largest departure from 1, in percent. Equal L/V in every pass is the aim of multipass design
 * ("Multipass flow distribution and mass transfer efficiency for distillation plates", AIChE J. 22(1),
 * 1976); the limit is common practice. Example: split 0.25 ×4, area fractions 0.22/0.28/0.28/0.22 → 13.6 %.
 */
export function passImbalancePercent(split: readonly number[], areaFractions: readonly number[]): number {
  let worst = 0;
  for (let i = 0; i < split.length; i++) {
    const a = areaFractions[i] ?? 0;
    const dev = a > 0 ? Math.abs(split[i]! / a - 1) : Infinity;
    if (dev > worst) worst = dev;
  }
  return 100 * worst;
}

export function preparePasses(section: SectionGeometry): PreparedPasses | undefined {
  const l = section.passLayout;
  if (!l || section.passes === 1) return undefined;
  const other: PassOutlets = l.oddTrayOutlets === 'side' ? 'inner' : 'side';
  const odd = passTray(section, l, l.oddTrayOutlets);
  const even = passTray(section, l, other);
  const split =
    l.liquidSplit && l.liquidSplit.length === section.passes
      ? l.liquidSplit.slice()
      : new Array<number>(section.passes).fill(1 / section.passes);
  return {
    odd,
    even,
    split,
    imbalance_percent: passImbalancePercent(
      split,
      odd.panels.map((p) => p.areaFraction),
    ),
  };
}

/** Detail keys of pass n (1-based), built once. */
const PASS_KEYS = [1, 2, 3, 4].map((n) => ({
  outlet: `pass${n}OutletDowncomer`,
  weirLength: `pass${n}WeirLength_m`,
  flowPath: `pass${n}FlowPathLength_m`,
  liquidFraction: `pass${n}LiquidFraction`,
  areaFraction: `pass${n}AreaFraction`,
  weirLoading: `pass${n}WeirLoading_m3_h_m`,
  crest: `pass${n}CrestOverWeir_mm`,
  clearLiquid: `pass${n}ClearLiquidHeight_mm`,
  trayHead: `pass${n}TrayHead_mm`,
  inletVelocity: `pass${n}DowncomerInletVelocity_m_s`,
  clearBackup: `pass${n}DowncomerClearBackup_mm`,
  backupPercent: `pass${n}DowncomerBackupPercent`,
}));

/** Detail keys written for every pass (n = 1…4), without the pass prefix: for clients listing them. */
export const PASS_DETAIL_FIELDS = Object.keys(PASS_KEYS[0]!) as (keyof (typeof PASS_KEYS)[number])[];

export interface PassLiquidInputs {
  /** tray's clear liquid flow [m³/s] */
  liquid_m3_s: number;
  /** dry head h_d [mm] (vapour shared by bubbling area: the same under every pass) */
  dryHead_mm: number;
  /** residual head h_σ [mm] (sieve trays; 0 on valve trays) */
  residualHead_mm: number;
  /** sieve tray (Bennett clear liquid) or valve tray (aerated liquid head β(h_w + h_ow)) */
  sieve: boolean;
  bubblingVelocity_m_s: number;
  vapourDensity: number;
  liquidDensity: number;
  /** valve trays: aeration factor β of the liquid on the tray [-] */
  liquidAerationFactor: number;
  weirHeight_mm: number;
  clearance_mm: number;
  traySpacing_mm: number;
  /** downcomer bottom area / top area of the section */
  bottomOverTop: number;
  aerationFactor: number;
}

/**
 * Liquid hydraulics of each pass of one tray, written into `details` (pass1WeirLength_m, …), and the
 * tray's weir loading, crest, downcomer inlet velocity, apron loss, backup, seal and residence time
 * replaced by those of its worst pass (the tray-level checks then judge the worst pass). Per pass i with
 * liquid q_i = split_i·Q_L: weir loading and Francis crest on its own outlet weir; per downcomer d
 * (fed by the passes draining into it, Q_d): inlet velocity Q_d/A_d, apron loss on
 * min(clearance × apron walls, bottom area), clear backup h_t,i + h_w + h_ow,i + h_da,d with the pass's own
 * tray head h_t,i = h_d + h_L,i (+ h_σ on sieve trays), h_L,i from the pass's liquid and outlet weir (the
 * tray below taken to load like this one, as for single-pass trays).
 */
export function passHydraulics(pp: PreparedPasses, tray: number, x: PassLiquidInputs, details: TrayDetails): void {
  const t = tray % 2 === 1 ? pp.odd : pp.even;
  const dcs = t.downcomers;
  const panels = t.panels;
  const qd = new Float64Array(dcs.length);
  for (let i = 0; i < panels.length; i++) qd[panels[i]!.downcomer]! += pp.split[i]! * x.liquid_m3_s;
  const hda = new Float64Array(dcs.length);
  let maxVelocity = 0;
  let maxHda = 0;
  let minResidence = Infinity;
  for (let d = 0; d < dcs.length; d++) {
    const dc = dcs[d]!;
    const bottom = dc.area * x.bottomOverTop;
    const apron = Math.min((x.clearance_mm / 1000) * dc.apronLength, bottom);
    hda[d] = apronHeadLoss(qd[d]!, apron);
    const v = downcomerInletVelocity(qd[d]!, dc.area);
    if (v > maxVelocity) maxVelocity = v;
    if (hda[d]! > maxHda) maxHda = hda[d]!;
    if (qd[d]! > 0) {
      const rt = downcomerResidenceTimeApparent(dc.area, bottom, x.traySpacing_mm, qd[d]!);
      if (rt < minResidence) minResidence = rt;
    }
  }
  let maxLoad = 0;
  let minCrest = Infinity;
  let maxClear = 0;
  let minClear = Infinity;
  for (let i = 0; i < panels.length; i++) {
    const p = panels[i]!;
    const k = PASS_KEYS[i]!;
    const q = pp.split[i]! * x.liquid_m3_s;
    const load = weirLoadingVolumetric(q, p.weirLength);
    const crest = crestOverWeirFrancis(q, p.weirLength);
    // the pass's own liquid on the tray, from its own liquid and outlet weir (Bennett on sieve trays,
    // β(h_w + h_ow) on valve trays), so the head behind its downcomer is its own
    let hL = 0;
    if (q > 0)
      hL = x.sieve
        ? clearLiquidHeightBennett(x.bubblingVelocity_m_s, x.vapourDensity, x.liquidDensity, x.weirHeight_mm, q, p.weirLength)
        : aeratedLiquidHeadFair(x.liquidAerationFactor, x.weirHeight_mm, crest);
    const head = x.dryHead_mm + hL + (q > 0 ? x.residualHead_mm : 0);
    const clear = downcomerBackupClear(head, x.weirHeight_mm, crest, hda[p.downcomer]!);
    details[k.outlet] = dcs[p.downcomer]!.kind;
    details[k.weirLength] = p.weirLength;
    details[k.flowPath] = p.flowPathLength;
    details[k.liquidFraction] = pp.split[i]!;
    details[k.areaFraction] = p.areaFraction;
    details[k.weirLoading] = load;
    details[k.crest] = crest;
    details[k.clearLiquid] = hL;
    details[k.trayHead] = head;
    details[k.inletVelocity] = downcomerInletVelocity(qd[p.downcomer]!, dcs[p.downcomer]!.area);
    details[k.clearBackup] = clear;
    details[k.backupPercent] = (100 * clear) / x.aerationFactor / (x.traySpacing_mm + x.weirHeight_mm);
    if (load > maxLoad) maxLoad = load;
    if (crest < minCrest) minCrest = crest;
    if (clear > maxClear) maxClear = clear;
    if (clear < minClear) minClear = clear;
  }
  details.passImbalance_percent = pp.imbalance_percent;
  details.weirLoading_m3_h_m = maxLoad;
  details.crestOverWeir_mm = minCrest;
  details.downcomerInletVelocity_m_s = maxVelocity;
  details.downcomerHeadLoss_mm = maxHda;
  details.downcomerClearBackup_mm = maxClear;
  details.downcomerAeratedBackup_mm = maxClear / x.aerationFactor;
  details.downcomerBackupPercent = (100 * maxClear) / x.aerationFactor / (x.traySpacing_mm + x.weirHeight_mm);
  details.downcomerSeal_mm = downcomerSealKister(minClear, x.clearance_mm);
  if (minResidence !== Infinity) details.downcomerResidenceTime_s = minResidence;
}

/**
 * Equivalent single-pass sizes of tray `tray` for straight limit lines (operating window): the worst
 * pass reaches a weir loading w at total liquid w·maxLoadingWeir_m, a crest at the loading for that crest
 * × minCrestWeir_m, and a downcomer inlet velocity v at v·inletArea_m2.
 */
export function passLimitSizes(
  pp: PreparedPasses,
  tray: number,
): { maxLoadingWeir_m: number; minCrestWeir_m: number; inletArea_m2: number } {
  const t = tray % 2 === 1 ? pp.odd : pp.even;
  let maxLoadingWeir = Infinity;
  let minCrestWeir = 0;
  const share = new Float64Array(t.downcomers.length);
  t.panels.forEach((p, i) => {
    const ratio = p.weirLength / pp.split[i]!;
    if (ratio < maxLoadingWeir) maxLoadingWeir = ratio;
    if (ratio > minCrestWeir) minCrestWeir = ratio;
    share[p.downcomer]! += pp.split[i]!;
  });
  let inletArea = Infinity;
  t.downcomers.forEach((d, i) => {
    if (share[i]! > 0) inletArea = Math.min(inletArea, d.area / share[i]!);
  });
  return { maxLoadingWeir_m: maxLoadingWeir, minCrestWeir_m: minCrestWeir, inletArea_m2: inletArea };
}
