import { palette } from '../../shared/palette';
/**
 * Lines drawn across the per-tray charts where a tray section ends and where a pump-around draws and
 * returns: half a tray from the tray itself, so each line sits between two trays.
 */
export interface TrayMark {
  /** tray coordinate of the line (between two trays) */
  at: number;
  label: string;
  kind: 'section' | 'pump-around';
}

export function trayMarks(
  sections: readonly { name: string; firstTray: number; lastTray: number }[],
  pumpArounds: readonly { name: string; drawTray: number; returnTray: number }[] = [],
): TrayMark[] {
  const marks: TrayMark[] = [];
  const sorted = [...sections].sort((a, b) => Math.min(a.firstTray, a.lastTray) - Math.min(b.firstTray, b.lastTray));
  sorted.slice(0, -1).forEach((s, i) => {
    const next = sorted[i + 1]!;
    marks.push({ at: Math.max(s.firstTray, s.lastTray) + 0.5, label: `${s.name} | ${next.name}`, kind: 'section' });
  });
  for (const p of pumpArounds) {
    const up = p.returnTray < p.drawTray; // return has the lower number: it is on the side of the lower numbers
    marks.push({ at: p.returnTray + (up ? -0.5 : 0.5), label: `${p.name} return`, kind: 'pump-around' });
    marks.push({ at: p.drawTray + (up ? 0.5 : -0.5), label: `${p.name} draw`, kind: 'pump-around' });
  }
  return marks;
}

/** Marks of a pump-around study: its sections' boundaries and its pump-around's draw and return. */
export function studyMarks(input: {
  sections: readonly { name: string; fromTray: number; toTray: number }[];
  pumpAround: { name: string; drawTray: number; returnTray: number };
}): TrayMark[] {
  return trayMarks(
    input.sections.map((s) => ({ name: s.name, firstTray: s.fromTray, lastTray: s.toTray })),
    [input.pumpAround],
  );
}

const STYLE = {
  section: { color: palette.slate, dash: 'dot' },
  'pump-around': { color: palette.plum, dash: 'dash' },
} as const;

/** Plotly shapes and labels for the marks, across the whole plot width (trays on the y axis). */
export function markLayout(marks: readonly TrayMark[]): { shapes: object[]; annotations: object[] } {
  return {
    shapes: marks.map((m) => ({
      type: 'line',
      xref: 'paper',
      x0: 0,
      x1: 1,
      y0: m.at,
      y1: m.at,
      line: { color: STYLE[m.kind].color, dash: STYLE[m.kind].dash, width: 1.2 },
      name: `${m.kind}: ${m.label}`,
    })),
    annotations: marks.map((m) => ({
      xref: 'paper',
      x: 1,
      xanchor: 'right',
      y: m.at,
      yanchor: 'bottom',
      text: m.label,
      showarrow: false,
      font: { size: 10, color: STYLE[m.kind].color },
      bgcolor: 'rgba(255,253,248,0.8)',
    })),
  };
}

/** Tray steps: each tray's value held over its own height (tray − ½ to tray + ½); a gap where trays are missing. */
export function traySteps(points: readonly { tray: number; value: number | null }[]): {
  x: (number | null)[];
  y: (number | null)[];
  tray: (number | null)[];
} {
  const x: (number | null)[] = [];
  const y: (number | null)[] = [];
  const tray: (number | null)[] = [];
  const sorted = [...points].sort((a, b) => a.tray - b.tray);
  sorted.forEach((p, i) => {
    if (i > 0 && p.tray !== sorted[i - 1]!.tray + 1) {
      x.push(null);
      y.push(null);
      tray.push(null);
    }
    x.push(p.value, p.value);
    y.push(p.tray - 0.5, p.tray + 0.5);
    tray.push(p.tray, p.tray);
  });
  return { x, y, tray };
}
