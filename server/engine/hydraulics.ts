/**
 * Load-dependent hydraulics of one tray: composes the correlations (SI in, SI out) into the numbers
 * every check needs. Warnings go to `out` (pass null to skip them, e.g. inside solvers).
 */
import type { EngineWarning, TrayDetails, TrayLoad } from '../../shared/types/rating.js';
import type { PreparedSection } from './prepare.js';
import {
  fairFloodCapacityLygerosMagoulas,
  fairSurfaceTensionCorrection,
  floodVelocitySoudersBrown,
  highPressureSystemFactorKister,
  kisterHaasFloodCapacity,
  transitionClearLiquidHeightKisterHaas,
} from './flooding.js';
import { FAIR_ENTRAINMENT_DATA_SPAN, entrainedLiquidRate, fairEntrainmentOwnFit } from './entrainment.js';
import {
  clearLiquidHeightBennett,
  dryTrayHeadK,
  dryTrayHeadKleinValve,
  dryTrayHeadOrifice,
  headToPascal,
  kleinOpenBalanceVelocity,
  residualHeadBennett,
} from './pressureDrop.js';
import {
  eduljeeK2OwnFit,
  weepPointFixedValveFair,
  weepPointHoleVelocityEduljee,
  weepPointHoleVelocityFair,
  weepPointMovingValveClosedBalance,
} from './weeping.js';
import { crestOverWeirFrancis, weirLoadingVolumetric } from './weir.js';
import {
  apronHeadLoss,
  downcomerBackupClear,
  downcomerInletVelocity,
  downcomerResidenceTimeApparent,
  downcomerSealKister,
} from './downcomer.js';
import { passHydraulics } from './multipass.js';
import { aeratedLiquidHeadFair, aerationFactorFrothDensity, bubblingFFactor } from './aeration.js';
import { REPORT_CAP, S_PER_H, finiteOrCap, safeNumber } from './units.js';
import { WARNING_CODES, checkRange, formatNumber, warning } from './validity.js';

export interface Hydraulics {
  details: TrayDetails;
  percentFlood: number;
  floodMethod: string;
  weepRatio: number;
  weepMethod: string;
  dryMethod: string;
}

const FAIR = fairFloodCapacityLygerosMagoulas.meta;
const KH = kisterHaasFloodCapacity.meta;
const ENT = fairEntrainmentOwnFit.meta;
const K2 = eduljeeK2OwnFit.meta;
const SIGMA = fairSurfaceTensionCorrection.meta;
const SB = floodVelocitySoudersBrown.meta;
const APRON = apronHeadLoss.meta;
const BENNETT = clearLiquidHeightBennett.meta;
const BETA = aerationFactorFrothDensity.meta;
const FRANCIS = crestOverWeirFrancis.meta;
const ENT_RATE = entrainedLiquidRate.meta;
/** surface tension above which some presentations of Kister & Haas use this value instead [mN/m] */
const KH_SIGMA_NOTE = 25;
const [ENT_LO, ENT_HI] = FAIR_ENTRAINMENT_DATA_SPAN;

function allFinite(d: TrayDetails): boolean {
  let sum = 0; // a non-finite entry makes the sum non-finite (so does overflow: then the loop below is a no-op)
  for (const k in d) sum += d[k]!;
  return Number.isFinite(sum);
}

