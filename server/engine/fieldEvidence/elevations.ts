/**
 * Tray deck elevations from the column's sections and a datum.
 *
 * Convention (ours): a tray's spacing is the space from its deck up to the deck above, so going down
 * from tray u to the next tray l the deck falls by l's section tray spacing. At a section boundary the
 * real distance (feed or draw zones) is often larger than either spacing; the user nudges the datum
 * (`offset_m`) or sets the datum on the tray nearest the region of interest.
 */
import type { ScanDatum, TrayElevation } from '../../../shared/types/fieldEvidence.js';
import type { StudySection, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { sectionForTray } from '../pumpAround/column.js';
import { topDownPosition } from '../pumpAround/traffic.js';

export type ElevationSection = Pick<StudySection, 'name' | 'fromTray' | 'toTray' | 'traySpacing_mm'>;

/** Every tray of the sections, top of the column first. */
export function traysTopDown(sections: readonly ElevationSection[], numbering: TrayNumbering): number[] {
  const trays: number[] = [];
  for (const s of sections) for (let t = Math.min(s.fromTray, s.toTray); t <= Math.max(s.fromTray, s.toTray); t++) trays.push(t);
  return trays.sort((a, b) => topDownPosition(a, numbering) - topDownPosition(b, numbering));
}

/**
 * Deck elevation of every tray [m], top of the column first, with the datum tray's deck at
 * `datum.elevation_m + (datum.offset_m ?? 0)`. The sections must cover a contiguous tray range holding the
 * datum tray (validateGammaScanInput checks it); a tray outside every section throws.
 * Example: trays 1–3 top-down at 600 mm, datum tray 2 at 10 m → 10.6, 10.0, 9.4 m.
 */
export function trayDeckElevations(
  sections: readonly ElevationSection[],
  numbering: TrayNumbering,
  datum: ScanDatum,
): TrayElevation[] {
  const trays = traysTopDown(sections, numbering);
  const spacing = trays.map((t) => {
    const s = sectionForTray(sections as StudySection[], t);
    if (!s) throw new Error(`tray ${t} is in no section`);
    return { tray: t, spacing_m: s.traySpacing_mm / 1000, section: s.name };
  });
  const i0 = trays.indexOf(datum.tray);
  if (i0 < 0) throw new Error(`datum tray ${datum.tray} is in no section`);
  const z = new Array<number>(trays.length);
  z[i0] = datum.elevation_m + (datum.offset_m ?? 0);
  for (let i = i0 + 1; i < trays.length; i++) z[i] = z[i - 1]! - spacing[i]!.spacing_m;
  for (let i = i0 - 1; i >= 0; i--) z[i] = z[i + 1]! + spacing[i + 1]!.spacing_m;
  return spacing.map((s, i) => ({
    tray: s.tray,
    deckElevation_m: Math.round(z[i]! * 1e6) / 1e6, // to the micrometre: no float dust in reports
    traySpacing_mm: s.spacing_m * 1000,
    section: s.section,
  }));
}
