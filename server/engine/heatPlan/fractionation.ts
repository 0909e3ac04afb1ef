/**
 * Fractionation signal: the liquid-to-vapour ratio (mass) of each section, ΣL/ΣV over its trays outside
 * the pump-around zones (zone trays carry the circulation and do little fractionating), against the same
 * ratio in the base case. A section whose L/V falls below `threshold` × its base L/V is flagged
 * (default 0.8: our choice, no published rule; the user sets it). A section made only of zone trays has
 * no ratio (null) and is never flagged.
 */
import type { SectionFractionation } from '../../../shared/types/heatPlan.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';
import { sectionForTray } from '../pumpAround/column.js';
import type { TrayRole } from './traffic.js';

export interface SectionMembers {
  section: string;
  /** indices into the trays, outside every zone */
  members: number[];
  baseLiquidToVapour: number | null;
}

function ratio(
  trays: readonly Pick<TrayLoad, 'liquidMassFlow_kg_h' | 'vapourMassFlow_kg_h'>[],
  members: readonly number[],
): number | null {
  let l = 0;
  let v = 0;
  for (const k of members) {
    l += trays[k]!.liquidMassFlow_kg_h;
    v += trays[k]!.vapourMassFlow_kg_h;
  }
  return members.length > 0 && v > 0 ? l / v : null;
}

export function sectionMembers(
  sections: readonly StudySection[],
  base: readonly TrayLoad[],
  roles: readonly TrayRole[],
): SectionMembers[] {
  return sections.map((s) => {
    const members = base.flatMap((t, k) => (roles[k]!.zone < 0 && sectionForTray(sections, t.tray) === s ? [k] : []));
    return { section: s.name, members, baseLiquidToVapour: ratio(base, members) };
  });
}

export function fractionationSignal(
  sections: readonly SectionMembers[],
  trays: readonly Pick<TrayLoad, 'liquidMassFlow_kg_h' | 'vapourMassFlow_kg_h'>[],
  threshold: number,
): SectionFractionation[] {
  return sections.map((s) => {
    const lv = ratio(trays, s.members);
    const r = lv !== null && s.baseLiquidToVapour ? lv / s.baseLiquidToVapour : null;
    return {
      section: s.section,
      liquidToVapour: lv,
      baseLiquidToVapour: s.baseLiquidToVapour,
      ratioToBase: r,
      flagged: r !== null && r < threshold,
    };
  });
}
