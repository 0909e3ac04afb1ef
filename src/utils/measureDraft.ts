import type { TrayMeasurements } from '../../shared/types/inspections';

/** The measurement inputs of an inspection tray as typed: three places per list, blanks allowed. */
export interface MeasureDraft {
  weirHeight_mm: (number | null)[];
  downcomerClearance_mm: (number | null)[];
  levelness_mm: number | null;
  traySpacing_mm: number | null;
}

const pad = (xs: number[]): (number | null)[] => [...xs, null, null, null].slice(0, Math.max(3, xs.length));
const num = (v: number | string | null): number | null => (v === null || v === '' || Number.isNaN(Number(v)) ? null : Number(v));

export const toDraft = (m?: TrayMeasurements): MeasureDraft => ({
  weirHeight_mm: pad(m?.weirHeight_mm ?? []),
  downcomerClearance_mm: pad(m?.downcomerClearance_mm ?? []),
  levelness_mm: m?.levelness_mm ?? null,
  traySpacing_mm: m?.traySpacing_mm ?? null,
});

export const fromDraft = (d: MeasureDraft): TrayMeasurements => ({
  weirHeight_mm: d.weirHeight_mm.map(num).filter((x): x is number => x !== null),
  downcomerClearance_mm: d.downcomerClearance_mm.map(num).filter((x): x is number => x !== null),
  levelness_mm: num(d.levelness_mm),
  traySpacing_mm: num(d.traySpacing_mm),
});
