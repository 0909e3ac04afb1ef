/** The new-study form's state (duties and flows in the user's display units) and the request body built from it (SI). */
import type { UnitsLike } from './useStudyPlot';
import type { CreateStudyBody, StudyRecord } from '../../shared/types/studies';
import type { QuantityId } from '../../shared/units';

export interface StudyForm {
  label: string;
  loadCaseId: string | null;
  pumpAroundId: string | null;
  baseDuty: number | null;
  latentHeat: number | null;
  cp: number | null;
  mode: 'dT' | 'circulation';
  dT: number | null;
  circulation: number | null;
  from: number | null;
  to: number | null;
  steps: number | null;
  margin: number | null;
  /** the load case's zone liquid already carries the circulation; null until the user chooses (no default) */
  zoneIncludesCirculation: boolean | null;
}

type Units = UnitsLike & { enter: (q: QuantityId, v: number) => number };

/** Empty form, or one filled from an earlier study's request ("new study from these inputs"). */
export function studyFormFrom(s: StudyRecord | null, units: UnitsLike): StudyForm {
  const r = s?.inputs.source.request;
  const show = (q: QuantityId, v: number | undefined): number | null => (v === undefined ? null : units.show(q, v));
  return {
    label: r ? `${r.label ?? s.label} (copy)` : '',
    loadCaseId: r?.loadCaseId ?? null,
    pumpAroundId: r?.pumpAroundId ?? null,
    baseDuty: show('duty', r?.baseDuty_kW ?? s?.inputs.input.pumpAround.baseDuty_kW),
    latentHeat: r?.latentHeat_kJ_kg ?? null,
    cp: r?.liquidHeatCapacity_kJ_kgK ?? null,
    mode: r?.circulation_kg_h !== undefined ? 'circulation' : 'dT',
    dT: r?.returnTemperatureDrop_K ?? null,
    circulation: show('massFlow', r?.circulation_kg_h),
    from: show('duty', r?.sweep.fromDuty_kW),
    to: show('duty', r?.sweep.toDuty_kW),
    steps: r?.sweep.steps ?? 40,
    margin: r?.margin ?? 0.7,
    zoneIncludesCirculation: r?.zoneLiquidIncludesCirculation ?? null,
  };
}

/** Request body in SI; empty fields are left out so that the server names them. */
export function studyBody(f: StudyForm, units: Units): CreateStudyBody {
  const si = (q: QuantityId, v: number | null): number | undefined => (v === null ? undefined : units.enter(q, v));
  const body: Record<string, unknown> = {
    label: f.label.trim() || undefined,
    loadCaseId: f.loadCaseId ?? undefined,
    pumpAroundId: f.pumpAroundId ?? undefined,
    baseDuty_kW: si('duty', f.baseDuty),
    latentHeat_kJ_kg: f.latentHeat ?? undefined,
    liquidHeatCapacity_kJ_kgK: f.cp ?? undefined,
    returnTemperatureDrop_K: f.mode === 'dT' ? (f.dT ?? undefined) : undefined,
    circulation_kg_h: f.mode === 'circulation' ? si('massFlow', f.circulation) : undefined,
    sweep: { fromDuty_kW: si('duty', f.from), toDuty_kW: si('duty', f.to), steps: f.steps ?? undefined },
    margin: f.margin ?? undefined,
    zoneLiquidIncludesCirculation: f.zoneIncludesCirculation ?? undefined,
  };
  return JSON.parse(JSON.stringify(body)) as CreateStudyBody;
}
