/**
 * Invented demo inspection of T-701 at an invented autumn 2025 turnaround: a few trays with findings
 * and measurements, punch items, signed by the inspector and waiting for the engineer. All numbers are ours.
 */
import type { EntityManager } from 'typeorm';
import { Inspection, InspectionTray, PunchItemEntity, type User } from '../entities/index.js';
import type { PunchPriority, TrayFindings, TrayMeasurements } from '../../../shared/types/inspections.js';

const F: TrayFindings = {
  fouling: false,
  blockedPercent: 0,
  corrosion: false,
  damage: 'none',
  valvesMissing: 0,
  valvesStuck: 0,
  looseFasteners: false,
  manwayInstalled: true,
  closureWitnessed: true,
  debris: false,
  notes: '',
};
const M = (weir: number[], clearance: number[], level: number | null, spacing: number | null = null): TrayMeasurements => ({
  weirHeight_mm: weir,
  downcomerClearance_mm: clearance,
  levelness_mm: level,
  traySpacing_mm: spacing,
});

const TRAYS: {
  tray: number;
  pass: number;
  findings: Partial<TrayFindings>;
  asFound: TrayMeasurements;
  asLeft: TrayMeasurements;
}[] = [
  {
    tray: 3,
    pass: 1,
    findings: { notes: 'Clean; light scale on deck' },
    asFound: M([50.5, 51.0, 49.8], [45.2, 44.6, 45.9], 4),
    asLeft: M([50.5, 51.0, 49.8], [45.2, 44.6, 45.9], 4),
  },
  {
    tray: 3,
    pass: 2,
    findings: { looseFasteners: true, notes: 'Six clamps loose at the centre downcomer; re-tightened' },
    asFound: M([50.2, 52.4], [46.8, 47.3], 5),
    asLeft: M([50.2, 51.2], [45.8, 45.5], 4),
  },
  {
    tray: 12,
    pass: 1,
    findings: {
      valvesMissing: 14,
      valvesStuck: 30,
      corrosion: true,
      notes: 'Carbon-steel valves stuck partly closed; 14 missing, found on tray 13',
    },
    asFound: M([49.6, 50.3], [48.1, 51.9], 6),
    asLeft: M([49.6, 50.3], [49.2, 50.4], 5),
  },
  {
    tray: 33,
    pass: 1,
    findings: { fouling: true, blockedPercent: 25, notes: 'Coke deposit on the inlet half of the deck; sample taken' },
    asFound: M([66.0, 65.4], [53.0, 54.8], 7, 762),
    asLeft: M([65.4, 65.0], [55.3, 55.1], 6, 762),
  },
  {
    tray: 41,
    pass: 2,
    findings: { damage: 'uplift', notes: 'Two panels bent down at the edges; replaced' },
    asFound: M([50.8], [47.9, 52.6], 11),
    asLeft: M([50.3], [50.4, 49.7], 5),
  },
];

const PUNCH: {
  tray: number | null;
  pass: number | null;
  finding: string;
  action: string;
  priority: PunchPriority;
  owner: string;
  closed: boolean;
}[] = [
  {
    tray: 12,
    pass: 1,
    finding: '14 valves missing, 30 stuck',
    action: 'Replace missing valves; free or replace stuck ones',
    priority: 'before-box-up',
    owner: 'Tray contractor',
    closed: true,
  },
  {
    tray: 33,
    pass: 1,
    finding: 'Coke on deck, about 25 % of holes blocked',
    action: 'Hydro-blast deck and re-inspect',
    priority: 'before-box-up',
    owner: 'Cleaning contractor',
    closed: true,
  },
  {
    tray: 41,
    pass: 2,
    finding: 'Uplift damage on two panels',
    action: 'Replace panels; check hold-down clamps',
    priority: 'before-box-up',
    owner: 'Tray contractor',
    closed: true,
  },
  {
    tray: null,
    pass: null,
    finding: 'Carbon-steel valves stick in fouling service',
    action: 'Review stainless valves for trays 9–30',
    priority: 'next-turnaround',
    owner: 'Process engineering',
    closed: false,
  },
];

export async function seedInspection(em: EntityManager, columnId: string, users: User[]): Promise<void> {
  const inspector = users.find((u) => u.role === 'inspector');
  if (!inspector) return;
  const insp = await em.save(
    Inspection,
    em.create(Inspection, {
      columnId,
      turnaround: 'Marrowby TA-2025 (autumn)',
      startDate: '2025-09-29',
      endDate: '2025-10-16',
      inspectorId: inspector.id,
      permitRef: 'CSE-25-0917',
      gasTestRef: 'GT-25-0917-03',
      rules: { kind: 'published', levelnessClass: 'A' },
      notes: 'Invented demo record.',
      status: 'inspector-signed',
      createdBy: inspector.id,
      asFoundRunIds: [],
      inspectorSignature: { userId: inspector.id, name: inspector.name, role: inspector.role, at: '2025-10-16T15:30:00.000Z' },
    }),
  );
  for (const t of TRAYS)
    await em.save(
      InspectionTray,
      em.create(InspectionTray, {
        inspectionId: insp.id,
        tray: t.tray,
        pass: t.pass,
        findings: { ...F, ...t.findings },
        asFound: t.asFound,
        asLeft: t.asLeft,
        updatedBy: inspector.id,
      }),
    );
  let n = 0;
  for (const p of PUNCH)
    await em.save(
      PunchItemEntity,
      em.create(PunchItemEntity, {
        inspectionId: insp.id,
        itemNo: ++n,
        tray: p.tray,
        pass: p.pass,
        finding: p.finding,
        action: p.action,
        priority: p.priority,
        owner: p.owner,
        status: p.closed ? 'closed' : 'open',
        closedBy: p.closed ? inspector.id : null,
        closedAt: p.closed ? new Date('2025-10-15T12:00:00Z') : null,
      }),
    );
}
