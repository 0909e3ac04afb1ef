/** A heat-recovery plan as a PDF report, a CSV (csv-stringify, formulas escaped) or an XLSX workbook (exceljs). */
import { stringify } from 'csv-stringify/sync';
import ExcelJS from 'exceljs';
import type { DataSource } from 'typeorm';
import { chartSvg, legendSvg, type Series } from './reportCharts.js';
import { pdfDateTime, pdfFileName, renderPdf, type Content, type PdfParts } from './pdfEngine.js';
import { methodsTable } from './runReportPdf.js';
import type { ExportFile } from './exportsFormat.js';
import { getHeatPlan } from '../heatPlans/planRead.js';
import { planReportData, type PlanReportData } from './heatPlanReport.js';
import { REVIEW_LABELS } from '../../../shared/labels.js';
import { palette } from '../../../shared/palette.js';
import { toDisplay, unitLabel } from '../../../shared/units.js';
import type { SessionUser, UnitSystem } from '../../../shared/types/api.js';
import type { HeatPlanRecord } from '../../../shared/types/heatPlans.js';

const th = (t: string) => ({ text: t, style: 'th' });
const ACTION_WORDS = { submit: 'Submitted', approve: 'Approved', return: 'Returned' } as const;
const COLOURS = [palette.negative, palette.plum, palette.info, palette.bronze, palette.olive, palette.lagoon, palette.accent];

/** Duty 1 × duty 2: the limit points by tray and check, the current operation and the suggestion. */
function mapChart(p: HeatPlanRecord, sys: UnitSystem): Content[] {
  const r = p.result;
  const d = (kw: number) => toDisplay('duty', kw, sys);
  const groups = new Map<string, [number, number][]>();
  for (const b of r.boundary) {
    const key = `tray ${b.tray} ${b.check === 'dry-out' ? 'dry-out' : b.check}`;
    groups.set(key, [...(groups.get(key) ?? []), [d(b.duties_kW[0]!), d(b.duties_kW[1]!)]]);
  }
  const series: Series[] = [...groups.entries()].slice(0, COLOURS.length).map(([name, points], i) => ({
    name,
    color: COLOURS[i]!,
    kind: 'marker',
    points,
  }));
  series.push({
    name: 'current operation',
    color: palette.dark,
    kind: 'marker',
    points: [[d(r.baseDuties_kW[0]!), d(r.baseDuties_kW[1]!)]],
  });
  if (r.suggestion)
    series.push({
      name: 'suggestion',
      color: palette.secondary,
      kind: 'marker',
      points: [[d(r.suggestion.duties_kW[0]!), d(r.suggestion.duties_kW[1]!)]],
    });
  const unit = unitLabel('duty', sys);
  const svg = chartSvg({
    width: 520,
    height: 260,
    xTitle: `${r.pumpArounds[0]} duty (${unit})`,
    yTitle: `${r.pumpArounds[1]} duty (${unit})`,
    xMin: d(Math.min(...r.axes[0]!)),
    yMin: d(Math.min(...r.axes[1]!)),
    yMax: d(Math.max(...r.axes[1]!)),
    series,
  });
  return [
    {
      unbreakable: true,
      stack: [
        { text: 'Duty map: where trays reach a limit or run dry', style: 'h2' },
        { svg, width: 520 },
        {
          svg: legendSvg(
            series.map((s) => ({ name: s.name, color: s.color })),
            520,
          ),
        },
      ],
    },
  ];
}

const table = (headers: string[], rows: (string | number | null)[][], widths?: string[]): Content => ({
  table: {
    headerRows: 1,
    dontBreakRows: true,
    widths: widths ?? headers.map(() => 'auto'),
    body: [
      headers.map(th),
      ...rows.map((r) => r.map((v) => (v === null ? '—' : typeof v === 'number' ? v.toLocaleString('en-US') : v))),
    ],
  },
  fontSize: 7.5,
});

