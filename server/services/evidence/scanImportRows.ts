/**
 * Gamma-scan files: find the header (elevation with density or count rate, optionally a scan-line column),
 * detect units as the load import does (header text in brackets or after a comma, or a unit row under the
 * header; shared/units.ts), and convert rows to SI points with every fault listed as { row, column, message }.
 */
import { splitHeader } from '../imports/importsDetect.js';
import { parseLoadNumber as parseNumber } from '../../../shared/trayLoadRules.js';
import { findUnit, toSI } from '../../../shared/units.js';
import type { ImportRowError } from '../../../shared/types/imports.js';
import type { ScanImportMapping, ScanImportUnits, ScanMeasure, ScanPoint } from '../../../shared/types/evidence.js';

type Field = keyof ScanImportMapping;
const PATTERNS: [Field, RegExp][] = [
  ['density', /dens|rho|kg\/m|lb\/ft/],
  ['countRate', /count|cps|cpm|intensity|rate|signal/],
  ['elevation', /elev|height|level|position|^z$|depth/],
  ['line', /line|scan|chord|trace/],
];
const FIELD_LABEL: Record<Field, string> = {
  elevation: 'elevation',
  density: 'density',
  countRate: 'count rate',
  line: 'scan line',
};

function fieldOf(h: string): Field | null {
  const name = splitHeader(h).name.toLowerCase().trim();
  for (const [f, re] of PATTERNS) if (re.test(name)) return f;
  return null;
}

type ElevationUnit = ScanImportUnits['elevation'];
type DensityUnit = NonNullable<ScanImportUnits['density']>;

function elevationUnit(text: string | null): ElevationUnit | null {
  if (!text) return null;
  const u = findUnit('lengthLarge', text) ?? findUnit('lengthSmall', text);
  return (u?.id as ElevationUnit | undefined) ?? null;
}
const densityUnit = (text: string | null): DensityUnit | null =>
  text ? ((findUnit('density', text)?.id as DensityUnit | undefined) ?? null) : null;

export interface ScanDetection {
  headerIndex: number;
  unitRowIndex: number;
  mapping: ScanImportMapping;
  units: ScanImportUnits;
  countRateUnit: string;
  notes: string[];
}

/** The first row (of the first 20) naming an elevation and a density or count rate is the header. */
export function detectScanHeader(cells: string[][]): ScanDetection | null {
  for (let i = 0; i < Math.min(cells.length, 20); i++) {
    const row = cells[i]!;
    const m: Partial<ScanImportMapping> = {};
    row.forEach((h, c) => {
      const f = h ? fieldOf(h) : null;
      if (f && m[f] === undefined) m[f] = c;
    });
    if (m.elevation === undefined || (m.density === undefined && m.countRate === undefined)) continue;
    const mapping = m as ScanImportMapping;
    const notes: string[] = [];
    const next = cells[i + 1] ?? [];
    const unitText = (c: number) => splitHeader(row[c] ?? '').unit;
    const unitRow = elevationUnit(next[mapping.elevation] ?? null) !== null;
    const pick = (c: number) => unitText(c) ?? (unitRow ? (next[c] ?? null) : null);
    let elevation = elevationUnit(pick(mapping.elevation));
    if (!elevation) {
      elevation = 'm';
      notes.push(`No unit recognised for "${row[mapping.elevation]}"; assumed m — confirm or change it`);
    }
    const units: ScanImportUnits = { elevation };
    if (mapping.density !== undefined) {
      const d = densityUnit(pick(mapping.density));
      units.density = d ?? 'kg/m3';
      if (!d) notes.push(`No unit recognised for "${row[mapping.density]}"; assumed kg/m³ — confirm or change it`);
      if (mapping.countRate !== undefined) {
        notes.push(`Both density and count rate are given; the density column "${row[mapping.density]}" is read`);
        delete mapping.countRate;
      }
    }
    const countRateUnit = mapping.countRate !== undefined ? (pick(mapping.countRate) ?? '') : '';
    if (mapping.countRate !== undefined)
      notes.push('Count rates are read against the two calibration count rates you give (same unit as the file)');
    row.forEach((h, c) => {
      if (h && !Object.values(mapping).includes(c)) notes.push(`Column "${h}" is not used`);
    });
    return { headerIndex: i, unitRowIndex: unitRow ? i + 1 : -1, mapping, units, countRateUnit, notes };
  }
  return null;
}

