/**
 * Pump-around duty study (issue 5): sweep the duty of one pump-around, rate every tray at each duty, and
 * find the dry-out, minimum-liquid, zone-overload, limiting and recommended duties exactly.
 *
 * - Dry-out duty: closed form Q0 + λ·L_min over the trays above the zone (traffic.ts).
 * - Minimum-liquid and zone-overload duties: the lowest duty at which a watched check (checks.ts) goes
 *   over its limit as the duty rises, solved between Q_lo = min(base duty, sweep start, margin × dry-out
 *   duty) and the dry-out duty (scan.ts). Not reached before dry-out → null. A check already over at
 *   Q_lo that never clears limits at Q_lo.
 * - Limiting duty: the lowest of the three. Recommended duty = min(margin × dry-out duty, highest duty
 *   with no watched check over), margin default 0.7 (common practice: tray-methods.md §9 knows no
 *   published rule); null when no duty in the range is free of watched limits.
 * The input must have passed validateStudyInput. Tray numbers are reported in the input's numbering.
 */
import type { TrayLoad, TrayResult } from '../../../shared/types/rating.js';
import { CHECK_LABELS } from '../../../shared/labels.js';
import type { StudyInput, StudyLimit, StudyPoint, StudyResult, StudySection } from '../../../shared/types/pumpAround.js';
import { prepareSection, rateTrayPrepared, type PreparedSection } from '../index.js';
import { watchedChecks } from './checks.js';
import { sectionForTray } from './column.js';
import { studyPoint, sweepDuties } from './points.js';
import { scanWatchedChecks, type ScanResult } from './scan.js';
import { condensedVapour, dryOutDuty, pumpAroundCirculation, shiftTraffic, shiftTray, type ShiftedTray } from './traffic.js';

export const DEFAULT_MARGIN = 0.7;
/** percent-of-limit slack within which a check counts as at (not over) its limit in the notes */
const AT_LIMIT_PERCENT = 1e-3;

const fmt = (q: number): string => `${Math.round(q)} kW`;

/** A study result whose sweep points were mapped as they were rated (runStudyWith). */
export type StudyResultOf<P> = Omit<StudyResult, 'points'> & { points: P[] };

/** The full study: every sweep point with the full rating of every tray (the CLI prints this). */
export function runStudy(input: StudyInput): StudyResult {
  return runStudyWith(input, (p) => p);
}

/**
 * The study with each sweep point passed through `mapPoint` as soon as it is rated. A caller that keeps
 * less than the full ratings (the API keeps percent of limit and status per check) lets them go while
 * they are young: holding 12,000 full tray ratings to the end made garbage collection most of the run.
 */
