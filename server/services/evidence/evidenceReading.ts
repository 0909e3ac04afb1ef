/**
 * A stored gamma scan read against the rating: the column's sections (or those of the chosen run's snapshot),
 * the datum with its nudge, the run's loads for the prediction, and each scan line through the field-evidence
 * engine. No engine logic here: this only assembles the engine's input from stored rows.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { ValidationError } from '../../errors.js';
import { runGammaScan, trayDeckElevations, validateGammaScanInput } from '../../engine/fieldEvidence/index.js';
import { visibleEvidence } from './evidence.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { EvidenceDataByKind, EvidenceReading, ReadingBasis } from '../../../shared/types/evidence.js';
import type { GammaScanInput } from '../../../shared/types/fieldEvidence.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';
import type { SectionGeometry, TrayLoad } from '../../../shared/types/rating.js';

interface SectionRow {
  name: string;
  first_tray: number;
  last_tray: number;
  geometry: SectionGeometry;
}

const median = (xs: number[]): number | null => {
  if (!xs.length) return null;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
};

/** The column's sections, its numbering and tray count, and (when a run is chosen) the run's loads and methods. */
export async function readingBasis(em: EntityManager, columnId: string, runId: string | null): Promise<ReadingBasis> {
  const [col] = (await em.query(`SELECT numbering, tray_count FROM columns WHERE id = $1`, [columnId])) as {
    numbering: 'top-down' | 'bottom-up';
    tray_count: number;
  }[];
  const base = { numbering: col!.numbering, trayCount: col!.tray_count };
  if (runId) {
    const run = await em.findOne(RatingRun, {
      where: { id: runId, columnId },
      select: { id: true, label: true, loadCaseName: true, snapshot: true },
    });
    if (!run) throw new ValidationError('Invalid query', [{ path: 'runId', message: 'is not a rating run of this column' }]);
    const s = run.snapshot;
    return {
      ...base,
      runId: run.id,
      runLabel: run.loadCaseName ? `${run.label} (${run.loadCaseName})` : run.label,
      sections: s.sections.map((x) => ({ ...x.geometry, name: x.name, fromTray: x.firstTray, toTray: x.lastTray })),
      loads: s.loads,
      methods: s.methods,
    };
  }
  const rows = (await em.query(
    `SELECT name, first_tray, last_tray, geometry FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`,
    [columnId],
  )) as SectionRow[];
  const sections: StudySection[] = rows.map((r) => ({
    ...r.geometry,
    name: r.name,
    fromTray: r.first_tray,
    toTray: r.last_tray,
  }));
  return { ...base, runId: null, runLabel: null, sections, loads: null, methods: null };
}

/** The engine input of one scan line (densities from the record, else the median of the run's loads). */
function scanInput(
  basis: ReadingBasis,
  d: EvidenceDataByKind['gamma-scan'],
  line: EvidenceDataByKind['gamma-scan']['lines'][number],
  loads: TrayLoad[] | null,
): unknown {
  const rhoL = d.liquidDensity_kg_m3 ?? median((loads ?? []).map((l) => l.liquidDensity_kg_m3));
  const rhoV = d.vapourDensity_kg_m3 || median((loads ?? []).map((l) => l.vapourDensity_kg_m3));
  return {
    sections: basis.sections,
    numbering: basis.numbering,
    datum: { tray: d.datum.tray, elevation_m: d.datum.elevation_m, offset_m: d.datum.nudge_m },
    ...(loads ? { trays: loads } : {}),
    ...(basis.methods ? { methods: basis.methods } : {}),
    liquidDensity_kg_m3: rhoL,
    vapourDensity_kg_m3: rhoV,
    scan: line.points.map((p) =>
      line.measure === 'density'
        ? { elevation_m: p.elevation_m, density_kg_m3: p.value }
        : { elevation_m: p.elevation_m, countRate: p.value },
    ),
    ...(line.calibration
      ? { calibration: { vapourCountRate: line.calibration.vapourCountRate, liquidCountRate: line.calibration.liquidCountRate } }
      : {}),
  } satisfies Partial<Record<keyof GammaScanInput, unknown>>;
}

/** Engine paths (/datum/tray) as the record's field names (data.datum.tray); the rest keep the engine's own. */
const recordPath = (p: string, line: number): string => {
  const dotted = p.replace(/^\//, '').replace(/\//g, '.');
  if (dotted.startsWith('scan')) return `data.lines.${line}.points${dotted.slice(4)}`;
  if (dotted.startsWith('datum') || dotted.endsWith('Density_kg_m3')) return `data.${dotted}`;
  if (dotted.startsWith('calibration')) return `data.lines.${line}.${dotted}`;
  return dotted || 'data';
};

export async function readEvidence(ds: DataSource, user: SessionUser, id: string, runId?: string): Promise<EvidenceReading> {
  const em = ds.manager;
  const ev = await visibleEvidence(em, user, id);
  if (ev.kind !== 'gamma-scan')
    throw new ValidationError('Not a gamma scan', [{ path: 'id', message: `is a ${ev.kind}; only gamma scans are read here` }]);
  const basis = await readingBasis(em, ev.columnId, runId ?? ev.runId);
  if (!basis.sections.length)
    throw new ValidationError('The column has no tray sections', [
      { path: 'sections', message: 'add the tray sections (tray spacing) before reading a scan against the trays' },
    ]);
  const d = ev.data as EvidenceDataByKind['gamma-scan'];
  if (
    !basis.sections.some((x) => d.datum.tray >= Math.min(x.fromTray, x.toTray) && d.datum.tray <= Math.max(x.fromTray, x.toTray))
  )
    throw new ValidationError('Datum outside the sections', [
      { path: 'data.datum.tray', message: `tray ${d.datum.tray} is in none of the column's tray sections` },
    ]);
  const decks = trayDeckElevations(basis.sections, basis.numbering, {
    tray: d.datum.tray,
    elevation_m: d.datum.elevation_m,
    offset_m: d.datum.nudge_m,
  });
  const lines = d.lines.map((line, i) => {
    const v = validateGammaScanInput(scanInput(basis, d, line, basis.loads));
    if (!v.ok)
      return {
        label: line.label,
        result: null,
        errors: v.errors.map((e) => ({ path: recordPath(e.path, i), message: e.message })),
      };
    return { label: line.label, result: runGammaScan(v.value), errors: [] };
  });
  return {
    evidenceId: ev.id,
    runId: basis.runId,
    runLabel: basis.runLabel,
    numbering: basis.numbering,
    trayCount: basis.trayCount,
    datum: d.datum,
    decks,
    lines,
  };
}
