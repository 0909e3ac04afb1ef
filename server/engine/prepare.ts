/**
 * Per-section preparation: everything that depends only on the geometry and the method options is
 * computed once per section (areas, orifice coefficients, limits, geometry warnings), so that rating a
 * tray only does the load-dependent work.
 */
import type {
  EngineWarning,
  FoamingClass,
  JetFloodMethod,
  MethodOptions,
  SectionGeometry,
  TrayType,
  ValveData,
} from '../../shared/types/rating.js';
import { fairFloodCapacityLygerosMagoulas, fairHoleAreaCorrection, kisterHaasFloodCapacity } from './flooding.js';
import {
  clearLiquidHeightBennett,
  kleinClosedValveK,
  kleinEddyLossCoefficient,
  kleinOpenValveK,
  orificeCoefficientHughmarkOConnell,
} from './pressureDrop.js';
import { weepPointHoleVelocityEduljee, weepPointHoleVelocityFair } from './weeping.js';
import { resolveLimits, type ResolvedLimits } from './limits.js';
import { WARNING_CODES, checkRange, checkTrayType, formatNumber, warning } from './validity.js';
import { preparePasses, type PassTray, type PreparedPasses } from './multipass.js';
import { MIN_FLOW_PATH_M, passesWarning } from '../../shared/passes.js';

export interface PreparedSection {
  readonly section: SectionGeometry;
  readonly trayType: TrayType;
  readonly passes: number;
  /** two- and four-pass trays with a pass layout: pass panels, downcomers and liquid split */
  readonly passLayout: PreparedPasses | undefined;
  readonly jetMethod: JetFloodMethod;
  readonly traySpacing_mm: number;
  readonly weirHeight_mm: number;
  readonly clearance_mm: number;
  readonly holeDiameter_mm: number;
  readonly netArea: number;
  readonly activeArea: number;
  readonly holeArea: number;
  readonly holeAreaRatio: number;
  /**
   * fractional open area A_f of the flood correlations (Fair's hole-area correction, Kister & Haas):
   * hole area / bubbling area for sieve trays, open slot (curtain) area / bubbling area for valve trays
   * (Perry's 8th ed. Sec. 14 definition); the orifice area when a valve tray has no slot area (warned)
   */
  readonly openAreaRatio: number;
  readonly downcomerTopArea: number;
  readonly downcomerBottomArea: number;
  readonly apronArea: number;
  readonly weirLength: number;
  readonly systemFactor: number;
  readonly foaming: FoamingClass;
  readonly holeAreaCorrection: number;
  /** sieve: fitted or given C_v; valves: equivalent sqrt(50.8/K_open) */
  readonly orificeCoefficient: number;
  /** dry-head coefficient K = h_d/(u_h² ρV/ρL) [s²·mm/m²] for sieve and fixed valves (open K for moving valves) */
  readonly dryK: number;
  readonly closedK: number;
  /** C_vw R_vw t_v ρ_M (moving valves; divide by ρL for the partly-open dry head in mm) */
  readonly balanceNumerator: number;
  /** Klein's eddy loss coefficient C_vw (moving valves; 0 otherwise) */
  readonly eddyLossCoefficient: number;
  /** moving-valve data (a zero placeholder for other tray types) */
  readonly valves: ValveData;
  readonly limits: ResolvedLimits;
  readonly nearPercent: number;
  readonly sectionWarnings: readonly EngineWarning[];
}

const NO_VALVES: ValveData = Object.freeze({
  count: 0,
  orificeDiameter_mm: 0,
  valveThickness_mm: 0,
  materialDensity_kg_m3: 0,
  legFactor: 1,
  orificeShape: 'flat',
});

