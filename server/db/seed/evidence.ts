/**
 * Demo field evidence on T-701, all invented: a gamma scan of trays 1–16 made with the field-evidence engine's
 * synthetic generator from our own model of the 'Summer normal' rating (trays 4 and 5 flooded, tray 12 without
 * its tray peak as if it had fallen; seeded noise), never from a real scan; a small ΔP survey and a temperature
 * survey of the same operating case, linked to that run.
 */
import type { EntityManager } from 'typeorm';
import { RatingRun, type TowerColumn, type User } from '../entities/index.js';
import {
  frothHeightsFromRating,
  predictTrays,
  syntheticGammaScan,
  trayDeckElevations,
} from '../../engine/fieldEvidence/index.js';
import { toSessionUser } from '../../services/auth/users.js';
import { insertEvidence } from '../../services/evidence/evidence.js';
import { DEMO_SECTIONS } from './demoColumn.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';

const TAKEN_ON = '2026-03-18';
const CASE = 'Summer normal, steady for 6 h before the scan';
/** the invented scan's zero is grade; the deck of tray 8 sits 31.40 m above it */
const DATUM = { tray: 8, elevation_m: 31.4, nudge_m: 0 };
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export async function seedEvidence(em: EntityManager, column: TowerColumn, users: User[]): Promise<void> {
  const inspector = toSessionUser(users.find((u) => u.role === 'inspector') ?? users[0]!);
  const engineer = toSessionUser(users.find((u) => u.role === 'process-engineer') ?? users[0]!);
  const [run] = await em.query<{ id: string }[]>(
    `SELECT id FROM rating_runs WHERE column_id = $1 AND load_case_name = 'Summer normal' ORDER BY created_at LIMIT 1`,
    [column.id],
  );
  const { snapshot } = await em.findOneOrFail(RatingRun, { where: { id: run!.id }, select: { id: true, snapshot: true } });
  const sections: StudySection[] = DEMO_SECTIONS.map((s) => ({
    ...s.geometry,
    name: s.name,
    fromTray: s.firstTray,
    toTray: s.lastTray,
  }));
  const loads = snapshot.loads;
  const scanned = loads.filter((l) => l.tray <= 16);
  const rhoL = median(scanned.map((l) => l.liquidDensity_kg_m3));
  const rhoV = median(scanned.map((l) => l.vapourDensity_kg_m3));
  const decks = trayDeckElevations(sections, column.numbering, { tray: DATUM.tray, elevation_m: DATUM.elevation_m });
  const deck = (t: number) => decks.find((d) => d.tray === t)!;
  const points = syntheticGammaScan({
    decks,
    frothHeights: frothHeightsFromRating(sections, loads, { 4: 'flooded', 5: 'flooded', 12: 'missing' }, snapshot.methods),
    defaultFrothHeight_mm: 150,
    vapourDensity_kg_m3: rhoV,
    liquidDensity_kg_m3: rhoL,
    frothDensity_kg_m3: 0.3 * rhoL,
    from_m: deck(16).deckElevation_m - 0.15,
    to_m: deck(1).deckElevation_m + deck(1).traySpacing_mm / 1000 + 0.3,
    step_m: 0.025,
    noise_kg_m3: 8,
    seed: 701,
  });
  const line = {
    chord: '0°–180°, across the active area clear of the downcomers',
    orientation_deg: 0,
    pass: null,
    takenOn: TAKEN_ON,
    operatingCase: CASE,
    measure: 'density' as const,
    calibration: null,
  };
  await insertEvidence(em, inspector, column.id, {
    kind: 'gamma-scan',
    title: 'Top-section scan after off-spec kerosene',
    takenOn: TAKEN_ON,
    operatingCase: CASE,
    runId: run!.id,
    notes: 'Invented demonstration scan made from our own model of the base rating.',
    data: {
      datum: DATUM,
      liquidDensity_kg_m3: rhoL,
      vapourDensity_kg_m3: rhoV,
      lines: [
        {
          ...line,
          label: 'Line A',
          points: points.map((p) => ({ elevation_m: p.elevation_m, value: Math.max(0, p.density_kg_m3!) })),
        },
      ],
    },
  });
  const predicted = predictTrays(sections, loads, snapshot.methods);
  const sumDp = (from: number, to: number) =>
    [...predicted.values()].filter((p) => p.tray >= from && p.tray <= to).reduce((a, p) => a + p.totalPressureDrop_Pa, 0);
  await insertEvidence(em, engineer, column.id, {
    kind: 'dp-survey',
    title: 'ΔP survey across the top section',
    takenOn: TAKEN_ON,
    operatingCase: CASE,
    runId: run!.id,
    data: {
      datum: DATUM,
      gauge: 'one portable digital gauge moved between nozzles, impulse lines blown through before each reading',
      vapourHeadCorrected: false,
      readings: [
        {
          label: 'Top section (N2 to N5)',
          upperElevation_m: null,
          lowerElevation_m: null,
          section: 'Top (above top PA)',
          measured_Pa: Math.round(sumDp(1, 8) * 2.4),
        },
        {
          label: 'Trays 9–16 (N5 to N8)',
          upperElevation_m: deck(9).deckElevation_m + 0.3,
          lowerElevation_m: deck(16).deckElevation_m - 0.3,
          section: null,
          measured_Pa: Math.round(sumDp(9, 16) * 1.05),
        },
      ],
    },
  });
  const temp = (t: number, dev: number) => ({
    tray: t,
    temperature_C: Math.round((loads.find((l) => l.tray === t)!.temperature_C! + dev) * 10) / 10,
  });
  await insertEvidence(em, engineer, column.id, {
    kind: 'temperature-survey',
    title: 'Shell temperature survey',
    takenOn: TAKEN_ON,
    operatingCase: CASE,
    runId: run!.id,
    data: {
      instrument: 'contact thermometer on the insulated shell at the tray inspection plugs',
      readings: [temp(2, 1.2), temp(5, 11), temp(10, -0.8), temp(14, 0.4)],
    },
  });
}
