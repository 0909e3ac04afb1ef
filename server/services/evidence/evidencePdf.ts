/**
 * Field-evidence report (PDF, A4 landscape): the record, the cautions, then side by side the scan with the
 * trays and findings drawn and the tray-by-tray reading against the prediction (or the survey tables), and the
 * methods with their sources stated once.
 */
import type { DataSource } from 'typeorm';
import { FIELD_EVIDENCE_METHODS } from '../../engine/fieldEvidence/index.js';
import { type Content, type PdfParts, pdfDateTime, pdfFileName, renderPdf } from '../reports/pdfEngine.js';
import { scanChartSvg } from './evidenceChartSvg.js';
import { getEvidence } from './evidence.js';
import { readEvidence } from './evidenceReading.js';
import {
  DP_LABELS,
  EVIDENCE_CAUTIONS,
  EVIDENCE_KIND_LABELS,
  SCAN_FINDING_LABELS,
  T_LABELS,
  trayBothWays,
} from '../../../shared/evidenceLabels.js';
import { publishedSource } from '../../../shared/labels.js';
import { formatQuantity, fromSI, QUANTITIES, unitLabel } from '../../../shared/units.js';
import type { SessionUser, UnitSystem } from '../../../shared/types/api.js';
import type { EvidenceReading, EvidenceRecord } from '../../../shared/types/evidence.js';
import type { GammaScanResult } from '../../../shared/types/fieldEvidence.js';

const th = (texts: string[]) => texts.map((text) => ({ text, style: 'th' }));
const table = (widths: (string | number)[], head: string[], body: (string | Content)[][]): Content => ({
  table: { headerRows: 1, widths, body: [th(head), ...body] },
  layout: 'lightHorizontalLines',
  fontSize: 7.5,
});

function scanChart(r: EvidenceReading, res: GammaScanResult, sys: UnitSystem): Content {
  const svg = scanChartSvg(r, res, {
    z: (m) => fromSI('lengthLarge', m, QUANTITIES.lengthLarge[sys === 'SI' ? 'siUnitId' : 'usUnitId']),
    rho: (x) => fromSI('density', x, QUANTITIES.density[sys === 'SI' ? 'siUnitId' : 'usUnitId']),
    zLabel: unitLabel('lengthLarge', sys),
    rhoLabel: unitLabel('density', sys),
  });
  return { svg, width: 330 };
}

function scanTable(r: EvidenceReading, res: GammaScanResult, sys: UnitSystem): Content {
  const mm = (v: number | undefined) => (v === undefined ? '—' : formatQuantity('lengthSmall', v, sys));
  const u = unitLabel('lengthSmall', sys);
  return table(
    [62, 38, 38, 38, 40, 52, '*'],
    ['Tray', `Froth read (${u})`, `Clear space (${u})`, `Predicted froth (${u})`, `Predicted DC backup (${u})`, 'Finding', 'Why'],
    res.trays.map((t) => [
      trayBothWays(t.tray, r.trayCount, r.numbering),
      mm(t.frothHeight_mm),
      mm(t.clearVapourSpace_mm),
      mm(t.predictedFrothHeight_mm),
      mm(t.predictedDowncomerBackup_mm),
      { text: SCAN_FINDING_LABELS[t.finding], bold: t.finding !== 'normal' },
      t.reason,
    ]),
  );
}

function surveyBlocks(r: EvidenceReading, sys: UnitSystem): Content[] {
  const out: Content[] = [];
  const pa = (v: number) => formatQuantity('pressureDrop', v, sys);
  const dpU = unitLabel('pressureDrop', sys);
  const dp = r.pressureDrop?.result;
  if (dp)
    out.push(
      { text: 'Pressure drop against the rating', style: 'h2' },
      table(
        ['*', 50, 45, 45, 45, 30, 50, 60, '*'],
        [
          'Reading',
          'Trays',
          `Measured (${dpU})`,
          `Less vapour head (${dpU})`,
          `Predicted (${dpU})`,
          'Ratio',
          `Flooded tray would show (${dpU}/tray)`,
          'Flag',
          'Why',
        ],
        dp.rows.map((x) => [
          x.label,
          x.trays.length > 1 ? `${x.trays[0]}–${x.trays[x.trays.length - 1]}` : String(x.trays[0]),
          pa(x.measured_Pa),
          pa(x.corrected_Pa),
          pa(x.predicted_Pa),
          x.ratio.toFixed(2),
          pa(x.floodingPerTray_Pa),
          { text: DP_LABELS[x.flag], bold: x.flag !== 'as-predicted' },
          x.reason,
        ]),
      ),
      { ul: dp.notes, style: 'small' },
    );
  const t = r.temperature?.result;
  const tU = unitLabel('temperature', sys);
  if (t)
    out.push(
      { text: 'Tray temperatures against the load case', style: 'h2' },
      table(
        [80, 55, 55, 50, 70, '*'],
        ['Tray', `Measured (${tU})`, `Load case (${tU})`, 'Deviation (K)', 'Flag', 'Why'],
        t.rows.map((x) => [
          trayBothWays(x.tray, r.trayCount, r.numbering),
          formatQuantity('temperature', x.measured_C, sys),
          x.predicted_C === null ? '—' : formatQuantity('temperature', x.predicted_C, sys),
          x.deviation_K === null ? '—' : x.deviation_K.toFixed(1),
          { text: T_LABELS[x.flag], bold: x.flag !== 'as-predicted' },
          x.reason,
        ]),
      ),
      { ul: t.notes, style: 'small' },
    );
  const errors = [...(r.pressureDrop?.errors ?? []), ...(r.temperature?.errors ?? [])];
  if (errors.length) out.push({ text: `Not compared: ${errors.map((e) => e.message).join('; ')}`, italics: true });
  return out;
}

