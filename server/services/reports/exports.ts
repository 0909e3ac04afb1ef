/**
 * Exports: a load case's per-tray loads and a run's per-tray results, as CSV or XLSX (SI units in the headers;
 * tray ΔP also in the user's ΔP unit).
 */
import type { DataSource } from 'typeorm';
import { LoadCase } from '../../db/entities/LoadCase.js';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { visibleChild, visibleColumn } from '../columns/columnsCommon.js';
import { toFile, type ExportFile, type Table } from './exportsFormat.js';
import { CHECK_NAMES } from '../../../shared/types/rating.js';
import { CHECK_LABELS, REVIEW_LABELS, STATUS_LABELS, TRAY_STATE_LABELS } from '../../../shared/labels.js';
import { trayState } from '../../../shared/verdict.js';
import { roundSig } from '../../../shared/numberFormat.js';
import { PRESSURE_DROP_UNIT_LABELS, defaultPressureDropUnit, pressureDropIn } from '../../../shared/units.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

/** Headers the import recognises, so an exported file can be imported again. */
export const LOAD_COLUMNS: [string, keyof TrayLoad][] = [
  ['Tray', 'tray'],
  ['Vapour mass flow (kg/h)', 'vapourMassFlow_kg_h'],
  ['Liquid mass flow (kg/h)', 'liquidMassFlow_kg_h'],
  ['Vapour density (kg/m³)', 'vapourDensity_kg_m3'],
  ['Liquid density (kg/m³)', 'liquidDensity_kg_m3'],
  ['Surface tension (mN/m)', 'surfaceTension_mN_m'],
  ['Liquid viscosity (mPa·s)', 'liquidViscosity_mPa_s'],
  ['Temperature (°C)', 'temperature_C'],
  ['Pressure (kPa)', 'pressure_kPa'],
];

export const CAUTIONS = [
  'Screening estimates from published correlations; not a design guarantee.',
  'Operating changes need management-of-change review and confirmation by the internals vendor and licensed engineers; site permits and local codes govern.',
];

export function loadTable(name: string, loads: TrayLoad[]): Table {
  return {
    sheet: name,
    headers: LOAD_COLUMNS.map(([h]) => h),
    rows: loads.map((l) => LOAD_COLUMNS.map(([, k]) => l[k] ?? null)),
  };
}

export async function exportLoadCase(ds: DataSource, user: SessionUser, id: string, format: 'csv' | 'xlsx'): Promise<ExportFile> {
  const l = await visibleChild(ds.manager, user, LoadCase, id, 'Load case');
  const col = await visibleColumn(ds.manager, user, l.columnId);
  return toFile(loadTable('Loads', l.loads), `${col.tag}-${l.name}-loads`, format);
}

export async function exportRun(ds: DataSource, user: SessionUser, id: string, format: 'csv' | 'xlsx'): Promise<ExportFile> {
  const r = await visibleChild(ds.manager, user, RatingRun, id, 'Rating run');
  const names = new Map(r.snapshot.sections.map((s) => [s.sectionId, s.name]));
  const headers = ['Tray', 'Section', 'Tray state', 'Controlling check'];
  const dp = user.pressureDropUnit ?? defaultPressureDropUnit(user.unitSystem);
  const dpLabel = PRESSURE_DROP_UNIT_LABELS[dp];
  const rhoL = new Map(r.snapshot.loads.map((l) => [l.tray, l.liquidDensity_kg_m3]));
  for (const c of CHECK_NAMES) {
    // a check added to the engine after the run was rated is absent from it: its cells stay empty
    const label = CHECK_LABELS[c];
    const unit = r.results.trays.find((t) => t.checks[c])?.checks[c]?.unit ?? '';
    headers.push(`${label} (${unit})`, `${label} limit (${unit})`, `${label} % of limit`, `${label} status`);
    // tray ΔP also in the user's ΔP unit (a head of the tray's own liquid by default), four significant figures
    if (c === 'pressureDrop') headers.push(`${label} (${dpLabel})`, `${label} limit (${dpLabel})`);
  }
  // a check that does not apply has no value or limit to read: its cells say so in the status only
  const rows = r.results.trays.map((t) => [
    t.tray,
    names.get(t.sectionId) ?? '',
    TRAY_STATE_LABELS[trayState(t)],
    CHECK_LABELS[t.controllingCheck],
    ...CHECK_NAMES.flatMap((c) => {
      const k = t.checks[c];
      const extra = c === 'pressureDrop' ? 2 : 0;
      if (!k) return Array<null>(4 + extra).fill(null);
      if (k.status === 'na') return [null, null, null, STATUS_LABELS.na, ...Array<null>(extra).fill(null)];
      const cells: (number | string)[] = [k.value, k.limit, k.percentOfLimit, STATUS_LABELS[k.status]];
      // a head needs the tray's liquid density; without one the cell stays empty rather than in another unit
      const head = dp === 'mm-liquid' || dp === 'in-liquid';
      const inDp = (pa: number) =>
        head && !(rhoL.get(t.tray)! > 0) ? null : roundSig(pressureDropIn(pa, dp, rhoL.get(t.tray)), 4);
      return extra ? [...cells, inDp(k.value), inDp(k.limit)] : cells;
    }),
  ]);
  const notes = [
    `Run "${r.label}", column ${r.snapshot.column.tag} (trays numbered ${r.snapshot.column.numbering}), load case "${r.snapshot.loadCase.name}", review status ${REVIEW_LABELS[r.status]}, engine ${r.engineVersion}, created ${r.createdAt.toISOString()}`,
    ...CAUTIONS,
  ];
  return toFile({ sheet: 'Results', headers, rows, notes }, `${r.snapshot.column.tag}-${r.label}-results`, format);
}
