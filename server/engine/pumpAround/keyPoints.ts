/**
 * Full ratings at chosen duties (the study's key points: base, limiting, recommended) and the minimum
 * liquid line of each tray above the zone, for the stored study and its charts.
 */
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { StudyInput, StudyPoint } from '../../../shared/types/pumpAround.js';
import type { MinimumLiquidLine } from '../../../shared/types/studies.js';
import { prepareSection, rateTrayPrepared, weirLoadingForCrestFrancis, type PreparedSection } from '../index.js';
import { sectionForTray } from './column.js';
import { studyPoint } from './points.js';
import { shiftTraffic } from './traffic.js';

/** Prepared section per tray, as runStudy rates them. */
function preparedByTray(input: StudyInput): Map<number, PreparedSection> {
  const prepared = new Map(input.sections.map((s) => [s, prepareSection(s, input.methods)]));
  const out = new Map<number, PreparedSection>();
  for (const t of input.trays) out.set(t.tray, prepared.get(sectionForTray(input.sections, t.tray)!)!);
  return out;
}

/** Full study points at chosen duties (base, limiting, recommended), rated as the sweep points are. */
export function pointsAt(input: StudyInput, duties: number[]): StudyPoint[] {
  const byTray = preparedByTray(input);
  const numbering = input.numbering ?? 'top-down';
  const rate = (load: TrayLoad) => rateTrayPrepared(byTray.get(load.tray)!, load);
  return duties.map((q) =>
    studyPoint(
      shiftTraffic(input.trays, input.pumpAround, q, input.latentHeat_kJ_kg, numbering),
      input.pumpAround.baseDuty_kW,
      numbering,
      rate,
    ),
  );
}

/**
 * Liquid [kg/h] at which each tray above the zone reaches the minimum crest over its weir (the liquidLoad
 * limit, Francis weir formula via weirLoadingForCrestFrancis), at base-case liquid density; the same
 * relation the operating window uses for its minimum weir loading line. Properties are held at base values,
 * so the line does not move with duty.
 */
export function minimumLiquidLines(input: StudyInput, base: StudyPoint): MinimumLiquidLine[] {
  const byTray = preparedByTray(input);
  const loads = new Map(input.trays.map((t) => [t.tray, t]));
  return base.trays
    .filter((t) => t.region === 'above')
    .map((t) => {
      const p = byTray.get(t.tray)!;
      const rhoL = loads.get(t.tray)!.liquidDensity_kg_m3;
      const l = weirLoadingForCrestFrancis(p.limits.liquidLoad) * p.weirLength * rhoL;
      return { tray: t.tray, minimumLiquid_kg_h: Number.isFinite(l) ? l : 0 };
    });
}