/** The methods this reading used, each with its published source and uncertainty once. */
function methodsBlock(rec: EvidenceRecord, r: EvidenceReading): Content[] {
  const ids: string[] = [];
  if (rec.kind === 'gamma-scan') {
    if (rec.data.lines.some((l) => l.measure === 'count-rate')) ids.push('densityFromCountRateBeerLambert');
    if (r.runId) ids.push('frothHeightFromClearLiquid');
  }
  if (rec.kind === 'dp-survey') ids.push('vapourStaticHead', 'floodedTrayPressureDrop');
  const rows = ids
    .map((id) => FIELD_EVIDENCE_METHODS[id])
    .filter((m) => m !== undefined)
    .map((m) => [m.label, publishedSource(m.source), m.uncertainty ?? '']);
  const basis = r.lines.find((l) => l.result)?.result?.threshold.basis;
  return [
    { text: 'Methods and sources', style: 'h2' },
    ...(basis ? [{ text: `Reading the scan: ${basis}` }] : []),
    ...(rows.length ? [table([150, '*', 200], ['Method', 'Source', 'Uncertainty'], rows)] : []),
  ];
}

export function evidenceReportDoc(
  rec: EvidenceRecord,
  r: EvidenceReading,
  tag: string,
  sys: UnitSystem,
  printedAt = new Date(),
): PdfParts {
  const side: Content[] = r.lines.flatMap((l): Content[] =>
    l.result
      ? [
          { text: `${l.label}: scan, trays and findings beside the prediction`, style: 'h2' },
          { columns: [scanChart(r, l.result, sys), scanTable(r, l.result, sys)], columnGap: 10 },
        ]
      : [{ text: `${l.label} could not be read: ${l.errors.map((e) => e.message).join('; ')}`, italics: true }],
  );
  return {
    pageOrientation: 'landscape',
    header: `${tag} · ${rec.title} · field evidence report`,
    footer: `Screening estimate · printed ${pdfDateTime(printedAt)}`,
    content: [
      { text: `${EVIDENCE_KIND_LABELS[rec.kind]} — ${tag}`, style: 'h1' },
      { text: rec.title, fontSize: 11 },
      {
        text: [
          `Taken ${rec.takenOn} · operating case ${rec.operatingCase || '—'} · recorded by ${rec.authorName ?? '—'}`,
          r.runLabel ? ` · compared with the rating run ${r.runLabel}` : ' · not compared with a rating run',
          rec.inspectionLabel
            ? ` · inspection ${rec.inspectionLabel}${rec.inspectionTiming ? ` (${rec.inspectionTiming} the turnaround)` : ''}`
            : '',
          rec.kind !== 'temperature-survey'
            ? ` · datum: deck of tray ${rec.data.datum.tray} at ${formatQuantity('lengthLarge', rec.data.datum.elevation_m, sys)} ${unitLabel('lengthLarge', sys)}, nudged ${formatQuantity('lengthSmall', rec.data.datum.nudge_m * 1000, sys)} ${unitLabel('lengthSmall', sys)}`
            : '',
        ].join(''),
      },
      { text: 'Cautions', style: 'h2' },
      { ul: [...EVIDENCE_CAUTIONS] },
      ...side,
      ...surveyBlocks(r, sys),
      ...methodsBlock(rec, r),
    ],
  };
}

export async function evidencePdf(
  ds: DataSource,
  user: SessionUser,
  id: string,
  runId?: string,
): Promise<{ pdf: Buffer; filename: string }> {
  const rec = await getEvidence(ds, user, id);
  const reading = await readEvidence(ds, user, id, runId);
  const [col] = await ds.query<{ tag: string }[]>(`SELECT tag FROM columns WHERE id = $1`, [rec.columnId]);
  const pdf = await renderPdf(evidenceReportDoc(rec, reading, col!.tag, user.unitSystem), user.unitSystem);
  return { pdf, filename: pdfFileName('evidence', col!.tag, rec.title) };
}