export function planReportDoc(p: HeatPlanRecord, sys: UnitSystem, printedAt = new Date()): PdfParts {
  const d = planReportData(p, sys);
  const decided = [...p.reviews].reverse().find((r) => r.action !== 'submit');
  return {
    header: `${p.columnTag} · ${p.label} · heat-recovery plan`,
    footer: `Screening estimate · ${REVIEW_LABELS[p.status]} · printed ${pdfDateTime(printedAt)}`,
    content: [
      { text: `Heat-recovery plan — ${p.columnTag}`, style: 'h1' },
      { text: p.label, fontSize: 11 },
      {
        text: `By ${p.authorName}, ${pdfDateTime(p.createdAt)} · ${REVIEW_LABELS[p.status]}${decided ? ` · ${ACTION_WORDS[decided.action].toLowerCase()} by ${decided.userName} on ${pdfDateTime(decided.at)}` : ''}`,
      },
      p.reviewComment ? { text: `Review comment: “${p.reviewComment}”` } : '',
      { text: 'Cautions', style: 'h2' },
      { ul: d.cautions },
      { text: 'Inputs', style: 'h2' },
      { table: { widths: ['auto', '*'], body: d.inputs }, layout: 'lightHorizontalLines' },
      { text: 'Suggested split', style: 'h2' },
      { table: { widths: ['auto', '*'], body: d.suggestion }, layout: 'lightHorizontalLines' },
      { text: 'As the margin changes', style: 'h2' },
      table(d.marginHeaders, d.margins),
      ...(p.result.pumpArounds.length >= 2 ? mapChart(p, sys) : []),
      { text: 'Limits found, by tray and check', style: 'h2' },
      d.limits.length ? table(d.limitHeaders, d.limits) : { text: 'No tray reaches a limit in the duty ranges searched.' },
      { text: 'Fit against simulation', style: 'h2' },
      { text: d.fit },
      d.fitted.length
        ? { table: { widths: ['auto', '*'], body: d.fitted }, layout: 'lightHorizontalLines', margin: [0, 4, 0, 0] }
        : '',
      { text: 'Loads at the grid points', style: 'h2' },
      { text: d.pointsSummary },
      d.simulatedPoints.length ? table(d.pointHeaders, d.simulatedPoints) : '',
      d.traffic.length ? { text: 'Traffic at the suggestion', style: 'h2' } : '',
      d.traffic.length ? table(d.trafficHeaders, d.traffic, ['auto', 'auto', 'auto', '*', 'auto']) : '',
      { text: 'Methods and sources', style: 'h2' },
      { ul: d.notes, fontSize: 7.5, margin: [0, 0, 0, 4] },
      methodsTable(p.result.methodIds),
      p.reviews.length ? { text: 'Review record', style: 'h2' } : '',
      p.reviews.length
        ? table(
            ['When', 'Who', 'Action', 'Comment'],
            p.reviews.map((r) => [pdfDateTime(r.at), r.userName, ACTION_WORDS[r.action], r.comment || '—']),
            ['auto', 'auto', 'auto', '*'],
          )
        : '',
    ],
  };
}

/** CSV blocks one after another, each under a title line; text cells that look like formulas are escaped. */
export function planCsv(d: PlanReportData): Buffer {
  const rows: (string | number | null)[][] = [
    ['Inputs'],
    ...d.inputs,
    [],
    ['Suggested split'],
    ...d.suggestion,
    [],
    ['As the margin changes'],
    d.marginHeaders,
    ...d.margins,
    [],
    ['Limits found, by tray and check'],
    d.limitHeaders,
    ...d.limits,
    [],
    ['Fit against simulation'],
    [d.fit],
    ...d.fitted,
    [],
    ['Grid points'],
    [d.pointsSummary],
    d.pointHeaders,
    ...d.points,
    [],
    ['Traffic at the suggestion'],
    d.trafficHeaders,
    ...d.traffic,
    [],
    ['Cautions'],
    ...d.cautions.map((c) => [c]),
    [],
    ['Methods and sources'],
    ...d.notes.map((n) => [n]),
  ];
  return Buffer.from(stringify(rows, { escape_formulas: true, record_delimiter: 'windows' }), 'utf8');
}

export async function planXlsx(d: PlanReportData): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Frothline';
  const sheet = (name: string, header: string[] | null, rows: (string | number | null)[][], widths: number[]) => {
    const ws = wb.addWorksheet(name);
    if (header) ws.addRow(header).font = { bold: true };
    rows.forEach((r) => ws.addRow(r));
    widths.forEach((w, i) => (ws.getColumn(i + 1).width = w));
  };
  sheet('Inputs', null, d.inputs, [34, 110]);
  sheet('Suggested split', null, [...d.suggestion, [], ['Fit against simulation', d.fit], ...d.fitted], [34, 90]);
  sheet(
    'Grid points',
    d.pointHeaders,
    [...d.points, [], [d.pointsSummary]],
    [...d.pointHeaders.slice(6).map(() => 16), 60, 12, 12, 22, 14, 30],
  );
  sheet('Margin', d.marginHeaders, d.margins, [12, 22, 22, 22, 30]);
  sheet('Limits', d.limitHeaders, d.limits, [8, 26, 14, 30, 30, 30]);
  sheet('Traffic at suggestion', d.trafficHeaders, d.traffic, [8, 16, 16, 24, 12]);
  sheet('Cautions and methods', null, [...d.cautions.map((c) => [c]), [], ...d.notes.map((n) => [n])], [140]);
  return Buffer.from(await wb.xlsx.writeBuffer());
}

export async function heatPlanReportPdf(
  ds: DataSource,
  user: SessionUser,
  id: string,
): Promise<{ pdf: Buffer; filename: string }> {
  const p = await getHeatPlan(ds, user, id);
  return {
    pdf: await renderPdf(planReportDoc(p, user.unitSystem), user.unitSystem),
    filename: pdfFileName('heat-plan', p.columnTag, p.label),
  };
}

export async function exportHeatPlan(ds: DataSource, user: SessionUser, id: string, format: 'csv' | 'xlsx'): Promise<ExportFile> {
  const p = await getHeatPlan(ds, user, id);
  const d = planReportData(p, user.unitSystem);
  const base = `${p.columnTag}-${p.label}-heat-plan`.replace(/[^\w.-]+/g, '_').slice(0, 80);
  return format === 'csv'
    ? { fileName: `${base}.csv`, contentType: 'text/csv; charset=utf-8', body: planCsv(d) }
    : {
        fileName: `${base}.xlsx`,
        contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
        body: await planXlsx(d),
      };
}
