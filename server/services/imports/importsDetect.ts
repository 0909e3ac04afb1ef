/**
 * Header, field and unit detection for tray-profile imports. Units are recognised with shared/units.ts
 * (header text in brackets, after a comma, or in a unit row under the header).
 */
import { findUnit, type QuantityId } from '../../../shared/units.js';
import type { TrayNumbering } from '../../../shared/types/columns.js';
import type { ImportField, ImportMapping, ImportNumbering, ImportUnit, ImportUnits } from '../../../shared/types/imports.js';

/** Quantity of each field with a unit (tray and stage have none). */
export const FIELD_QUANTITY: Partial<Record<ImportField, QuantityId>> = {
  vapourMassFlow: 'massFlow',
  liquidMassFlow: 'massFlow',
  vapourDensity: 'density',
  liquidDensity: 'density',
  surfaceTension: 'surfaceTension',
  liquidViscosity: 'viscosity',
  temperature: 'temperature',
  pressure: 'pressure',
};

// Checked in order: properties before flows, so "vapour density" is not taken for a vapour flow.
const PATTERNS: [ImportField, RegExp][] = [
  ['vapourDensity', /(vap|gas).*(dens|rho)|rho.?v\b|dens.*(vap|gas)/],
  ['liquidDensity', /liq.*(dens|rho)|rho.?l\b|dens.*liq/],
  ['surfaceTension', /surf|tension|sigma/],
  ['liquidViscosity', /^(?!.*(vap|gas)).*(visc|\bmu\b)/],
  ['temperature', /temp|^t$/],
  ['pressure', /press|^p$/],
  ['vapourMassFlow', /(vap|gas).*(flow|rate|mass|load|to)|^(vapou?r|gas|v)$/],
  ['liquidMassFlow', /liq.*(flow|rate|mass|load|from)|^(liquid|l)$/],
  ['stage', /stage/],
  ['tray', /tray|^(no|#)$/],
];

/** Header text split into its name and unit: "Vapour flow (lb/h)", "Vapour flow [lb/h]", "Vapour flow, lb/h". */
export function splitHeader(h: string): { name: string; unit: string | null } {
  const m = /^(.*?)\s*[([]\s*([^)\]]+)\s*[)\]]\s*$/.exec(h) ?? /^(.*?),\s*([^,]+)$/.exec(h);
  return m ? { name: m[1]!.trim(), unit: m[2]!.trim() } : { name: h.trim(), unit: null };
}

export function fieldOfHeader(h: string): ImportField | null {
  const name = splitHeader(h).name.toLowerCase().replace(/[_.]+/g, ' ').trim();
  for (const [f, re] of PATTERNS) if (re.test(name)) return f;
  return null;
}

export function unitOf(field: ImportField, text: string | null): ImportUnit | null {
  const q = FIELD_QUANTITY[field];
  if (!q || !text) return null;
  return (findUnit(q, text)?.id as ImportUnit | undefined) ?? null;
}

export interface Detection {
  headerIndex: number;
  /** index of a unit row under the header, or -1 */
  unitRowIndex: number;
  mapping: ImportMapping;
  units: ImportUnits;
  notes: string[];
}

/** The first row (of the first 20) where at least three cells name known fields is the header. */
export function detectHeader(cells: string[][]): Detection | null {
  for (let i = 0; i < Math.min(cells.length, 20); i++) {
    const row = cells[i]!;
    const mapping: ImportMapping = {};
    row.forEach((h, c) => {
      const f = h ? fieldOfHeader(h) : null;
      if (f && mapping[f] === undefined) mapping[f] = c;
    });
    if (Object.keys(mapping).length < 3) continue;
    const notes: string[] = [];
    const units: ImportUnits = {};
    const next = cells[i + 1] ?? [];
    const unitRow =
      Object.entries(mapping).filter(([f, c]) => FIELD_QUANTITY[f as ImportField] && unitOf(f as ImportField, next[c] ?? null))
        .length >= 2;
    for (const [f, c] of Object.entries(mapping) as [ImportField, number][]) {
      const q = FIELD_QUANTITY[f];
      if (!q) continue;
      const text = unitOf(f, splitHeader(row[c] ?? '').unit) ? splitHeader(row[c] ?? '').unit : unitRow ? next[c] : null;
      const u = unitOf(f, text ?? null);
      if (!u) notes.push(`No unit recognised for "${row[c]}"; assumed ${defaultUnit(f)} — confirm or change it`);
      else units[f] = u;
      if (u && f === 'pressure' && /^[[(]?(psi|bar|kpa)[\])]?$/i.test(text!.trim()))
        notes.push(`"${row[c]}" does not say gauge or absolute; read as absolute (${u}) — choose Gauge if it is gauge`);
    }
    row.forEach((h, c) => {
      if (h && !Object.values(mapping).includes(c)) notes.push(`Column "${h}" is not used`);
    });
    return { headerIndex: i, unitRowIndex: unitRow ? i + 1 : -1, mapping, units, notes };
  }
  return null;
}

const DEFAULTS: Record<QuantityId, ImportUnit | undefined> = {
  massFlow: 'kg/h',
  density: 'kg/m3',
  surfaceTension: 'mN/m',
  viscosity: 'mPa.s',
  temperature: 'C',
  pressure: 'kPa',
} as Record<QuantityId, ImportUnit | undefined>;
export const defaultUnit = (f: ImportField): ImportUnit => DEFAULTS[FIELD_QUANTITY[f]!]!;

/**
 * Numbering: by tray when a tray column exists, else by stage. Direction from the pressure (or temperature)
 * profile, which rises from top to bottom: rising with the row number means numbered top-down.
 */
export function detectNumbering(
  rows: string[][],
  mapping: ImportMapping,
  columnDirection: TrayNumbering,
  notes: string[],
): ImportNumbering {
  const key = mapping.tray !== undefined ? 'tray' : 'stage';
  const idCol = mapping[key];
  const probe = mapping.pressure ?? mapping.temperature;
  let direction = columnDirection;
  if (idCol !== undefined && probe !== undefined) {
    const pts = rows
      .map((r) => [Number(r[idCol]), Number(r[probe])] as const)
      .filter(([a, b]) => Number.isFinite(a) && Number.isFinite(b));
    if (pts.length >= 3) {
      const sorted = [...pts].sort((a, b) => a[0] - b[0]);
      const rise = sorted[sorted.length - 1]![1] - sorted[0]![1];
      if (rise !== 0) {
        direction = rise > 0 ? 'top-down' : 'bottom-up';
        notes.push(
          `${mapping.pressure !== undefined ? 'Pressure' : 'Temperature'} rises with the ${key} number: the file is numbered ${direction}${direction !== columnDirection ? ` (the column is numbered ${columnDirection}; tray numbers will be flipped)` : ''}`,
        );
      }
    }
  }
  if (key === 'stage') notes.push('No tray column: rows are simulation stages; give the stage offset or a stage-to-tray map');
  return { key, direction, stageOffset: 0 };
}
