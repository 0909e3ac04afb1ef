/** Compare two rating runs tray by tray: percent of limit of every check and changes of the controlling check. */
import type { DataSource } from 'typeorm';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { visibleChild } from '../columns/columnsCommon.js';
import { toRunSummary } from './runsRead.js';
import { CHECK_NAMES, type CheckName } from '../../../shared/types/rating.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { CheckDiff, RunComparison, RunTrayResult, TrayDiff } from '../../../shared/types/runs.js';

/** What a comparison reads of a tray; checks absent from a run (added to the engine since) compare as null. */
type ComparedTray = Pick<RunTrayResult, 'tray' | 'checks' | 'controllingCheck'>;
import { User } from '../../db/entities/User.js';

const worstStatus = (t: ComparedTray): TrayDiff['statusA'] => {
  const s = CHECK_NAMES.map((c) => t.checks[c]?.status);
  return s.includes('over') ? 'over' : s.includes('near') ? 'near' : 'ok';
};

export function compareResults(a: ComparedTray[], b: ComparedTray[]): TrayDiff[] {
  const ma = new Map(a.map((t) => [t.tray, t]));
  const mb = new Map(b.map((t) => [t.tray, t]));
  const trays = [...new Set([...ma.keys(), ...mb.keys()])].sort((x, y) => x - y);
  return trays.map((tray) => {
    const ta = ma.get(tray);
    const tb = mb.get(tray);
    const checks = Object.fromEntries(
      CHECK_NAMES.map((c): [CheckName, CheckDiff] => {
        const va = ta?.checks[c]?.percentOfLimit ?? null;
        const vb = tb?.checks[c]?.percentOfLimit ?? null;
        return [c, { a: va, b: vb, delta: va !== null && vb !== null ? vb - va : null }];
      }),
    ) as Record<CheckName, CheckDiff>;
    const controllingA = ta?.controllingCheck ?? null;
    const controllingB = tb?.controllingCheck ?? null;
    return {
      tray,
      controllingA,
      controllingB,
      controllingChanged: !!ta && !!tb && controllingA !== controllingB,
      statusA: ta ? worstStatus(ta) : null,
      statusB: tb ? worstStatus(tb) : null,
      checks,
    };
  });
}

export async function compareRuns(ds: DataSource, user: SessionUser, aId: string, bId: string): Promise<RunComparison> {
  const a = await visibleChild(ds.manager, user, RatingRun, aId, 'Rating run a');
  const b = await visibleChild(ds.manager, user, RatingRun, bId, 'Rating run b');
  const name = async (id: string | null) => (id ? ((await ds.manager.findOneBy(User, { id }))?.name ?? null) : null);
  const trays = compareResults(a.results.trays, b.results.trays);
  return {
    a: toRunSummary(a, await name(a.authorId)),
    b: toRunSummary(b, await name(b.authorId)),
    trays,
    controllingChanged: trays.filter((t) => t.controllingChanged).map((t) => t.tray),
  };
}
