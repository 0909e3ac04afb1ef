/**
 * A stored gamma scan read against the rating: the column's sections (or those of the chosen run's snapshot),
 * the datum with its nudge, the run's loads for the prediction, and each scan line through the field-evidence
 * engine. No engine logic here: this only assembles the engine's input from stored rows.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { ValidationError } from '../../errors.js';
import {
  runGammaScan,
  runPressureDropSurvey,
  runTemperatureSurvey,
  trayDeckElevations,
  validateGammaScanInput,
  validatePressureDropSurveyInput,
  validateTemperatureSurveyInput,
} from '../../engine/fieldEvidence/index.js';
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
  const [col] = await em.query<
    {
      numbering: 'top-down' | 'bottom-up';
      tray_count: number;
    }[]
  >(`SELECT numbering, tray_count FROM columns WHERE id = $1`, [columnId]);
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
  const rows = await em.query<SectionRow[]>(
    `SELECT name, first_tray, last_tray, geometry FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`,
    [columnId],
  );
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

const NEEDS_RUN = [
  {
    path: 'runId',
    message: 'choose a rating run of this column (same operating case) to compare the survey with its prediction',
  },
];
const renamePaths = (errors: { path: string; message: string }[], line = 0) =>
  errors.map((e) => ({ path: recordPath(e.path.replace('/measurements', '/readings'), line), message: e.message }));

function datumCovered(basis: ReadingBasis, tray: number): void {
  if (!basis.sections.some((x) => tray >= Math.min(x.fromTray, x.toTray) && tray <= Math.max(x.fromTray, x.toTray)))
    throw new ValidationError('Datum outside the sections', [
      { path: 'data.datum.tray', message: `tray ${tray} is in none of the column's tray sections` },
    ]);
}

function pressureDropReading(basis: ReadingBasis, d: EvidenceDataByKind['dp-survey']): EvidenceReading['pressureDrop'] {
  if (!basis.loads) return { result: null, errors: NEEDS_RUN };
  const v = validatePressureDropSurveyInput({
    sections: basis.sections,
    numbering: basis.numbering,
    datum: { tray: d.datum.tray, elevation_m: d.datum.elevation_m, offset_m: d.datum.nudge_m },
    trays: basis.loads,
    ...(basis.methods ? { methods: basis.methods } : {}),
    measurements: d.readings.map((r) => ({
      label: r.label,
      ...(r.section !== null
        ? { section: r.section }
        : { upperElevation_m: r.upperElevation_m!, lowerElevation_m: r.lowerElevation_m! }),
      measured_Pa: r.measured_Pa,
      vapourHeadCorrected: d.vapourHeadCorrected,
    })),
  });
  return v.ok ? { result: runPressureDropSurvey(v.value), errors: [] } : { result: null, errors: renamePaths(v.errors) };
}

function temperatureReading(basis: ReadingBasis, d: EvidenceDataByKind['temperature-survey']): EvidenceReading['temperature'] {
  if (!basis.loads) return { result: null, errors: NEEDS_RUN };
  const v = validateTemperatureSurveyInput({ trays: basis.loads, measurements: d.readings });
  return v.ok ? { result: runTemperatureSurvey(v.value), errors: [] } : { result: null, errors: renamePaths(v.errors) };
}

export async function readEvidence(ds: DataSource, user: SessionUser, id: string, runId?: string): Promise<EvidenceReading> {
  const em = ds.manager;
  const ev = await visibleEvidence(em, user, id);
  const basis = await readingBasis(em, ev.columnId, runId ?? ev.runId);
  const head = {
    evidenceId: ev.id,
    kind: ev.kind,
    runId: basis.runId,
    runLabel: basis.runLabel,
    numbering: basis.numbering,
    trayCount: basis.trayCount,
  };
  if (ev.kind === 'temperature-survey')
    return {
      ...head,
      datum: null,
      decks: [],
      lines: [],
      pressureDrop: null,
      temperature: temperatureReading(basis, ev.data as EvidenceDataByKind['temperature-survey']),
    };
  if (!basis.sections.length)
    throw new ValidationError('The column has no tray sections', [
      { path: 'sections', message: 'add the tray sections (tray spacing) before reading evidence against the trays' },
    ]);
  const d = ev.data as EvidenceDataByKind['gamma-scan' | 'dp-survey'];
  datumCovered(basis, d.datum.tray);
  const decks = trayDeckElevations(basis.sections, basis.numbering, {
    tray: d.datum.tray,
    elevation_m: d.datum.elevation_m,
    offset_m: d.datum.nudge_m,
  });
  if (ev.kind === 'dp-survey')
    return {
      ...head,
      datum: d.datum,
      decks,
      lines: [],
      pressureDrop: pressureDropReading(basis, ev.data as EvidenceDataByKind['dp-survey']),
      temperature: null,
    };
  const scan = ev.data as EvidenceDataByKind['gamma-scan'];
  const lines = scan.lines.map((line, i) => {
    const v = validateGammaScanInput(scanInput(basis, scan, line, basis.loads));
    if (!v.ok) return { label: line.label, result: null, errors: renamePaths(v.errors, i) };
    return { label: line.label, result: runGammaScan(v.value), errors: [] };
  });
  return { ...head, datum: d.datum, decks, lines, pressureDrop: null, temperature: null };
}
