/**
 * The stored form of a pump-around study result (issue 5). The engine returns a full rating of every
 * tray at every sweep point (megabytes for a long sweep); the store keeps, per point, the traffic and per
 * check only the percent of limit and status, plus the controlling check. The solved duties, trays,
 * checks and notes are kept exactly as the engine gave them.
 */
import { CHECK_NAMES, type CheckName } from '../../../shared/types/rating.js';
import type { StudyInput, StudyPoint } from '../../../shared/types/pumpAround.js';
import type { KeyPointKind, SlimStudyPoint, SlimStudyResult } from '../../../shared/types/studies.js';
import { minimumLiquidLines, pointsAt, runStudyWith, type StudyResultOf } from '../../engine/pumpAround/index.js';

const round2 = (x: number): number => Math.round(x * 100) / 100;

export function slimPoint(p: StudyPoint): SlimStudyPoint {
  return {
    duty_kW: p.duty_kW,
    condenserDutyChange_kW: p.condenserDutyChange_kW,
    reflux_kg_h: p.reflux_kg_h,
    heatRecovered_kW: p.heatRecovered_kW,
    liquidToVapourAboveZone: p.liquidToVapourAboveZone,
    circulation_kg_h: p.circulation_kg_h,
    returnTemperatureDrop_K: p.returnTemperatureDrop_K,
    dryTrays: p.dryTrays,
    trays: p.trays.map(slimTray),
  };
}

/** One tray of a point in its stored form. Plain loops: this runs for every tray of every sweep point. */
function slimTray(t: StudyPoint['trays'][number]): SlimStudyPoint['trays'][number] {
  const percent = new Array<number>(CHECK_NAMES.length);
  const status = new Array<SlimStudyPoint['trays'][number]['status'][number]>(CHECK_NAMES.length);
  const checks = t.rating.checks;
  for (let i = 0; i < CHECK_NAMES.length; i++) {
    const c = checks[CHECK_NAMES[i]!] as (typeof checks)[CheckName] | undefined;
    const v = c?.percentOfLimit;
    percent[i] = v !== undefined && Number.isFinite(v) ? round2(v) : 0;
    status[i] = c?.status ?? 'ok';
  }
  return {
    tray: t.tray,
    region: t.region,
    vapourMassFlow_kg_h: t.vapourMassFlow_kg_h,
    liquidMassFlow_kg_h: t.liquidMassFlow_kg_h,
    dry: t.dry,
    percent,
    status,
    controllingCheck: t.rating.controllingCheck,
  };
}

/** The stored study: the engine run with every sweep point slimmed as it is rated. */
export function runSlimStudy(input: StudyInput): SlimStudyResult {
  return slimStudyResult(input, runStudyWith(input, slimPoint));
}

function slimStudyResult(input: StudyInput, r: StudyResultOf<SlimStudyPoint>): SlimStudyResult {
  const keys: { kind: KeyPointKind; duty: number }[] = [{ kind: 'base', duty: r.baseDuty_kW }];
  if (r.limitingDuty_kW !== null) keys.push({ kind: 'limiting', duty: r.limitingDuty_kW });
  if (r.recommendedDuty_kW !== null) keys.push({ kind: 'recommended', duty: r.recommendedDuty_kW });
  const full = pointsAt(
    input,
    keys.map((k) => k.duty),
  );
  const { points, ...rest } = r;
  return {
    ...rest,
    checkNames: [...CHECK_NAMES] as CheckName[],
    minimumLiquidLines: minimumLiquidLines(input, full[0]!),
    points,
    keyPoints: keys.map((k, i) => ({ kind: k.kind, point: slimPoint(full[i]!) })),
  };
}
