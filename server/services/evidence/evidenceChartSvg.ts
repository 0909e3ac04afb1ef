/**
 * The scan for the printed report as SVG (pdfmake draws SVG): density across, elevation up, each tray deck a
 * line labelled with both tray numbers, flooded regions shaded, each tray's finding written beside its space,
 * and the density the scan was read at as a dashed line.
 */
import { niceTicks } from '../reports/reportCharts.js';
import { SCAN_FINDING_LABELS, trayBothWaysShort } from '../../../shared/evidenceLabels.js';
import { palette } from '../../../shared/palette.js';
import type { EvidenceReading } from '../../../shared/types/evidence.js';
import type { GammaScanResult } from '../../../shared/types/fieldEvidence.js';

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

export interface ScanChartUnits {
  /** SI → display for elevation [m] and density [kg/m³], and their labels */
  z: (m: number) => number;
  rho: (kg_m3: number) => number;
  zLabel: string;
  rhoLabel: string;
}

export function scanChartSvg(r: EvidenceReading, res: GammaScanResult, u: ScanChartUnits, width = 330, height = 480): string {
  const [L, R, T, B] = [70, 80, 14, 30];
  const zs = res.profile.map((p) => u.z(p.elevation_m));
  const [z0, z1] = [Math.min(...zs), Math.max(...zs)];
  const xMax = Math.max(1, ...res.profile.map((p) => u.rho(p.density_kg_m3))) * 1.05;
  const X = (v: number) => L + (Math.max(0, v) / xMax) * (width - L - R);
  const Y = (v: number) => T + (1 - (v - z0) / (z1 - z0 || 1)) * (height - T - B);
  const p: string[] = [];
  const text = (x: number, y: number, s: string, anchor: string, size: number, color: string) =>
    p.push(`<text x="${x}" y="${y}" text-anchor="${anchor}" font-size="${size}" fill="${color}">${esc(s)}</text>`);
  for (const f of res.floodedRegions) {
    const [a, b] = [Y(Math.min(u.z(f.toElevation_m), z1)), Y(Math.max(u.z(f.fromElevation_m), z0))];
    p.push(`<rect x="${L}" y="${a}" width="${width - L - R}" height="${Math.max(0, b - a)}" fill="#f4d6d3"/>`);
  }
  for (const t of niceTicks(0, xMax, 5)) text(X(t), height - B + 11, String(t), 'middle', 7, '#333');
  for (const d of r.decks) {
    const z = u.z(d.deckElevation_m);
    if (z < z0 || z > z1) continue;
    p.push(`<line x1="${L}" y1="${Y(z)}" x2="${width - R}" y2="${Y(z)}" stroke="${palette.taupe}" stroke-width="0.5"/>`);
    // the PDF font has no arrows; the axis title says which way the second number counts
    text(L - 3, Y(z) + 2.5, trayBothWaysShort(d.tray, r.trayCount, r.numbering).replace(/[↑↓]$/u, ''), 'end', 6.5, '#444');
  }
  for (const t of res.trays.filter((x) => x.finding !== 'normal')) {
    const mid = u.z(t.deckElevation_m + t.traySpacing_mm / 2000);
    text(
      width - R + 3,
      Y(Math.min(mid, z1)) + 2.5,
      `${SCAN_FINDING_LABELS[t.finding]} (T${t.tray})`,
      'start',
      7,
      palette.negative,
    );
  }
  const th = X(u.rho(res.threshold.density_kg_m3));
  p.push(
    `<line x1="${th}" y1="${T}" x2="${th}" y2="${height - B}" stroke="${palette.secondary}" stroke-width="0.8" stroke-dasharray="4 3"/>`,
  );
  const d = res.profile.map(
    (q, i) => `${i ? 'L' : 'M'}${X(u.rho(q.density_kg_m3)).toFixed(1)} ${Y(u.z(q.elevation_m)).toFixed(1)}`,
  );
  p.push(`<path d="${d.join(' ')}" fill="none" stroke="${palette.dark}" stroke-width="0.9"/>`);
  p.push(`<line x1="${L}" y1="${T}" x2="${L}" y2="${height - B}" stroke="#555" stroke-width="0.8"/>`);
  p.push(`<line x1="${L}" y1="${height - B}" x2="${width - R}" y2="${height - B}" stroke="#555" stroke-width="0.8"/>`);
  text((L + width - R) / 2, height - 6, `Density (${u.rhoLabel}); dashed: density read at`, 'middle', 7.5, '#222');
  text(
    2,
    T - 4,
    `Elevation (${u.zLabel}), ${r.numbering === 'top-down' ? 'tray · count from bottom' : 'tray · count from top'}`,
    'start',
    7,
    '#222',
  );
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">${p.join('')}</svg>`;
}