export function prepareSection(section: SectionGeometry, methods: MethodOptions | undefined): PreparedSection {
  const w: EngineWarning[] = [];
  const foaming = section.foaming ?? 'moderate';
  const systemFactor = section.systemFactor ?? 1;
  const jetMethod = methods?.jetFlood ?? 'fair';
  const limits = resolveLimits(foaming, methods);
  const ts = section.traySpacing_mm;
  const colArea = (Math.PI / 4) * section.columnDiameter_m * section.columnDiameter_m;
  const holeAreaRatio = section.holeArea_m2 / section.activeArea_m2;
  const valveTray = section.trayType !== 'sieve';
  const openAreaRatio =
    valveTray && section.slotArea_m2 !== undefined ? section.slotArea_m2 / section.activeArea_m2 : holeAreaRatio;
  // The weep point of fixed valves (weepPointFixedValveFair, common practice) is Fair's sieve-tray criterion,
  // which compares with Bennett's clear liquid (also a sieve-tray correlation): both are said, once per section
  if (section.trayType === 'fixed-valve') {
    checkTrayType(
      w,
      weepPointHoleVelocityFair.meta,
      section.trayType,
      'for the weep point, with the valves taken as permanently open (no published fixed-valve weep correlation is used; the weep margin is an indication only)',
    );
    checkTrayType(
      w,
      clearLiquidHeightBennett.meta,
      section.trayType,
      "in Fair's weep criterion (weep point of the fixed valves)",
    );
  }
  if (valveTray && section.slotArea_m2 === undefined) {
    w.push(
      warning(
        WARNING_CODES.valveSlotAreaMissing,
        "valve tray without its open slot area: the fractional open area of Fair's hole-area correction and of Kister & Haas is taken from the orifice area; Perry's 8th ed. defines it with the slot (curtain) area of the valves fully open. Enter the slot area for a rating on that basis.",
      ),
    );
  }
  const tOverD = section.deckThickness_mm / section.holeDiameter_mm;

  const fair = fairFloodCapacityLygerosMagoulas.meta;
  checkRange(w, fair, 'traySpacing_mm', ts, undefined);
  checkRange(w, fair, 'holeAreaRatio', openAreaRatio, undefined, 'hole-area correction extrapolated below 0.06');
  checkRange(
    w,
    fair,
    'weirHeightOverTraySpacing',
    section.weirHeight_mm / ts,
    undefined,
    'Fair assumes weir height < 15 % of tray spacing',
  );
  if (section.trayType === 'sieve')
    checkRange(w, fair, 'holeDiameter_mm', section.holeDiameter_mm, undefined, 'no hole-size correction applied');
  if (jetMethod === 'kister-haas') {
    const kh = kisterHaasFloodCapacity.meta;
    checkRange(w, kh, 'traySpacing_mm', ts, undefined);
    checkRange(w, kh, 'holeDiameter_mm', section.holeDiameter_mm, undefined);
    checkRange(w, kh, 'fractionalHoleArea', openAreaRatio, undefined);
    checkRange(w, kh, 'weirHeight_mm', section.weirHeight_mm, undefined);
    if (section.trayType !== 'sieve')
      w.push(
        warning(
          WARNING_CODES.kisterHaasValveTray,
          "Kister & Haas applied to a valve tray: Perry's 8th ed. presents eq. 14-81 for sieve trays; hole diameter and open area are taken from the valve orifices.",
        ),
      );
  }

  let orificeCoefficient: number;
  let dryK: number;
  let closedK = 0;
  let balanceNumerator = 0;
  let eddyLossCoefficient = 0;
  if (section.trayType === 'sieve') {
    if (section.orificeCoefficient !== undefined) {
      orificeCoefficient = section.orificeCoefficient;
    } else {
      const hoc = orificeCoefficientHughmarkOConnell.meta;
      checkRange(w, hoc, 'holeAreaRatio', holeAreaRatio, undefined);
      checkRange(w, hoc, 'thicknessOverDiameter', tOverD, undefined);
      orificeCoefficient = orificeCoefficientHughmarkOConnell(holeAreaRatio, tOverD);
    }
    dryK = 50.8 / (orificeCoefficient * orificeCoefficient);
    checkRange(w, weepPointHoleVelocityEduljee.meta, 'holeDiameter_mm', section.holeDiameter_mm, undefined);
  } else {
    const shape = section.valves?.orificeShape ?? 'flat';
    if (shape === 'flat')
      checkRange(
        w,
        kleinOpenValveK.meta,
        'deckThickness_mm',
        section.deckThickness_mm,
        undefined,
        'K held at the nearest table row',
      );
    dryK = kleinOpenValveK(shape, section.deckThickness_mm);
    orificeCoefficient = Math.sqrt(50.8 / dryK);
    if (section.trayType === 'moving-valve') {
      const v = section.valves;
      if (!v) throw new Error('section.valves is required for moving-valve trays');
      closedK = kleinClosedValveK(v.orificeShape);
      eddyLossCoefficient = kleinEddyLossCoefficient(v.orificeShape);
      balanceNumerator = eddyLossCoefficient * v.legFactor * v.valveThickness_mm * v.materialDensity_kg_m3;
    }
  }
  const v = section.valves;
  if (v && section.trayType !== 'sieve') {
    const orifices = v.count * (Math.PI / 4) * (v.orificeDiameter_mm / 1000) ** 2;
    if (Math.abs(orifices / section.holeArea_m2 - 1) > 0.25) {
      w.push(
        warning(
          WARNING_CODES.valveAreaMismatch,
          `valve count × orifice area (${formatNumber(orifices)} m²) differs from holeArea_m2 (${formatNumber(section.holeArea_m2)} m²) by more than 25 %; holeArea_m2 is used.`,
        ),
      );
    }
  }
  if ((foaming === 'high' || foaming === 'very-high') && systemFactor >= 1) {
    w.push(
      warning(
        WARNING_CODES.foamingDerating,
        `foaming class '${foaming}' with system factor ${systemFactor}: Fair's and Kister & Haas' flood correlations assume low- or non-foaming systems; consider a system factor below 1 (Kister 1992 Table 6.7).`,
      ),
    );
  }
  if (section.downcomerBottomArea_m2 > section.downcomerTopArea_m2 * 1.001) {
    w.push(
      warning(WARNING_CODES.downcomerBottomLarger, 'downcomer bottom area exceeds its top area; check the downcomer geometry.'),
    );
  }
  const passLayout = preparePasses(section);
  passWarnings(w, section, passLayout, limits.passImbalance);
  const apron = Math.min((section.downcomerClearance_mm / 1000) * section.outletWeirLength_m, section.downcomerBottomArea_m2);
  return {
    section,
    trayType: section.trayType,
    passes: section.passes,
    passLayout,
    jetMethod,
    traySpacing_mm: ts,
    weirHeight_mm: section.weirHeight_mm,
    clearance_mm: section.downcomerClearance_mm,
    holeDiameter_mm: section.holeDiameter_mm,
    netArea: colArea - section.downcomerTopArea_m2,
    activeArea: section.activeArea_m2,
    holeArea: section.holeArea_m2,
    holeAreaRatio,
    openAreaRatio,
    downcomerTopArea: section.downcomerTopArea_m2,
    downcomerBottomArea: section.downcomerBottomArea_m2,
    apronArea: apron,
    weirLength: section.outletWeirLength_m,
    systemFactor,
    foaming,
    holeAreaCorrection: fairHoleAreaCorrection(openAreaRatio),
    orificeCoefficient,
    dryK,
    closedK,
    balanceNumerator,
    eddyLossCoefficient,
    valves: section.valves ?? NO_VALVES,
    limits,
    nearPercent: 100 * limits.nearFraction,
    sectionWarnings: w,
  };
}

