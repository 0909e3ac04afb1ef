import type { StudySection } from '../../../shared/types/pumpAround.js';

/** The section whose tray range (inclusive, given in either order) holds the tray. */
export function sectionForTray(sections: readonly StudySection[], tray: number): StudySection | undefined {
  return sections.find((s) => tray >= Math.min(s.fromTray, s.toTray) && tray <= Math.max(s.fromTray, s.toTray));
}
