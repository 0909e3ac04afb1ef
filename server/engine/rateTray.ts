/** Rate one tray: hydraulics → one CheckResult per check name → controlling check. */
import { CHECK_NAMES } from '../../shared/types/rating.js';
import type {
  CheckName,
  CheckResult,
  EngineWarning,
  MethodOptions,
  SectionGeometry,
  TrayLoad,
  TrayResult,
} from '../../shared/types/rating.js';
import { prepareSection, type PreparedSection } from './prepare.js';
import { trayHydraulics } from './hydraulics.js';
import { makeCheck, notApplicable } from './checks.js';
import { headToPascal } from './pressureDrop.js';
import { weirLoadingVolumetric, crestOverWeirFrancis } from './weir.js';
import { fairEntrainmentOwnFit } from './entrainment.js';
import {
  downcomerBackupClear,
  downcomerInletVelocity,
  downcomerResidenceTimeApparent,
  downcomerSealKister,
} from './downcomer.js';
import { WARNING_CODES, formatNumber, warning } from './validity.js';
import { FLOOD_PERCENT } from '../../shared/verdict.js';
import { WEIR_LOADING_SENSE } from '../../shared/studyWatched.js';

const M_ENT = fairEntrainmentOwnFit.meta.id;
const M_WEIR = weirLoadingVolumetric.meta.id;
const M_CREST = crestOverWeirFrancis.meta.id;
const M_DC = downcomerBackupClear.meta.id;
const M_DCV = downcomerInletVelocity.meta.id;
const M_RT = downcomerResidenceTimeApparent.meta.id;
const M_SEAL = downcomerSealKister.meta.id;
/** checks that need liquid on the tray: not applicable to a dry tray */
const LIQUID_SIDE: readonly CheckName[] = [
  'entrainment',
  'weeping',
  'weirLoading',
  'liquidLoad',
  'downcomerBackup',
  'downcomerInletVelocity',
  'downcomerResidenceTime',
  'downcomerSeal',
];

/** Pressure-drop limit [Pa] for a tray: the override, or 10 in (vacuum: 3 in) of its liquid. */
function pressureDropLimitPa(p: PreparedSection, load: TrayLoad): number {
  if (p.limits.pressureDropPa !== undefined) return p.limits.pressureDropPa;
  const vacuum = load.pressure_kPa !== undefined && load.pressure_kPa < 100;
  return headToPascal(vacuum ? p.limits.pressureDropVacuum_mm : p.limits.pressureDrop_mm, load.liquidDensity_kg_m3);
}

/** Rate one tray of a prepared section (the hot path used by rateSection). */
export function rateTrayPrepared(p: PreparedSection, load: TrayLoad): TrayResult {
  const warnings: EngineWarning[] = p.sectionWarnings.length > 0 ? p.sectionWarnings.slice() : [];
  const h = trayHydraulics(p, load, warnings);
  const d = h.details;
  const lim = p.limits;
  const near = p.nearPercent;
  // Verdict basis: a tray without liquid is dry (its liquid-side checks do not apply); at or past 100 % of
  // jet flood (chosen method) it is flooded, and the entrainment chart, drawn up to flood, does not apply.
  const dry = !(load.liquidMassFlow_kg_h > 0);
  const flooded = !dry && h.percentFlood >= FLOOD_PERCENT;
  const sealApplies = p.clearance_mm > p.weirHeight_mm;
  const sealLimit = sealApplies ? lim.downcomerSeal : 0;
  const checks: Record<CheckName, CheckResult> = {
    jetFlood: makeCheck(h.percentFlood, '%', lim.jetFlood, 'max', h.floodMethod, near),
    entrainment: makeCheck(d.entrainmentFraction, 'kg/kg', lim.entrainment, 'max', M_ENT, near),
    weeping: makeCheck(h.weepRatio, '-', lim.weeping, 'min', h.weepMethod, near),
    pressureDrop: makeCheck(d.totalPressureDrop_Pa, 'Pa', pressureDropLimitPa(p, load), 'max', h.dryMethod, near),
    weirLoading: makeCheck(d.weirLoading_m3_h_m, 'm3/(h m)', lim.weirLoading, WEIR_LOADING_SENSE, M_WEIR, near),
    liquidLoad: makeCheck(d.crestOverWeir_mm, 'mm', lim.liquidLoad, 'min', M_CREST, near),
    downcomerBackup: makeCheck(d.downcomerBackupPercent!, '% of (TS + hw)', lim.downcomerBackup, 'max', M_DC, near),
    downcomerInletVelocity: makeCheck(d.downcomerInletVelocity_m_s, 'm/s', lim.downcomerInletVelocity, 'max', M_DCV, near),
    downcomerResidenceTime: makeCheck(d.downcomerResidenceTime_s, 's', lim.downcomerResidenceTime, 'min', M_RT, near),
    downcomerSeal: makeCheck(d.downcomerSeal_mm!, 'mm', sealLimit, 'min', M_SEAL, near),
  };
  if (dry) for (const name of LIQUID_SIDE) notApplicable(checks[name]);
  else if (flooded) notApplicable(checks.entrainment);
  if (!sealApplies) notApplicable(checks.downcomerSeal);
  if (checks.downcomerSeal.status === 'over') {
    warnings.push(
      warning(
        WARNING_CODES.downcomerUnsealed,
        `downcomer clearance ${formatNumber(p.clearance_mm)} mm exceeds the weir height and the clear liquid seals it by only ${formatNumber(d.downcomerSeal_mm!)} mm (Kister: at least ${formatNumber(lim.downcomerSeal)} mm); vapour may enter the downcomer.`,
        load.tray,
      ),
    );
  }
  if (checks.weirLoading.status === 'over') {
    warnings.push(
      warning(
        WARNING_CODES.weirLoadingHigh,
        'weir loading above the maximum: consider more passes or swept-back weirs (Kister 1992 §6.5).',
        load.tray,
      ),
    );
  }
  return { tray: load.tray, checks, details: d, controllingCheck: controllingCheckOf(checks, flooded), warnings };
}

/**
 * The check a specialist names for the tray: jet flood on a flooded tray, whatever the checks extrapolated
 * past flood say; otherwise the highest percent of limit, except that entrainment (read from the flood
 * chart, so a consequence of the approach to flood) gives way to jet flood when jet flood is beyond its limit.
 */
function controllingCheckOf(checks: Record<CheckName, CheckResult>, flooded: boolean): CheckName {
  if (flooded) return 'jetFlood';
  let controlling: CheckName = CHECK_NAMES[0];
  let worst = -1;
  for (const name of CHECK_NAMES) {
    const pct = checks[name].percentOfLimit;
    if (pct > worst) {
      worst = pct;
      controlling = name;
    }
  }
  return controlling === 'entrainment' && checks.jetFlood.status === 'over' ? 'jetFlood' : controlling;
}

/** Rate one tray (prepares the section on each call; use rateSection for many trays). */
export function rateTray(section: SectionGeometry, load: TrayLoad, methods?: MethodOptions): TrayResult {
  return rateTrayPrepared(prepareSection(section, methods), load);
}
