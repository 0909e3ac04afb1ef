/**
 * Default limits and foaming-class data, loaded from reference-tables/ (every row carries its source),
 * and their resolution against the overrides of a rating request.
 */
import limitsTable from '../../reference-tables/limits.json' with { type: 'json' };
import foamingTable from '../../reference-tables/foaming-classes.json' with { type: 'json' };
import type { CheckName, FoamingClass, MethodOptions } from '../../shared/types/rating.js';

export interface FoamingClassData {
  class: FoamingClass;
  downcomerAerationFactor: number;
  inletVelocityLimit_m_s: number;
  residenceTimeMin_s: number;
  source: string;
}

const FOAMING_ORDER: readonly FoamingClass[] = ['low', 'moderate', 'high', 'very-high'];

function foamingRow(c: FoamingClass): FoamingClassData {
  const row = foamingTable.find((r) => r.class === c);
  if (!row) throw new Error(`reference-tables/foaming-classes.json has no row for ${c}`);
  return { ...row, class: c };
}

export const FOAMING_CLASSES: Readonly<Record<FoamingClass, FoamingClassData>> = Object.freeze({
  low: foamingRow('low'),
  moderate: foamingRow('moderate'),
  high: foamingRow('high'),
  'very-high': foamingRow('very-high'),
});
export { FOAMING_ORDER };

function tableLimit(check: string): number {
  const row = limitsTable.find((r) => r.check === check);
  if (!row) throw new Error(`reference-tables/limits.json has no row for ${check}`);
  return row.limit;
}

/** Defaults from reference-tables/limits.json (foaming-dependent ones come from foaming-classes.json). */
export const DEFAULT_LIMITS = Object.freeze({
  jetFlood: tableLimit('jetFlood'),
  entrainment: tableLimit('entrainment'),
  weeping: tableLimit('weeping'),
  pressureDrop_mm: tableLimit('pressureDrop'),
  pressureDropVacuum_mm: tableLimit('pressureDropVacuum'),
  weirLoading: tableLimit('weirLoading'),
  liquidLoad: tableLimit('liquidLoad'),
  downcomerBackup: tableLimit('downcomerBackup'),
  downcomerSeal: tableLimit('downcomerSeal'),
  passImbalance: tableLimit('passImbalance'),
  nearFraction: tableLimit('nearFraction'),
});

export interface ResolvedLimits {
  jetFlood: number;
  entrainment: number;
  weeping: number;
  /** Pa when overridden, otherwise undefined (then derived per tray from mm of liquid) */
  pressureDropPa: number | undefined;
  pressureDrop_mm: number;
  pressureDropVacuum_mm: number;
  weirLoading: number;
  liquidLoad: number;
  downcomerBackup: number;
  downcomerInletVelocity: number;
  downcomerResidenceTime: number;
  downcomerSeal: number;
  /** multipass trays: largest pass L/V departure [%] (a section warning, not a per-tray check) */
  passImbalance: number;
  nearFraction: number;
  aerationFactor: number;
}

/** Merge request overrides (`methods.limits`, in each check's own unit) over the defaults. */
export function resolveLimits(foaming: FoamingClass, methods: MethodOptions | undefined): ResolvedLimits {
  const fc = FOAMING_CLASSES[foaming];
  const o: Partial<Record<CheckName, number>> = methods?.limits ?? {};
  return {
    jetFlood: o.jetFlood ?? DEFAULT_LIMITS.jetFlood,
    entrainment: o.entrainment ?? DEFAULT_LIMITS.entrainment,
    weeping: o.weeping ?? DEFAULT_LIMITS.weeping,
    pressureDropPa: o.pressureDrop,
    pressureDrop_mm: DEFAULT_LIMITS.pressureDrop_mm,
    pressureDropVacuum_mm: DEFAULT_LIMITS.pressureDropVacuum_mm,
    weirLoading: o.weirLoading ?? DEFAULT_LIMITS.weirLoading,
    liquidLoad: o.liquidLoad ?? DEFAULT_LIMITS.liquidLoad,
    downcomerBackup: o.downcomerBackup ?? DEFAULT_LIMITS.downcomerBackup,
    downcomerInletVelocity: o.downcomerInletVelocity ?? fc.inletVelocityLimit_m_s,
    downcomerResidenceTime: o.downcomerResidenceTime ?? fc.residenceTimeMin_s,
    downcomerSeal: o.downcomerSeal ?? DEFAULT_LIMITS.downcomerSeal,
    passImbalance: DEFAULT_LIMITS.passImbalance,
    nearFraction: methods?.nearFraction ?? DEFAULT_LIMITS.nearFraction,
    aerationFactor: fc.downcomerAerationFactor,
  };
}
