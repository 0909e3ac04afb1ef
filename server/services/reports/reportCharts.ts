/**
 * Small SVG charts for the PDF reports (pdfmake draws SVG): axes with rounded ticks, horizontal axis titles
 * and a vertical-axis title written above the axis (never rotated or cut), steps, lines, bars and markers.
 */
export interface Series {
  name: string;
  color: string;
  points: [number, number][];
  /** 'line' (default), 'step' (held from each x to the next: tray steps), 'bar' or 'marker' */
  kind?: 'line' | 'step' | 'bar' | 'marker';
  dash?: boolean;
  /** bar colours per point (status colours) */
  colors?: string[];
}
export interface ChartSpec {
  width: number;
  height: number;
  xTitle: string;
  yTitle: string;
  series: Series[];
  /** dashed reference lines across the chart, e.g. 100 % of the limit */
  yLines?: { y: number; label: string; color: string }[];
  /** vertical marks, e.g. section or pump-around boundaries */
  xLines?: { x: number; label: string }[];
  xMin?: number;
  yMin?: number;
  yMax?: number;
  /** integer ticks only (tray numbers) */
  xIntegers?: boolean;
}

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
const fmt = (v: number) => (Math.abs(v) >= 1000 ? Math.round(v).toLocaleString('en-US') : String(Number(v.toPrecision(3))));

/** About n round ticks from lo to hi (1, 2, 2.5 or 5 × 10^k apart). */
export function niceTicks(lo: number, hi: number, n = 6): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / n;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = ([1, 2, 2.5, 5, 10].find((m) => m * p >= raw) ?? 10) * p;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

export function chartSvg(c: ChartSpec): string {
  const L = 62,
    R = 12,
    T = 26,
    B = 34;
  const all = c.series.flatMap((s) => s.points);
  const xs = all.map((p) => p[0]);
  const ys = [...all.map((p) => p[1]), ...(c.yLines ?? []).map((l) => l.y)];
  const x0 = c.xMin ?? Math.min(...xs),
    x1 = Math.max(...xs, x0 + 1);
  const y0 = c.yMin ?? Math.min(0, ...ys),
    y1 = c.yMax ?? Math.max(...ys, y0 + 1) * 1.05;
  const pad = c.series.some((s) => s.kind === 'bar' || s.kind === 'step') ? 0.5 : 0;
  const X = (v: number) => L + ((v - (x0 - pad)) / (x1 + pad - (x0 - pad))) * (c.width - L - R);
  const Y = (v: number) => T + (1 - (v - y0) / (y1 - y0)) * (c.height - T - B);
  const parts: string[] = [];
  const line = (a: number, b: number, d: number, e: number, style: string) =>
    parts.push(`<line x1="${a}" y1="${b}" x2="${d}" y2="${e}" ${style}/>`);
  const text = (x: number, y: number, s: string, anchor = 'middle', size = 8, color = '#333') =>
    parts.push(`<text x="${x}" y="${y}" text-anchor="${anchor}" font-size="${size}" fill="${color}">${esc(s)}</text>`);
  for (const t of niceTicks(y0, y1)) {
    line(L, Y(t), c.width - R, Y(t), 'stroke="#e3e3e3" stroke-width="0.6"');
    text(L - 4, Y(t) + 3, fmt(t), 'end');
  }
  for (const t of niceTicks(x0, x1, c.xIntegers ? Math.min(20, x1 - x0) : 7).filter((t) => !c.xIntegers || Number.isInteger(t)))
    text(X(t), c.height - B + 11, fmt(t));
  line(L, T, L, c.height - B, 'stroke="#555" stroke-width="0.8"');
  line(L, c.height - B, c.width - R, c.height - B, 'stroke="#555" stroke-width="0.8"');
  text(L - 58, 12, c.yTitle, 'start', 8.5, '#222');
  text((L + c.width - R) / 2, c.height - 6, c.xTitle, 'middle', 8.5, '#222');
  const bw = (X(x0 + 1) - X(x0)) * 0.7;
  for (const s of c.series) {
    const pts = [...s.points].sort((a, b) => a[0] - b[0]);
    if (s.kind === 'bar')
      pts.forEach(([x, y], i) =>
        parts.push(
          `<rect x="${X(x) - bw / 2}" y="${Math.min(Y(y), Y(0))}" width="${bw}" height="${Math.abs(Y(0) - Y(y))}" fill="${s.colors?.[i] ?? s.color}"/>`,
        ),
      );
    else if (s.kind === 'marker')
      pts.forEach(([x, y]) =>
        parts.push(`<circle cx="${X(x)}" cy="${Y(y)}" r="3.5" fill="${s.color}" stroke="#fff" stroke-width="1"/>`),
      );
    else {
      const d =
        s.kind === 'step'
          ? pts.map(([x, y], i) => `${i ? 'L' : 'M'}${X(x - 0.5)} ${Y(y)} L${X(x + 0.5)} ${Y(y)}`).join(' ')
          : pts.map(([x, y], i) => `${i ? 'L' : 'M'}${X(x)} ${Y(y)}`).join(' ');
      parts.push(`<path d="${d}" fill="none" stroke="${s.color}" stroke-width="1.3"${s.dash ? ' stroke-dasharray="4 3"' : ''}/>`);
    }
  }
  for (const l of c.yLines ?? []) {
    line(L, Y(l.y), c.width - R, Y(l.y), `stroke="${l.color}" stroke-width="0.9" stroke-dasharray="5 3"`);
    text(c.width - R - 2, Y(l.y) - 3, l.label, 'end', 7.5, l.color);
  }
  for (const l of c.xLines ?? []) {
    line(X(l.x), T, X(l.x), c.height - B, 'stroke="#7a7a7a" stroke-width="0.8" stroke-dasharray="2 2"');
    // right of the line; where it would run past the plot (about 0.56 em a character), left of it one row lower,
    // clear of the label of the line before
    const past = X(l.x) + 2 + l.label.length * 7 * 0.56 > c.width - R;
    text(past ? X(l.x) - 2 : X(l.x) + 2, T + (past ? 17 : 8), l.label, past ? 'end' : 'start', 7, '#555');
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${c.width}" height="${c.height}" viewBox="0 0 ${c.width} ${c.height}">${parts.join('')}</svg>`;
}

/** A legend as SVG (Noto Sans has no square glyph): a coloured box and the name per entry, wrapped in rows. */
export function legendSvg(items: { name: string; color: string }[], width: number): string {
  const parts: string[] = [];
  let [x, y] = [0, 10];
  for (const i of items) {
    const w = 16 + i.name.length * 4.4;
    if (x + w > width && x > 0) [x, y] = [0, y + 13];
    parts.push(
      `<rect x="${x}" y="${y - 7}" width="8" height="8" fill="${i.color}"/><text x="${x + 11}" y="${y}" font-size="7.5" fill="#333">${esc(i.name)}</text>`,
    );
    x += w + 8;
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${y + 5}" viewBox="0 0 ${width} ${y + 5}">${parts.join('')}</svg>`;
}
