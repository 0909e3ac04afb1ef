/** Small numeric helpers of the scan reader: sorting, running median, median step, interpolation. */
import type { DensityPoint } from '../../../shared/types/fieldEvidence.js';

export function median(values: readonly number[]): number {
  if (values.length === 0) return NaN;
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}

/** Points sorted by elevation. */
export function sortedProfile(points: readonly DensityPoint[]): DensityPoint[] {
  return [...points].sort((a, b) => a.elevation_m - b.elevation_m);
}

/**
 * Three-point running median of the densities (end points kept): removes single-point counting-noise
 * spikes without moving the edges of the froth layers (common practice for noisy profiles).
 */
export function runningMedian3(points: readonly DensityPoint[]): DensityPoint[] {
  return points.map((p, i) => {
    if (i === 0 || i === points.length - 1) return { ...p };
    const a = points[i - 1]!.density_kg_m3;
    const b = p.density_kg_m3;
    const c = points[i + 1]!.density_kg_m3;
    return { elevation_m: p.elevation_m, density_kg_m3: Math.max(Math.min(a, b), Math.min(Math.max(a, b), c)) };
  });
}

/** Median spacing of successive elevations [m] (the scan's vertical resolution). */
export function medianStep(points: readonly DensityPoint[]): number {
  const steps: number[] = [];
  for (let i = 1; i < points.length; i++) {
    const d = points[i]!.elevation_m - points[i - 1]!.elevation_m;
    if (d > 0) steps.push(d);
  }
  return steps.length ? median(steps) : 0;
}
