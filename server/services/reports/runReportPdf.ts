/**
 * The printed rating report (PDF): who rated, submitted, approved or returned the run and when, the review
 * comment, the engine version, the cautions, two charts (percent of limit per tray; the operating window of
 * the controlling tray), the section results, a per-tray table that fits A4 landscape (each warning printed
 * once, with the trays it concerns) and the methods with their sources. Header and footer on every page.
 */
import type { DataSource } from 'typeorm';
import { ENGINE_VERSION, METHOD_METADATA, METHOD_USES } from '../../engine/index.js';
import { RATING_CAUTIONS } from '../../routes/methods.js';
import { runCharts } from './runReportCharts.js';
import { STATUS_COLOURS } from '../../../shared/palette.js';
import { pdfDateTime, pdfFileName, renderPdf, type Content, type PdfParts } from './pdfEngine.js';
import { getRun, runWindow } from '../runs/runsRead.js';
import {
  CHECK_LABELS,
  CHECK_SHORT,
  PROVENANCE_LABELS,
  PROVENANCE_UNCERTAINTY,
  REVIEW_LABELS,
  SENSE_WORDS,
  STATUS_LABELS,
  TRAY_STATE_LABELS,
  formatPercentOfLimit,
  publishedSource,
} from '../../../shared/labels.js';
import { coverageSentence, sectionCoverage, trayState } from '../../../shared/verdict.js';
import { CHECK_NAMES } from '../../../shared/types/rating.js';
import {
  PRESSURE_DROP_UNIT_LABELS,
  checkDisplay,
  defaultPressureDropUnit,
  formatQuantity,
  unitLabel,
  type PressureDropUnit,
} from '../../../shared/units.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { ReviewEntry, RunRecord, RunTrayResult, RunWindow } from '../../../shared/types/runs.js';

const ACTION_WORDS: Record<ReviewEntry['action'], string> = { submit: 'Submitted', approve: 'Approved', return: 'Returned' };
const th = (t: string) => ({ text: t, style: 'th' });

/** Ranges of tray numbers: [3,4,5,9] → "3–5, 9". */
export function trayRanges(trays: number[]): string {
  const s = [...new Set(trays)].sort((a, b) => a - b);
  const out: string[] = [];
  for (let i = 0; i < s.length; i++) {
    let j = i;
    while (j + 1 < s.length && s[j + 1] === s[j]! + 1) j++;
    out.push(j > i ? `${s[i]}–${s[j]}` : String(s[i]));
    i = j;
  }
  return out.join(', ');
}

function reviewBlock(run: RunRecord): Content[] {
  const decided = [...run.reviews].reverse().find((r) => r.action !== 'submit');
  const rows = run.reviews.map((r) => [pdfDateTime(r.at), r.userName, ACTION_WORDS[r.action], r.comment || '—']);
  return [
    { text: 'Review', style: 'h2' },
    {
      text: decided
        ? `${REVIEW_LABELS[run.status]}: ${ACTION_WORDS[decided.action].toLowerCase()} by ${decided.userName} on ${pdfDateTime(decided.at)}.`
        : `${REVIEW_LABELS[run.status]}: not reviewed yet.`,
      bold: true,
    },
    run.reviewComment ? { text: `Review comment: “${run.reviewComment}”`, margin: [0, 2, 0, 4] } : '',
    rows.length
      ? {
          table: {
            headerRows: 1,
            widths: ['auto', 'auto', 'auto', '*'],
            body: [['When', 'Who', 'Action', 'Comment'].map(th), ...rows],
          },
          margin: [0, 2, 0, 0],
        }
      : '',
  ];
}