export function runStudyWith<P>(input: StudyInput, mapPoint: (p: StudyPoint) => P): StudyResultOf<P> {
  const numbering = input.numbering ?? 'top-down';
  const margin = input.margin ?? DEFAULT_MARGIN;
  const pa = input.pumpAround;
  const lambda = input.latentHeat_kJ_kg;
  // each section prepared once; each tray rated with the section whose tray range holds it
  const prepared = new Map<StudySection, PreparedSection>(input.sections.map((s) => [s, prepareSection(s, input.methods)]));
  const sectionOf = new Map<number, PreparedSection>();
  for (const t of input.trays) sectionOf.set(t.tray, prepared.get(sectionForTray(input.sections, t.tray)!)!);
  const rate = (load: TrayLoad): TrayResult => rateTrayPrepared(sectionOf.get(load.tray)!, load);
  // below the draw the traffic does not depend on the duty: rate those trays once, share the result
  const unchanged = new Map<number, TrayResult>();
  const rateShifted = (t: ShiftedTray): TrayResult => {
    if (t.region !== 'below') return rate(t);
    let r = unchanged.get(t.tray);
    if (!r) unchanged.set(t.tray, (r = rate(t)));
    return r;
  };
  const shiftAll = (q: number): ShiftedTray[] => shiftTraffic(input.trays, pa, q, lambda, numbering).trays;
  const shiftOne = (t: TrayLoad, q: number): ShiftedTray =>
    shiftTray(t, pa, condensedVapour(q, pa.baseDuty_kW, lambda), pumpAroundCirculation(pa, q).circulation_kg_h, numbering);
  const baseTrays = input.trays.filter((t) => shiftOne(t, pa.baseDuty_kW).region !== 'below');

  const notes: string[] = [
    "Screening estimate: a pump-around duty change goes through management-of-change review and the site's procedures; confirm with the internals vendor and licensed engineers. Fractionation above the zone suffers as its L/V falls.",
    'Vapour and liquid properties held at base-case values; constant latent heat; sensible heats neglected.',
    'Extra condensation spread evenly over the pump-around zone trays (return to draw); the circulation is added to the base (net) liquid of every zone tray.',
  ];
  const dry = dryOutDuty(input.trays, pa, lambda, numbering);
  // search down to the margin duty too, so that a suggestion below the base duty and the sweep start is
  // checked over the whole way up to the base, not only at its own point
  const qLo = Math.max(0, Math.min(pa.baseDuty_kW, input.sweep.fromDuty_kW, dry ? margin * dry.duty_kW : Infinity));
  let scan: ScanResult = { minimumLiquid: null, zoneOverload: null, clearing: [], alwaysOver: [] };
  if (dry && dry.duty_kW > qLo) {
    scan = scanWatchedChecks(qLo, dry.duty_kW, baseTrays, shiftOne, rate);
    notes.push(
      `Limits searched from ${fmt(qLo)} (lowest of base duty, sweep start and margin × dry-out duty) to the dry-out duty ${fmt(dry.duty_kW)}.`,
    );
  } else if (dry) {
    notes.push(`Tray ${dry.tray} above the zone has no liquid at the base case: dry-out at the base duty.`);
  }

  const candidates: { duty_kW: number; tray: number; check: StudyLimit }[] = [];
  if (scan.minimumLiquid) candidates.push(scan.minimumLiquid);
  if (scan.zoneOverload) candidates.push(scan.zoneOverload);
  if (dry) candidates.push({ duty_kW: dry.duty_kW, tray: dry.tray, check: 'dryOut' });
  const limiting = candidates.reduce<(typeof candidates)[number] | null>((a, c) => (!a || c.duty_kW < a.duty_kW ? c : a), null);

  // notes are read by users: checks by their labels, never their ids
  for (const c of scan.clearing)
    notes.push(`Tray ${c.tray}: ${CHECK_LABELS[c.check]} is over its limit below ${fmt(c.duty_kW)} and clears above it.`);
  for (const c of scan.alwaysOver)
    notes.push(`Tray ${c.tray}: ${CHECK_LABELS[c.check]} is over its limit over the whole range searched.`);
  const feasibleFrom = Math.max(qLo, ...scan.clearing.map((c) => c.duty_kW));
  const highestFree = scan.alwaysOver.length === 0 && limiting && limiting.duty_kW > feasibleFrom ? limiting.duty_kW : null;
  let recommended = dry && highestFree !== null ? Math.min(margin * dry.duty_kW, highestFree) : null;
  if (recommended !== null && recommended < feasibleFrom) {
    notes.push(
      `The margin duty ${fmt(recommended)} lies below ${fmt(feasibleFrom)}, under which a watched check is over its limit: no duty meets both the margin and the limits.`,
    );
    recommended = null;
  }
  if (recommended === null) notes.push('No duty in the range searched is free of watched limits: no recommended duty.');
  else notes.push(...overAt(recommended, 'recommended'));

  function overAt(q: number, label: string): string[] {
    const over = shiftAll(q).flatMap((t) => {
      const r = rateShifted(t);
      const w = new Set<string>(watchedChecks(t.region, r));
      // a check solved to lie exactly at its limit here is at 100 %, not over it
      return Object.entries(r.checks)
        .filter(([, c]) => c.percentOfLimit > 100 + AT_LIMIT_PERCENT)
        .map(
          ([name]) =>
            `tray ${t.tray} ${name}${w.has(name) ? '' : t.region === 'below' ? ' (below the draw, not changed by the duty)' : ' (not watched)'}`,
        );
    });
    return over.length ? [`Checks over their limit at the ${label} duty ${fmt(q)}: ${over.join('; ')}.`] : [];
  }

  return {
    pumpAround: pa.name,
    baseDuty_kW: pa.baseDuty_kW,
    dryOutDuty_kW: dry?.duty_kW ?? null,
    dryOutTray: dry?.tray ?? null,
    minimumLiquidDuty_kW: scan.minimumLiquid?.duty_kW ?? null,
    minimumLiquidTray: scan.minimumLiquid?.tray ?? null,
    minimumLiquidCheck: scan.minimumLiquid?.check ?? null,
    zoneOverloadDuty_kW: scan.zoneOverload?.duty_kW ?? null,
    zoneOverloadTray: scan.zoneOverload?.tray ?? null,
    zoneOverloadCheck: scan.zoneOverload?.check ?? null,
    limitingDuty_kW: limiting?.duty_kW ?? null,
    limitingTray: limiting?.tray ?? null,
    limitingCheck: limiting?.check ?? null,
    recommendedDuty_kW: recommended,
    margin,
    notes,
    points: sweepDuties(input).map((q) =>
      mapPoint(studyPoint(shiftTraffic(input.trays, pa, q, lambda, numbering), pa.baseDuty_kW, numbering, rateShifted)),
    ),
  };
}