export interface ScanRowsInput {
  headers: string[];
  rows: string[][];
  firstDataRow: number;
  mapping: ScanImportMapping;
  units: ScanImportUnits;
}

export interface ConvertedLine {
  label: string;
  measure: ScanMeasure;
  points: ScanPoint[];
}

/** SI points per scan line (in the file's order of lines, each sorted by elevation) and every row fault. */
export function convertScanRows(inp: ScanRowsInput): { lines: ConvertedLine[]; errors: ImportRowError[] } {
  const errors: ImportRowError[] = [];
  const { mapping: m, units } = inp;
  const name = (f: Field) => {
    const c = m[f];
    return c !== undefined ? (inp.headers[c] ?? `column ${c + 1}`) : FIELD_LABEL[f];
  };
  const valueField: Field | null = m.density !== undefined ? 'density' : m.countRate !== undefined ? 'countRate' : null;
  if (!valueField) {
    errors.push({ row: inp.firstDataRow - 1, column: 'density', message: 'no file column is mapped to density or count rate' });
    return { lines: [], errors };
  }
  if (valueField === 'density' && !units.density)
    errors.push({ row: inp.firstDataRow - 1, column: name('density'), message: 'no density unit chosen' });
  const measure: ScanMeasure = valueField === 'density' ? 'density' : 'count-rate';
  const byLine = new Map<string, Map<number, { row: number; p: ScanPoint }>>();
  inp.rows.forEach((r, i) => {
    const row = inp.firstDataRow + i;
    if (r.every((c) => !c?.trim())) return;
    const num = (f: Field): number | null => {
      const text = r[m[f]!] ?? '';
      const v = text.trim() ? parseNumber(text) : null;
      if (v === null)
        errors.push({ row, column: name(f), message: text.trim() ? `"${text.slice(0, 40)}" is not a number` : 'is empty' });
      return v;
    };
    const e = num('elevation');
    const v = num(valueField);
    if (e === null || v === null) return;
    const elevation_m =
      units.elevation === 'm' || units.elevation === 'ft'
        ? toSI('lengthLarge', e, units.elevation)
        : toSI('lengthSmall', e, units.elevation) / 1000;
    const value = valueField === 'density' ? toSI('density', v, units.density ?? 'kg/m3') : v;
    if (value < 0) return void errors.push({ row, column: name(valueField), message: 'must not be negative' });
    if (Math.abs(elevation_m) > 500)
      return void errors.push({ row, column: name('elevation'), message: "is more than 500 m from the scan's zero" });
    const label = m.line !== undefined ? (r[m.line] ?? '').trim() || 'Line 1' : 'Line 1';
    const pts = byLine.get(label) ?? new Map<number, { row: number; p: ScanPoint }>();
    byLine.set(label, pts);
    const key = Math.round(elevation_m * 1e6);
    const dup = pts.get(key);
    if (dup)
      return void errors.push({ row, column: name('elevation'), message: `repeats the elevation of row ${dup.row} on ${label}` });
    pts.set(key, { row, p: { elevation_m, value } });
  });
  const lines = [...byLine].map(([label, pts]) => ({
    label,
    measure,
    points: [...pts.values()].map((x) => x.p).sort((a, b) => a.elevation_m - b.elevation_m),
  }));
  lines.forEach((l) => {
    if (l.points.length < 2)
      errors.push({
        row: inp.firstDataRow - 1,
        column: name('elevation'),
        message: `${l.label} has ${l.points.length} point(s); a scan line needs at least 2`,
      });
  });
  if (lines.length > 12)
    errors.push({
      row: inp.firstDataRow - 1,
      column: name('line'),
      message: `${lines.length} scan lines; at most 12 are stored per scan`,
    });
  return { lines, errors };
}