function sectionTable(run: RunRecord, sys: SessionUser['unitSystem'], dp: PressureDropUnit): Content {
  const body: Content[] = [['Section', 'Trays', 'Check', 'Worst tray', 'Value', 'Limit', '% of limit', 'Status'].map(th)];
  for (const s of run.results.sections)
    for (const e of s.summary.worst.filter((x) => x.status !== 'na')) {
      const c = run.results.trays.find((t) => t.tray === e.worstTray)?.checks[e.check];
      const rhoL = run.snapshot.loads.find((l) => l.tray === e.worstTray)?.liquidDensity_kg_m3;
      const shown = checkDisplay({ unit: c?.unit ?? '-', value: e.worstValue, limit: c?.limit ?? NaN }, sys, dp, rhoL);
      const unit = shown.unit ? ` ${shown.unit}` : '';
      body.push([
        s.name,
        `${s.firstTray}–${s.lastTray}`,
        CHECK_LABELS[e.check],
        String(e.worstTray),
        `${shown.value}${unit}`,
        c ? `${SENSE_WORDS[c.sense]} ${shown.limit}${unit}` : '—',
        `${formatPercentOfLimit(e.percentOfLimit)} %`,
        { text: STATUS_LABELS[e.status], color: STATUS_COLOURS[e.status] },
      ]);
    }
  return { table: { headerRows: 1, widths: ['*', 'auto', '*', 'auto', 'auto', 'auto', 'auto', 'auto'], body }, fontSize: 7.5 };
}

/** A warning's kind in words: its message up to the first colon (the rest names this tray's numbers). */
const warningHead = (m: string) => m.split(':')[0]!.trim();

/** Per-tray table (percent of limit per check) and its notes: each kind of warning once, with its trays. */
function trayTable(run: RunRecord, sys: SessionUser['unitSystem']): Content[] {
  const notes = new Map<string, number[]>();
  const example = new Map<string, string>();
  for (const t of run.results.trays)
    for (const w of t.warnings) {
      notes.set(w.code, [...(notes.get(w.code) ?? []), t.tray]);
      if (!example.has(w.code)) example.set(w.code, w.message);
    }
  const keys = [...notes.keys()];
  const load = new Map(run.snapshot.loads.map((l) => [l.tray, l]));
  const body: Content[] = [
    [
      th('Tray'),
      th(`Vapour (${unitLabel('massFlow', sys)})`),
      th(`Liquid (${unitLabel('massFlow', sys)})`),
      ...CHECK_NAMES.map((c) => th(`${CHECK_SHORT[c]} %`)),
      th('Controls'),
      th('Notes'),
    ],
  ];
  for (const t of run.results.trays) {
    const refs = t.warnings.map((w) => keys.indexOf(w.code) + 1);
    body.push([
      String(t.tray),
      formatQuantity('massFlow', load.get(t.tray)?.vapourMassFlow_kg_h, sys),
      formatQuantity('massFlow', load.get(t.tray)?.liquidMassFlow_kg_h, sys),
      ...CHECK_NAMES.map((c) => {
        const k = t.checks[c]; // absent from runs rated before the engine had the check
        if (!k || k.status === 'na') return { text: '—', alignment: 'right', color: STATUS_COLOURS.na };
        return {
          text: formatPercentOfLimit(k.percentOfLimit),
          color: STATUS_COLOURS[k.status],
          bold: k.status === 'over',
          alignment: 'right',
        };
      }),
      verdictText(t),
      [...new Set(refs)].join(', '),
    ]);
  }
  return [
    {
      text: 'Per-tray results (percent of each limit; colour: within, close, beyond; — the check does not apply)',
      style: 'h2',
      pageBreak: 'before',
    },
    {
      table: {
        headerRows: 1,
        dontBreakRows: true,
        widths: ['auto', 'auto', 'auto', ...CHECK_NAMES.map(() => '*'), 'auto', 'auto'],
        body,
      },
      fontSize: 7,
    },
    keys.length ? { text: 'Notes', style: 'h2' } : '',
    keys.length
      ? {
          ol: keys.map((k) => {
            const trays = [...new Set(notes.get(k))];
            const first = example.get(k)!;
            const rest = first.slice(warningHead(first).length + 1).trim();
            if (trays.length === 1) return `Tray ${trays[0]}: ${first}`;
            return rest
              ? `${warningHead(first)}: trays ${trayRanges(trays)}. On tray ${trays[0]}: ${rest}`
              : `${first} (trays ${trayRanges(trays)})`;
          }),
          fontSize: 7.5,
        }
      : '',
  ];
}

