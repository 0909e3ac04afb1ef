/**
 * PDF report of an inspection (pdfmake 0.3, Noto Sans shipped with @expo-google-fonts/noto-sans):
 * cover with safety cautions, per-tray sheets, tolerance table, photo log, punch list, signatures.
 */
import type { DataSource } from 'typeorm';
import { InspectionPhoto } from '../../db/entities/InspectionPhoto.js';
import { getObjectBuffer } from '../../storage/s3.js';
import { getInspection } from '../inspections/inspections.js';
import { pdfDateTime, pdfFileName, renderPdf, type Content, type PdfParts } from './pdfEngine.js';
import {
  DAMAGE_LABELS,
  INSPECTION_STATUS_LABELS,
  PUNCH_PRIORITY_LABELS,
  TOLERANCE_ITEM_LABELS,
  publishedSource,
} from '../../../shared/labels.js';
import { ROLE_LABELS, type Role } from '../../../shared/permissions.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { InspectionRecord, InspectionTrayRecord, MeasurementCheck, PunchItem } from '../../../shared/types/inspections.js';

/** Sentence form of the inspection's state (the chip's label, in lower case). */
const statusWords = (st: InspectionRecord['status']) => INSPECTION_STATUS_LABELS[st].toLowerCase();
const itemText = (c: MeasurementCheck) => `${TOLERANCE_ITEM_LABELS[c.item]}${c.point !== null ? `, point ${c.point + 1}` : ''}`;

export const SAFETY_CAUTIONS = [
  'Column entry is permit-required confined-space work (OSHA 29 CFR 1910.146): atmosphere testing (O2, LEL, H2S, CO), an attendant (hole watch) with tested radio contact, and a rescue plan.',
  'Hydrogen sulfide may be present: continuous gas monitoring and respiratory protection where toxics may be present.',
  'Pyrophoric iron sulfide can ignite when the column is opened: clean before opening, keep internals wet, post a fire watch.',
  'Work at height needs fall protection. The site\u2019s permits and procedures govern; Frothline records permit and gas-test references, it does not issue them.',
];

const yes = (b: boolean) => (b ? 'yes' : 'no');
const list = (xs: number[]) => (xs.length ? xs.join(' / ') : '—');
const verdict = (c: MeasurementCheck) => (c.pass === null ? 'not checked' : c.pass ? 'pass' : 'FAIL');

function traySheet(t: InspectionTrayRecord): Content[] {
  const f = t.findings;
  const m = (label: string, design: string, a: string, b: string) => [label, design, a, b];
  return [
    { text: `Tray ${t.tray} · pass ${t.pass}`, style: 'h2', pageBreak: 'before' },
    {
      table: {
        widths: ['*', '*', '*', '*'],
        body: [
          ['Fouling / plugging', `${yes(f.fouling)} (${f.blockedPercent} % blocked)`, 'Corrosion / erosion', yes(f.corrosion)],
          ['Uplift / crushing', DAMAGE_LABELS[f.damage], 'Valves missing / stuck', `${f.valvesMissing} / ${f.valvesStuck}`],
          ['Loose fasteners', yes(f.looseFasteners), 'Debris', yes(f.debris)],
          ['Manway installed', yes(f.manwayInstalled), 'Closure witnessed', yes(f.closureWitnessed)],
        ],
      },
      margin: [0, 4, 0, 8],
    },
    f.notes ? { text: `Notes: ${f.notes}`, margin: [0, 0, 0, 8] } : '',
    {
      table: {
        headerRows: 1,
        widths: ['*', 'auto', 'auto', 'auto'],
        body: [
          [
            { text: 'Measurement (mm)', bold: true },
            { text: 'Design', bold: true },
            { text: 'As found', bold: true },
            { text: 'As left', bold: true },
          ],
          m('Weir height', String(t.design.weirHeight_mm ?? '—'), list(t.asFound.weirHeight_mm), list(t.asLeft.weirHeight_mm)),
          m(
            'Downcomer clearance',
            String(t.design.downcomerClearance_mm ?? '—'),
            list(t.asFound.downcomerClearance_mm),
            list(t.asLeft.downcomerClearance_mm),
          ),
          m('Levelness high − low', '—', String(t.asFound.levelness_mm ?? '—'), String(t.asLeft.levelness_mm ?? '—')),
          m(
            'Tray spacing',
            String(t.design.traySpacing_mm ?? '—'),
            String(t.asFound.traySpacing_mm ?? '—'),
            String(t.asLeft.traySpacing_mm ?? '—'),
          ),
        ],
      },
    },
  ];
}

/** The checks of every measurement entered; a sentence instead of an empty table when none was entered. */
export function toleranceTable(r: InspectionRecord): Content {
  if (!r.trays.some((t) => t.checks.asFound.length + t.checks.asLeft.length > 0))
    return {
      text: r.trays.length
        ? 'No weir height, downcomer clearance, levelness or tray spacing has been entered yet, so nothing is checked against the tolerances.'
        : 'No trays recorded.',
    };
  const body: Content[] = [
    ['Tray', 'Pass', 'State', 'Item', 'Measured', 'Check', 'Result'].map((h) => ({ text: h, bold: true })),
  ];
  for (const t of r.trays)
    for (const [state, cs] of [
      ['as found', t.checks.asFound],
      ['as left', t.checks.asLeft],
    ] as const)
      for (const c of cs)
        body.push([
          String(t.tray),
          String(t.pass),
          state,
          itemText(c),
          `${c.measured} mm`,
          c.message,
          { text: verdict(c), color: c.pass === false ? '#b00020' : c.pass ? '#1b5e20' : '#555555', bold: c.pass === false },
        ]);
  return { table: { headerRows: 1, widths: ['auto', 'auto', 'auto', 'auto', 'auto', '*', 'auto'], body }, fontSize: 8 };
}

