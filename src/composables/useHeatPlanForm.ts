/**
 * The new heat-recovery plan form: values as typed (the user's units) and the request body in SI.
 * Defaults: margin 70 % of the dry-out duty (common practice), L/V flagged below 80 % of the base case's.
 */
import type { useUnitsStore } from '../stores/units-store';
import type { CreateHeatPlanBody } from '../../shared/types/heatPlans';
import type { PumpAroundRecord } from '../../shared/types/columns';

type Units = ReturnType<typeof useUnitsStore>;

export interface PlanFormPumpAround {
  pumpAroundId: string;
  name: string;
  from: number | null;
  to: number | null;
  steps: number | null;
  cp: number | null;
  /** what is held fixed as the duty changes: the return temperature drop or the circulation */
  hold: 'returnDrop' | 'circulation';
  returnDrop: number | null;
  /** in the user's mass-flow unit */
  circulation: number | null;
  drawTemperature: number | null;
}

export interface HeatPlanForm {
  label: string;
  loadCaseId: string | null;
  pumpArounds: PlanFormPumpAround[];
  latentHeat: number | null;
  usefulAbove: number | null;
  marginPercent: number | null;
  thresholdPercent: number | null;
  baseCondenserDuty: number | null;
  simulationCaseIds: string[];
  zoneIncludesCirculation: boolean;
}

export function emptyPlanForm(): HeatPlanForm {
  return {
    label: '',
    loadCaseId: null,
    pumpArounds: [],
    latentHeat: null,
    usefulAbove: null,
    marginPercent: 70,
    thresholdPercent: 80,
    baseCondenserDuty: null,
    simulationCaseIds: [],
    zoneIncludesCirculation: false,
  };
}

/** A pump-around row with its duty range from 0.5 to 1.5 times its stored duty (edit as needed). */
export function planFormPumpAround(p: PumpAroundRecord, units: Units): PlanFormPumpAround {
  const show = (kw: number) => Math.round(units.show('duty', kw));
  return {
    pumpAroundId: p.id,
    name: p.name,
    from: show(0.5 * p.baseDuty_kW),
    to: show(1.5 * p.baseDuty_kW),
    steps: 20,
    cp: null,
    hold: 'returnDrop',
    returnDrop: null,
    circulation: null,
    drawTemperature: null,
  };
}

/** The form filled from a stored plan's request ("new plan from these inputs"); pump-arounds no longer on the column are left out. */
export function planFormFrom(req: CreateHeatPlanBody, pumpArounds: PumpAroundRecord[], units: Units): HeatPlanForm {
  const show = (q: Parameters<Units['show']>[0], v: number | undefined) => (v === undefined ? null : units.show(q, v));
  return {
    label: '',
    loadCaseId: req.loadCaseId,
    pumpArounds: req.pumpArounds.flatMap((c) => {
      const p = pumpArounds.find((x) => x.id === c.pumpAroundId);
      if (!p) return [];
      return [
        {
          pumpAroundId: p.id,
          name: p.name,
          from: show('duty', c.sweep.fromDuty_kW),
          to: show('duty', c.sweep.toDuty_kW),
          steps: c.sweep.steps,
          cp: c.liquidHeatCapacity_kJ_kgK,
          hold: c.circulation_kg_h !== undefined ? 'circulation' : 'returnDrop',
          returnDrop: c.returnTemperatureDrop_K ?? null,
          circulation: show('massFlow', c.circulation_kg_h),
          drawTemperature: show('temperature', c.drawTemperature_C),
        } satisfies PlanFormPumpAround,
      ];
    }),
    latentHeat: req.latentHeat_kJ_kg,
    usefulAbove: show('temperature', req.usefulAboveTemperature_C),
    marginPercent: Math.round((req.margin ?? 0.7) * 1000) / 10,
    thresholdPercent: Math.round((req.liquidToVapourThreshold ?? 0.8) * 1000) / 10,
    baseCondenserDuty: show('duty', req.baseCondenserDuty_kW),
    simulationCaseIds: req.simulationCaseIds ?? [],
    zoneIncludesCirculation: req.zoneLiquidIncludesCirculation ?? false,
  };
}

/** The request body in SI; an empty required number goes as null, so the server names the field. */
export function planBody(f: HeatPlanForm, units: Units): CreateHeatPlanBody {
  const duty = (v: number | null) => (v === null ? null : units.enter('duty', v));
  const temp = (v: number | null) => (v === null ? null : units.enter('temperature', v));
  const body: Record<string, unknown> = {
    loadCaseId: f.loadCaseId ?? '',
    pumpArounds: f.pumpArounds.map((p) => ({
      pumpAroundId: p.pumpAroundId,
      sweep: { fromDuty_kW: duty(p.from), toDuty_kW: duty(p.to), steps: p.steps },
      liquidHeatCapacity_kJ_kgK: p.cp,
      // only the quantity held fixed goes; empty goes as null so the server names the field
      ...(p.hold === 'circulation'
        ? { circulation_kg_h: p.circulation === null ? null : units.enter('massFlow', p.circulation) }
        : { returnTemperatureDrop_K: p.returnDrop }), // a temperature difference: kelvin as typed
      ...(p.drawTemperature !== null ? { drawTemperature_C: temp(p.drawTemperature) } : {}),
    })),
    latentHeat_kJ_kg: f.latentHeat,
    usefulAboveTemperature_C: temp(f.usefulAbove),
    zoneLiquidIncludesCirculation: f.zoneIncludesCirculation,
  };
  if (f.label.trim()) body.label = f.label.trim();
  if (f.marginPercent !== null) body.margin = f.marginPercent / 100;
  if (f.thresholdPercent !== null) body.liquidToVapourThreshold = f.thresholdPercent / 100;
  if (f.baseCondenserDuty !== null) body.baseCondenserDuty_kW = duty(f.baseCondenserDuty);
  if (f.simulationCaseIds.length) body.simulationCaseIds = f.simulationCaseIds;
  return body as unknown as CreateHeatPlanBody;
}

/** Faults the form can see before asking the server (the held quantity, entered and above zero), by request path. */
export function planFormFaults(f: HeatPlanForm): { path: string; message: string; pumpAround: string }[] {
  return f.pumpArounds.flatMap((p, i) => {
    const [field, value, what] =
      p.hold === 'circulation'
        ? (['circulation_kg_h', p.circulation, 'the circulation'] as const)
        : (['returnTemperatureDrop_K', p.returnDrop, 'the return temperature drop ΔT'] as const);
    const path = `pumpArounds.${i}.${field}`;
    if (value === null) return [{ path, message: `is required: enter ${what} held fixed`, pumpAround: p.name }];
    if (!(value > 0)) return [{ path, message: `${what} must be above zero`, pumpAround: p.name }];
    return [];
  });
}