/** Moving-valve trays (Klein): hole velocity against the balance points, valve state, dry ΔP. Empty when none. */
export function valveTable(run: RunRecord, sys: SessionUser['unitSystem']): Content[] {
  const trays = run.results.trays.filter((t) => (t.details.valvesStartOpenVelocity_m_s ?? 0) > 0);
  if (!trays.length) return [];
  const v = unitLabel('velocity', sys);
  const mm = unitLabel('lengthSmall', sys);
  const body: Content[] = [
    [
      th('Tray'),
      th(`Hole velocity (${v})`),
      th(`Valves start to open (${v})`),
      th(`All valves open (${v})`),
      th('Valves'),
      th(`Dry ΔP (${mm} of liquid)`),
      th(`Dry ΔP partly open (${mm} of liquid)`),
    ],
  ];
  for (const t of trays) {
    const d = t.details;
    const uA = d.valvesStartOpenVelocity_m_s!;
    const uB = d.valvesAllOpenVelocity_m_s ?? NaN;
    const state = d.holeVelocity_m_s < uA ? 'closed' : d.holeVelocity_m_s < uB ? 'partly open' : 'all open';
    body.push([
      String(t.tray),
      { text: formatQuantity('velocity', d.holeVelocity_m_s, sys), color: STATUS_COLOURS[t.checks.weeping?.status ?? 'ok'] },
      formatQuantity('velocity', uA, sys),
      formatQuantity('velocity', uB, sys),
      state,
      formatQuantity('lengthSmall', d.dryPressureDrop_mm, sys),
      formatQuantity('lengthSmall', d.valvePartlyOpenDryHead_mm, sys),
    ]);
  }
  return [
    {
      text: 'Moving valves (Klein): hole velocity against the velocities at which the valves start to open and are all open',
      style: 'h2',
    },
    { table: { headerRows: 1, dontBreakRows: true, widths: ['auto', '*', '*', '*', 'auto', '*', '*'], body }, fontSize: 7 },
  ];
}

/** The controlling check; a flooded or dry tray says so. */
function verdictText(t: RunTrayResult): string {
  const state = trayState(t);
  if (state === 'dry') return TRAY_STATE_LABELS.dry;
  return state === 'flooded' ? `${CHECK_SHORT.jetFlood}: ${TRAY_STATE_LABELS.flooded}` : CHECK_SHORT[t.controllingCheck];
}

/** The correlations the run's checks name and those they rely on, each with its source and, once, its uncertainty. */
function methodsBlock(run: RunRecord): Content[] {
  return [
    { text: 'Methods and sources', style: 'h2' },
    run.engineVersion !== ENGINE_VERSION
      ? {
          text: `This run was rated by engine ${run.engineVersion}; the methods below are described as in engine ${ENGINE_VERSION}, whose correlations may differ from those that rated it.`,
          italics: true,
          margin: [0, 0, 0, 4],
        }
      : '',
    methodsTable(run.results.trays.flatMap((t) => Object.values(t.checks).map((c) => c.method))),
  ];
}

/** Table of the correlations named (and those they rely on): equation, published source, basis and uncertainty. */
export function methodsTable(methodIds: Iterable<string>): Content {
  const ids = new Set(methodIds);
  for (const id of [...ids]) for (const u of METHOD_USES[id] ?? []) ids.add(u);
  const used = Object.values(METHOD_METADATA)
    .filter((m) => ids.has(m.id))
    .sort((a, b) => a.label.localeCompare(b.label));
  const basis = (m: (typeof used)[number]) => {
    const u = m.uncertainty ?? PROVENANCE_UNCERTAINTY[m.provenance];
    return `${PROVENANCE_LABELS[m.provenance]}${u ? `. ${u}` : ''}`;
  };
  return {
    table: {
      headerRows: 1,
      widths: ['auto', '*', '*', '*'],
      body: [
        ['Correlation', 'Equation', 'Source', 'Basis and uncertainty'].map(th),
        ...used.map((m) => [m.label, m.equation, publishedSource(m.source), basis(m)]),
      ],
    },
    fontSize: 7,
  };
}