export function trayHydraulics(p: PreparedSection, load: TrayLoad, out: EngineWarning[] | null): Hydraulics {
  const tray = load.tray;
  const rhoV = load.vapourDensity_kg_m3;
  const rhoL = load.liquidDensity_kg_m3;
  const sigma = load.surfaceTension_mN_m;
  const V = load.vapourMassFlow_kg_h / S_PER_H;
  const L = load.liquidMassFlow_kg_h / S_PER_H;
  const qV = V / rhoV;
  const qL = L / rhoL;
  const uN = qV / p.netArea;
  const uA = qV / p.activeArea;
  const uH = qV / p.holeArea;
  const flv = V > 0 ? (L / (V * p.passes)) * Math.sqrt(rhoV / rhoL) : 0;

  // Jet flood: Fair (always, reported beside the chosen method) and Kister & Haas.
  // Outside the chart the conservative side is taken: below F_LV 0.01 the value at the edge (the fit
  // rises towards low F_LV), above 1 the fit's own trend (it keeps falling; the edge value would be up
  // to 28 % higher). Either way the lower capacity, and a warning.
  const flvChart = flv < 0.01 ? 0.01 : flv;
  if (out && V > 0) {
    checkRange(
      out,
      FAIR,
      'flowParameter',
      flv,
      tray,
      flv < 0.01
        ? `capacity factor evaluated at the chart edge ${flvChart}`
        : "capacity factor extrapolated along the fit's trend (lower than at the chart edge F_LV 1: conservative)",
    );
    checkRange(out, SIGMA, 'surfaceTension_mN_m', sigma, tray);
    checkRange(out, SB, 'vapourToLiquidDensityRatio', rhoV / rhoL, tray);
  }
  const cFair =
    fairFloodCapacityLygerosMagoulas(flvChart, p.traySpacing_mm) *
    p.holeAreaCorrection *
    fairSurfaceTensionCorrection(sigma) *
    p.systemFactor;
  const uFloodFair = floodVelocitySoudersBrown(cFair, rhoL, rhoV);
  const pctFair = uN > 0 ? (100 * uN) / uFloodFair : 0;
  // The tray's outlet weir, all passes: with a pass layout, this kind of tray's own weirs (side and centre
  // weirs differ on a two-pass tray), else the entered total. Kister & Haas' liquid load is the tray's
  // liquid over it, taken per kind of tray as in Kister's two-pass example (Distillation Design 1992 §6.5:
  // centre-to-side and side-to-centre trays checked apart); Fair's F_LV divides L/V by the passes (Perry
  // 8th ed.). Both are tray averages; the per-pass liquid goes to the weir and downcomer checks.
  const pl = p.passLayout;
  const weirLength = pl ? (tray % 2 === 1 ? pl.odd : pl.even).weirLength : p.weirLength;
  const weirLoad = weirLoadingVolumetric(qL, weirLength);
  const qKH = weirLoad < 3 ? 3 : weirLoad;
  const hct = transitionClearLiquidHeightKisterHaas(p.holeDiameter_mm, p.openAreaRatio, qKH, rhoL);
  const cKH = kisterHaasFloodCapacity(p.holeDiameter_mm, sigma, rhoL, rhoV, p.traySpacing_mm, hct) * p.systemFactor;
  const uFloodKH = floodVelocitySoudersBrown(cKH, rhoL, rhoV);
  const pctKH = uN > 0 ? (100 * uN) / uFloodKH : 0;
  const useKH = p.jetMethod === 'kister-haas';
  if (out && useKH) {
    checkRange(
      out,
      KH,
      'weirLoad_m3_h_m',
      weirLoad,
      tray,
      weirLoad < 3 ? 'evaluated at 3 m³/(h·m) (conservative)' : 'value extrapolated',
    );
    checkRange(out, KH, 'vapourDensity_kg_m3', rhoV, tray);
    checkRange(out, KH, 'liquidDensity_kg_m3', rhoL, tray);
    checkRange(out, KH, 'surfaceTension_mN_m', sigma, tray);
    if (sigma > KH_SIGMA_NOTE)
      out.push(
        warning(
          WARNING_CODES.kisterHaasSurfaceTension,
          `Kister & Haas: surface tension ${formatNumber(sigma)} mN/m is above ${KH_SIGMA_NOTE} mN/m; some presentations of the correlation use ${KH_SIGMA_NOTE} mN/m above this value, which gives a lower capacity. Rated with the value given.`,
          tray,
        ),
      );
    if (load.pressure_kPa !== undefined) checkRange(out, KH, 'pressure_kPa', load.pressure_kPa, tray);
    if (load.liquidViscosity_mPa_s !== undefined) checkRange(out, KH, 'liquidViscosity_mPa_s', load.liquidViscosity_mPa_s, tray);
  }
  const pctFlood = useKH ? pctKH : pctFair;

  // Entrainment (Fair chart, own fit) on the percent flood of the method chosen for jet flood, so flood
  // and entrainment share one basis. No liquid, no entrainment; past flood the check does not apply.
  const flvEnt = flv < ENT_LO ? ENT_LO : flv > ENT_HI ? ENT_HI : flv;
  if (out && V > 0 && L > 0 && pctFlood < 100) {
    checkRange(out, ENT, 'flowParameter', flv, tray, `evaluated at ${flvEnt}${flv > ENT_HI ? ' (overstates entrainment)' : ''}`);
    checkRange(
      out,
      ENT,
      'percentFlood',
      pctFlood,
      tray,
      pctFlood < 30 ? 'psi taken proportional to percent flood below the lowest chart curve' : 'fit extrapolated',
    );
  }
  const psi = L > 0 ? fairEntrainmentOwnFit(flvEnt, pctFlood / 100) : 0;
  const entrained = entrainedLiquidRate(psi, load.liquidMassFlow_kg_h);
  if (out && psi > 0.999)
    checkRange(
      out,
      ENT_RATE,
      'psi',
      psi,
      tray,
      'entrained liquid computed at 0.999 (the rate grows without bound as the fraction approaches 1)',
    );

  // Pressure drop.
  let hd: number;
  let dryMethod: string;
  let balanceHead = 0;
  if (p.trayType === 'sieve') {
    hd = dryTrayHeadOrifice(uH, p.orificeCoefficient, rhoV, rhoL);
    dryMethod = dryTrayHeadOrifice.meta.id;
  } else if (p.trayType === 'fixed-valve') {
    hd = dryTrayHeadK(uH, p.dryK, rhoV, rhoL);
    dryMethod = dryTrayHeadK.meta.id;
  } else {
    balanceHead = p.balanceNumerator / rhoL;
    hd = dryTrayHeadKleinValve(uH, rhoV, rhoL, p.closedK, p.dryK, balanceHead);
    dryMethod = dryTrayHeadKleinValve.meta.id;
  }
  // Weir.
  const crest = crestOverWeirFrancis(qL, weirLength);
  // Francis' range (crest 6 mm to the crest at 13 gpm/in): the low-crest warning and the weir-loading check
  // cover it at the default limits; with limits relaxed past it, the range warning says so.
  if (out && L > 0 && crest >= p.limits.liquidLoad && weirLoad <= p.limits.weirLoading)
    checkRange(out, FRANCIS, 'crest_mm', crest, tray, 'crest reported as computed');

  // Liquid on the tray. A dry tray (no liquid) holds none and forms no bubbles: its pressure drop is the dry drop.
  // Sieve trays: Bennett et al. clear liquid and residual head (froth regime). Valve trays: Fair's aerated
  // liquid head β(h_w + h_ow) as printed for valve trays (Perry 8th ed. eq. 14-106), no separate residual head.
  const sieve = p.trayType === 'sieve';
  const beta = sieve ? 0 : aerationFactorFrothDensity(uA, rhoV, rhoL);
  let hL = 0;
  let hSigma = 0;
  if (L > 0 && sieve) {
    hL = clearLiquidHeightBennett(uA, rhoV, rhoL, p.weirHeight_mm, qL, weirLength);
    hSigma = residualHeadBennett(sigma, rhoL, p.holeDiameter_mm);
    // Bennett is a froth-regime correlation: warn in the spray regime (clear liquid below h_ct)
    if (out && V > 0)
      checkRange(
        out,
        BENNETT,
        'transitionOverClearLiquid',
        hct / hL,
        tray,
        'spray regime: the froth-regime clear liquid height and residual head are extrapolated',
      );
  } else if (L > 0) {
    hL = aeratedLiquidHeadFair(beta, p.weirHeight_mm, crest);
    if (out)
      checkRange(
        out,
        BETA,
        'fFactorBubbling_Pa05',
        bubblingFFactor(uA, rhoV),
        tray,
        "aeration factor extrapolated beyond Fair's chart",
      );
  }
  const hT = hd + hL + hSigma;

  // Weeping, by tray type (weeping.ts WEEP_METHODS): moving valves, the closed balance point (valves start
  // to open); fixed valves, Fair's criterion with the valves taken as open; sieve trays, the higher of Fair's
  // criterion and Eduljee.
  let uWeep: number;
  let weepMethod: string;
  let uEdu = 0;
  let uFairWeep = 0;
  let uValvesOpen = 0;
  if (p.trayType === 'moving-valve') {
    const v = p.valves;
    uWeep = weepPointMovingValveClosedBalance({
      legFactor: v.legFactor,
      valveThickness_mm: v.valveThickness_mm,
      metalDensity: v.materialDensity_kg_m3,
      closedK: p.closedK,
      vapourDensity: rhoV,
      eddyLossCoefficient: p.eddyLossCoefficient,
    });
    weepMethod = weepPointMovingValveClosedBalance.meta.id;
    uValvesOpen = kleinOpenBalanceVelocity(uWeep, p.closedK, p.dryK);
  } else {
    const fairInput = {
      dryK: p.dryK,
      holeAreaRatio: p.holeAreaRatio,
      vapourDensity: rhoV,
      liquidDensity: rhoL,
      weirHeight_mm: p.weirHeight_mm,
      liquid_m3_s: qL,
      weirLength_m: weirLength,
      residualHead_mm: sieve ? hSigma : L > 0 ? residualHeadBennett(sigma, rhoL, p.holeDiameter_mm) : 0,
    };
    if (sieve) {
      uFairWeep = weepPointHoleVelocityFair(fairInput);
      uWeep = uFairWeep;
      weepMethod = weepPointHoleVelocityFair.meta.id;
      const head = p.weirHeight_mm + crest;
      if (out) checkRange(out, K2, 'headAboveDeck_mm', head, tray);
      uEdu = weepPointHoleVelocityEduljee(eduljeeK2OwnFit(head), p.holeDiameter_mm, rhoV);
      if (uEdu > uWeep) {
        uWeep = uEdu;
        weepMethod = weepPointHoleVelocityEduljee.meta.id;
      }
    } else {
      uFairWeep = weepPointFixedValveFair(fairInput);
      uWeep = uFairWeep;
      weepMethod = weepPointFixedValveFair.meta.id;
    }
  }
  const weepRatio = uWeep > 0 ? uH / uWeep : REPORT_CAP;

  // Downcomer.
  const hda = apronHeadLoss(qL, p.apronArea);
  if (out && L > 0) checkRange(out, APRON, 'underflowVelocity_m_s', qL / p.apronArea, tray);
  const clear = L > 0 ? downcomerBackupClear(hT, p.weirHeight_mm, crest, hda) : 0;
  const aerated = clear / p.limits.aerationFactor;
  const residence =
    qL > 0 ? downcomerResidenceTimeApparent(p.downcomerTopArea, p.downcomerBottomArea, p.traySpacing_mm, qL) : REPORT_CAP;

  if (out) {
    if (L === 0)
      out.push(
        warning(
          WARNING_CODES.dryTray,
          'no liquid: the tray is dry; entrainment, weeping, weir and downcomer checks do not apply.',
          tray,
        ),
      );
    else if (crest < p.limits.liquidLoad)
      out.push(
        warning(
          WARNING_CODES.lowCrest,
          `crest over the weir ${formatNumber(crest)} mm is below ${p.limits.liquidLoad} mm: risk of drying out and liquid maldistribution; consider a picket-fence (notched) weir.`,
          tray,
        ),
      );
    if (V === 0)
      out.push(warning(WARNING_CODES.noVapour, 'zero vapour: the tray dumps its liquid through the deck (weeping).', tray));
    if (pctFlood >= 100 && L > 0)
      out.push(
        warning(
          WARNING_CODES.beyondFlood,
          `the tray is flooded (${formatNumber(pctFlood)} % of jet flood): entrainment is not rated past flood and the other correlations are extrapolated.`,
          tray,
        ),
      );
    // Kister (1992) §6.5 applied no high-pressure derating with Fair's correlation: its (σ/20)^0.2 term
    // already derates the low-surface-tension systems of high pressure. Warn where that does not apply.
    if (p.systemFactor === 1 && rhoV > 28.8 && (useKH || sigma >= 20))
      out.push(
        warning(
          WARNING_CODES.highPressureDerating,
          `vapour density ${formatNumber(rhoV)} kg/m³ > 28.8: Kister (1992) Table 6.7 suggests a system factor of ${formatNumber(highPressureSystemFactorKister(rhoV))}.`,
          tray,
        ),
      );
  }

  const details: TrayDetails = {
    flowParameter: finiteOrCap(flv),
    capacityFactor_m_s: uN * Math.sqrt(rhoV / (rhoL - rhoV)),
    fFactor_Pa05: uN * Math.sqrt(rhoV),
    netAreaVelocity_m_s: uN,
    floodVelocity_m_s: useKH ? uFloodKH : uFloodFair,
    floodCapacityFactor_m_s: useKH ? cKH : cFair,
    percentFloodFair: pctFair,
    percentFloodKisterHaas: pctKH,
    bubblingAreaVelocity_m_s: uA,
    holeVelocity_m_s: uH,
    weepPointHoleVelocity_m_s: uWeep,
    weepPointEduljee_m_s: uEdu,
    weepPointFair_m_s: uFairWeep,
    valvesStartOpenVelocity_m_s: p.trayType === 'moving-valve' ? uWeep : 0,
    valvesAllOpenVelocity_m_s: uValvesOpen,
    valvePartlyOpenDryHead_mm: balanceHead,
    turndownRatio: weepRatio,
    orificeCoefficient: p.orificeCoefficient,
    dryPressureDrop_mm: hd,
    clearLiquidHeight_mm: hL,
    aerationFactor: beta,
    residualHead_mm: hSigma,
    totalHead_mm: hT,
    crestOverWeir_mm: crest,
    weirLoading_m3_h_m: weirLoad,
    downcomerInletVelocity_m_s: downcomerInletVelocity(qL, p.downcomerTopArea),
    downcomerHeadLoss_mm: hda,
    downcomerClearBackup_mm: clear,
    downcomerAeratedBackup_mm: aerated,
    downcomerBackupPercent: (100 * aerated) / (p.traySpacing_mm + p.weirHeight_mm),
    downcomerSeal_mm: downcomerSealKister(clear, p.clearance_mm),
    downcomerResidenceTime_s: residence,
    entrainmentFraction: psi,
    entrainedLiquid_kg_h: entrained,
    totalPressureDrop_Pa: headToPascal(hT, rhoL),
  };
  if (p.passLayout) {
    passHydraulics(
      p.passLayout,
      tray,
      {
        liquid_m3_s: qL,
        dryHead_mm: hd,
        residualHead_mm: hSigma,
        sieve,
        bubblingVelocity_m_s: uA,
        vapourDensity: rhoV,
        liquidDensity: rhoL,
        liquidAerationFactor: beta,
        weirHeight_mm: p.weirHeight_mm,
        clearance_mm: p.clearance_mm,
        traySpacing_mm: p.traySpacing_mm,
        bottomOverTop: p.downcomerBottomArea / p.downcomerTopArea,
        aerationFactor: p.limits.aerationFactor,
      },
      details,
    );
  }
  // Safety net: every reported number finite (extreme but schema-valid inputs can overflow a power law).
  if (!allFinite(details)) for (const k in details) details[k] = safeNumber(details[k]!);
  return { details, percentFlood: pctFlood, floodMethod: useKH ? KH.id : FAIR.id, weepRatio, weepMethod, dryMethod };
}