/** Section warnings of a multipass tray: passes for the diameter, short flow paths, imbalance, layout against the totals. */
function passWarnings(w: EngineWarning[], s: SectionGeometry, pp: PreparedPasses | undefined, imbalanceLimit: number): void {
  const forDiameter = passesWarning(s.passes, s.columnDiameter_m);
  if (forDiameter) w.push(warning(WARNING_CODES.passesForDiameter, `${forDiameter}.`));
  if (!pp) return;
  const shortest = Math.min(...pp.odd.panels.map((p) => p.flowPathLength));
  if (shortest < MIN_FLOW_PATH_M) {
    w.push(
      warning(
        WARNING_CODES.passFlowPathShort,
        `shortest flow path ${formatNumber(shortest * 1000)} mm is under about ${MIN_FLOW_PATH_M * 1000} mm (Kister, Distillation Design, 1992, §6.5): consider fewer passes.`,
      ),
    );
  }
  if (pp.imbalance_percent > imbalanceLimit + 1e-9) {
    // 0.55/0.5 − 1 is 10.000000000000009 % in doubles
    w.push(
      warning(
        WARNING_CODES.passImbalance,
        `pass L/V imbalance ${formatNumber(pp.imbalance_percent)} % exceeds ${imbalanceLimit} % (vapour shared by bubbling area): the liquid split does not match the pass areas, which costs efficiency and loads one pass early.`,
      ),
    );
  }
  const mismatch: string[] = [];
  const nameOf = (t: PassTray): string => (t.outlets === 'side' ? 'trays draining to the side downcomers' : 'the other trays');
  for (const t of [pp.odd, pp.even]) {
    const area = t.downcomers.reduce((a, d) => a + d.area, 0);
    if (Math.abs(area / s.downcomerTopArea_m2 - 1) > 0.1)
      mismatch.push(
        `downcomer top area ${formatNumber(area)} m² for ${nameOf(t)} (entered ${formatNumber(s.downcomerTopArea_m2)} m²)`,
      );
  }
  // the two kinds of tray of a multipass layout have different outlet weirs (a two-pass tray's two side weirs
  // are shorter than the centre downcomer's two); the entered total should lie within 10 % of their span
  const weirs = [pp.odd.weirLength, pp.even.weirLength];
  if (s.outletWeirLength_m < 0.9 * Math.min(...weirs) || s.outletWeirLength_m > 1.1 * Math.max(...weirs))
    mismatch.push(
      `outlet weir lengths ${formatNumber(pp.odd.weirLength)} m for ${nameOf(pp.odd)} and ${formatNumber(pp.even.weirLength)} m for ${nameOf(pp.even)} (entered ${formatNumber(s.outletWeirLength_m)} m)`,
    );
  if (mismatch.length > 0) {
    w.push(
      warning(
        WARNING_CODES.passLayoutMismatch,
        `the pass layout gives ${mismatch.join('; ')}, more than 10 % from the section totals: check the layout against the tray drawing (per-pass results, the weirs of each tray and its liquid use the layout).`,
      ),
    );
  }
}