/** The run's verdict in one line: flooded and dry trays by name, otherwise the controlling check; then the rest. */
function verdictLine(run: RunRecord): string {
  const r = run.results;
  const by = (s: string) => r.trays.filter((t) => trayState(t) === s).map((t) => t.tray);
  const [flooded, dry, over] = [by('flooded'), by('dry'), by('over')];
  const head = flooded.length
    ? `Flooded: trays ${trayRanges(flooded)} past jet flood`
    : `Controlling: ${CHECK_LABELS[r.controllingCheck]} on tray ${r.controllingTray}, ${r.maxPercentOfLimit.toFixed(0)} % of its limit`;
  const parts = [head];
  if (dry.length) parts.push(`dry (no liquid): trays ${trayRanges(dry)}`);
  parts.push(`trays beyond a limit: ${trayRanges(over) || 'none'}`, `close to one: ${trayRanges(r.traysNear) || 'none'}`);
  return parts.join(' · ');
}

/** Each section's coverage: "Top: all 8 trays rated", "Lower: rated 6 of 12 trays; no loads for trays 15–20". */
function coverageLine(run: RunRecord): string {
  const rated = run.results.trays.map((t) => t.tray);
  const lines = run.results.sections.map(
    (s) => `${s.name}: ${coverageSentence(sectionCoverage(s.firstTray, s.lastTray, rated))}`,
  );
  const out = run.results.uncoveredTrays;
  if (out.length) lines.push(`loaded trays outside any section: ${trayRanges(out)}`);
  return `Trays rated — ${lines.join('; ')}`;
}

/** The report's parts (tested without rendering): header, footer and content. */
export function runReportDoc(
  run: RunRecord,
  w: RunWindow | null,
  sys: SessionUser['unitSystem'],
  printedAt = new Date(),
  dp: PressureDropUnit = defaultPressureDropUnit(sys),
): PdfParts {
  const tag = run.snapshot.column.tag;
  const lc = run.snapshot.loadCase;
  return {
    pageOrientation: 'landscape',
    header: `${tag} · ${run.label} · tray rating report`,
    footer: `Screening estimate · engine ${run.engineVersion} · printed ${pdfDateTime(printedAt)}`,
    content: [
      { text: `Tray rating report — ${tag}`, style: 'h1' },
      { text: run.label, fontSize: 11 },
      {
        text: `Load case ${lc.name} (${lc.basis}, version ${lc.version}) · rated ${pdfDateTime(run.createdAt)} by ${run.authorName ?? '—'} · engine ${run.engineVersion} · units ${sys}, tray ΔP in ${PRESSURE_DROP_UNIT_LABELS[dp]}`,
      },
      { text: verdictLine(run), bold: true, margin: [0, 4, 0, 0] },
      { text: coverageLine(run) },
      ...reviewBlock(run),
      { text: 'Cautions', style: 'h2' },
      { ul: RATING_CAUTIONS },
      ...runCharts(run, w, sys),
      { text: 'Section results', style: 'h2', pageBreak: 'before' },
      sectionTable(run, sys, dp),
      ...trayTable(run, sys),
      ...valveTable(run, sys),
      ...methodsBlock(run),
    ],
  };
}

export async function runReportPdf(ds: DataSource, user: SessionUser, id: string): Promise<{ pdf: Buffer; filename: string }> {
  const run = await getRun(ds, user, id);
  const w = await runWindow(ds, user, id, run.results.controllingTray).catch(() => null);
  const pdf = await renderPdf(
    runReportDoc(run, w, user.unitSystem, new Date(), user.pressureDropUnit ?? undefined),
    user.unitSystem,
  );
  return { pdf, filename: pdfFileName('rating', run.snapshot.column.tag, run.label) };
}