export async function inspectionPdf(ds: DataSource, user: SessionUser, id: string): Promise<{ pdf: Buffer; filename: string }> {
  const r = await getInspection(ds, user, id);
  const rows = await ds.manager.findBy(InspectionPhoto, { inspectionId: id });
  const photos: Content[] = [];
  for (const p of rows) {
    const img = await getObjectBuffer(p.thumbKey).catch(() => null);
    photos.push({
      columns: [
        img
          ? { image: `data:image/jpeg;base64,${img.toString('base64')}`, width: 160 }
          : { text: '(photo unavailable)', width: 160 },
        {
          text: `Tray ${p.tray ?? '—'}${p.pass ? ` pass ${p.pass}` : ''} · ${p.finding || 'general'}\n${p.caption}\nTaken or uploaded ${pdfDateTime(p.uploadedAt)}`,
          margin: [8, 0, 0, 0],
        },
      ],
      margin: [0, 0, 0, 8],
    });
  }
  const pdf = await renderPdf(inspectionDoc(r, photos), user.unitSystem);
  return { pdf, filename: pdfFileName('inspection', r.columnTag, r.turnaround) };
}

/** The inspection report's parts (tested without rendering), the photo log already laid out. */
export function inspectionDoc(r: InspectionRecord, photos: Content[]): PdfParts {
  const sig = (label: string, s: InspectionRecord['inspectorSignature']) => [
    label,
    s ? `${s.name} (${ROLE_LABELS[s.role as Role] ?? s.role}), ${pdfDateTime(s.at)}` : 'not signed',
  ];
  return {
    header: `${r.columnTag} · ${r.turnaround} · turnaround inspection`,
    footer: `Inspection record · ${statusWords(r.status)} · printed ${pdfDateTime(new Date())}`,
    content: [
      { text: `Turnaround inspection — ${r.columnTag}`, style: 'h1' },
      { text: `${r.turnaround} · ${r.startDate}${r.endDate ? ` – ${r.endDate}` : ''} · ${statusWords(r.status)}` },
      {
        text: `Inspector ${r.inspectorName ?? '—'} · entry permit ${r.permitRef || '—'} · gas test ${r.gasTestRef || '—'} (references recorded, not issued)`,
      },
      {
        text: `Tolerances: ${r.ruleSet.name}; levelness class ${r.rules.levelnessClass}. Source: ${publishedSource(r.ruleSet.source)}`,
      },
      { text: 'Safety cautions', style: 'h2' },
      { ul: SAFETY_CAUTIONS },
      { text: 'Signatures', style: 'h2' },
      { table: { widths: ['auto', '*'], body: [sig('Inspector', r.inspectorSignature), sig('Engineer', r.engineerSignature)] } },
      { text: 'Punch list', style: 'h2' },
      ...(r.punch.some((p) => p.status === 'void')
        ? [{ text: 'Voided items are struck through and do not count as open.', fontSize: 8, margin: [0, 0, 0, 4] }]
        : []),
      r.punch.length
        ? {
            table: {
              headerRows: 1,
              widths: ['auto', 'auto', 'auto', '*', '*', 'auto', 'auto', 'auto'],
              body: [
                ['#', 'Tray', 'Pass', 'Finding', 'Action', 'Priority', 'Owner', 'Status'].map((h) => ({ text: h, bold: true })),
                ...r.punch.map((p) => punchRow(p)),
              ],
            },
            fontSize: 8,
          }
        : { text: 'No punch items.' },
      { text: 'Tolerance checks', style: 'h2' },
      toleranceTable(r),
      { text: 'Photo log', style: 'h2', pageBreak: 'before' },
      photos.length ? photos : { text: 'No photos.' },
      ...r.trays.flatMap(traySheet),
      {
        text: 'Screening record: hydraulic consequences need confirmation by the internals vendor and licensed engineers; site permits and local codes govern.',
        italics: true,
        margin: [0, 12, 0, 0],
      },
    ],
  };
}

/** One punch-list row; a voided item is struck through and its status says who voided it, when and why. */
function punchRow(p: PunchItem): Content[] {
  const status =
    p.status === 'closed'
      ? `closed by ${p.closedByName ?? '—'}${p.closedAt ? `, ${pdfDateTime(p.closedAt)}` : ''}`
      : p.status === 'void'
        ? `voided by ${p.voidedByName ?? '—'}${p.voidedAt ? `, ${pdfDateTime(p.voidedAt)}` : ''}: ${p.voidReason}`
        : 'open';
  const strike = p.status === 'void' ? { decoration: 'lineThrough' as const, color: '#666666' } : {};
  return [
    String(p.itemNo),
    String(p.tray ?? '—'),
    String(p.pass ?? '—'),
    p.finding,
    p.action,
    PUNCH_PRIORITY_LABELS[p.priority],
    p.owner,
  ]
    .map((text) => ({ text, ...strike }))
    .concat({ text: status });
}
