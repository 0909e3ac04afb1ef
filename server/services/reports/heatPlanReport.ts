/**
 * What a heat-recovery plan's printed report and exports say, in the reader's units: the inputs, the
 * suggested split with its heat level, how it moves with the margin, the limit lines by tray and check,
 * the traffic at the suggestion, the fit against simulation and the cautions.
 */
import { CHECK_LABELS } from '../../../shared/labels.js';
import { HEAT_PLAN_CAUTIONS } from '../../../shared/heatPlanCautions.js';
import { loadsSourceText } from '../../../shared/heatPlanLoads.js';
import { formatQuantity, unitLabel, type QuantityId } from '../../../shared/units.js';
import type { UnitSystem } from '../../../shared/types/api.js';
import type { HeatPlanRecord } from '../../../shared/types/heatPlans.js';
import type { CheckName } from '../../../shared/types/rating.js';

export type Row = (string | number | null)[];
export interface PlanReportData {
  inputs: [string, string][];
  suggestion: [string, string][];
  marginHeaders: string[];
  margins: Row[];
  limitHeaders: string[];
  limits: Row[];
  trafficHeaders: string[];
  traffic: Row[];
  fit: string;
  /** the fitted values, as [name, value] */
  fitted: [string, string][];
  pointHeaders: string[];
  /** every grid point: duties, the loads it was rated on, feasibility, heat above the useful temperature, worst tray */
  points: Row[];
  /** the points rated on simulated loads (a case, or two interpolated), as in `points` */
  simulatedPoints: Row[];
  /** what the points' loads were, in one sentence (the report lists only the points not on the model) */
  pointsSummary: string;
  cautions: string[];
  notes: string[];
}

const checkWords = (c: string) => (c === 'dry-out' ? 'runs dry' : (CHECK_LABELS[c as CheckName] ?? c));

export function planReportData(p: HeatPlanRecord, sys: UnitSystem): PlanReportData {
  const q = (k: QuantityId, v: number | null | undefined) =>
    v === null || v === undefined ? '—' : `${formatQuantity(k, v, sys)} ${unitLabel(k, sys)}`;
  const n = (k: QuantityId, v: number) => Number(formatQuantity(k, v, sys).replace(/,/g, ''));
  const r = p.result;
  const input = p.inputs.input;
  const req = p.inputs.source.request;
  const s = r.suggestion;
  const sugPoint = r.keyPoints.find((k) => k.kind === 'suggestion')?.point;
  const condenser = req.baseCondenserDuty_kW;
  const pointRow = (g: HeatPlanRecord['result']['grid'][number]): Row => [
    ...g.duties_kW.map((d) => n('duty', d)),
    loadsSourceText(g.loads, r.calibration !== null),
    g.feasible ? 'yes' : 'no',
    g.withinMargin ? 'yes' : 'no',
    n('duty', g.recoveredAboveTemperature_kW),
    Math.round(g.worstPercent),
    g.worstTray === null ? '—' : `tray ${g.worstTray}, ${checkWords(g.worstCheck ?? '')}`,
  ];
  const groups = new Map<string, number[][]>();
  for (const b of r.boundary)
    groups.set(`${b.tray}\u0000${b.check}`, [...(groups.get(`${b.tray}\u0000${b.check}`) ?? []), b.duties_kW]);
  return {
    inputs: [
      ['Column', p.columnTag],
      ['Base load case', p.loadCaseName],
      ...input.pumpArounds.map((pa, i): [string, string] => [
        `Pump-around ${i + 1}`,
        `${pa.name}: returned to tray ${pa.returnTray}, drawn from tray ${pa.drawTray} at ${q('temperature', pa.drawTemperature_C)}; base duty ${q('duty', pa.baseDuty_kW)}; c_p ${pa.liquidHeatCapacity_kJ_kgK} kJ/(kg·K), ${pa.circulation_kg_h !== undefined ? `circulation ${q('massFlow', pa.circulation_kg_h)} held fixed` : `ΔT ${pa.returnTemperatureDrop_K} K held fixed`}; duties ${q('duty', pa.sweep.fromDuty_kW)} to ${q('duty', pa.sweep.toDuty_kW)} in ${pa.sweep.steps} steps`,
      ]),
      ['Latent heat λ', `${input.latentHeat_kJ_kg} kJ/kg`],
      ['Heat counted as useful above', q('temperature', r.usefulAboveTemperature_C)],
      ['Margin', `${Math.round(r.margin * 100)} % of the dry-out duties (70 % is common practice)`],
      ['L/V flagged below', `${Math.round((input.fractionationThreshold ?? 0.8) * 100)} % of the base case's, per section`],
      [
        'Zone liquid in the load case',
        req.zoneLiquidIncludesCirculation
          ? 'includes the circulation (base circulations taken off first)'
          : 'net internal liquid',
      ],
      ['Simulation cases', p.inputs.source.simulationCases.map((c) => c.name).join(', ') || 'none'],
      ['Overhead condenser duty, base case', condenser === undefined ? 'not given' : q('duty', condenser)],
    ],
    suggestion: s
      ? [
          ...s.duties_kW.map((d, i): [string, string] => [
            `${r.pumpArounds[i]} duty`,
            `${q('duty', d)} (base ${q('duty', r.baseDuties_kW[i])})`,
          ]),
          ['Heat recovered', q('duty', s.recoveredHeat_kW)],
          [`of which above ${q('temperature', r.usefulAboveTemperature_C)}`, q('duty', s.recoveredAboveTemperature_kW)],
          ['Overhead condenser duty change', q('duty', s.condenserDutyChange_kW)],
          ...(condenser === undefined
            ? []
            : [['Overhead condenser duty left', q('duty', condenser + s.condenserDutyChange_kW)] as [string, string]]),
          ...(s.limitedBy
            ? [
                [
                  'Held by',
                  `tray ${s.limitedBy.tray}, ${checkWords(s.limitedBy.check)}${s.limitedBy.margin ? ' (with the margin)' : ''}`,
                ] as [string, string],
              ]
            : []),
          ...(sugPoint?.heat ?? []).map((h): [string, string] => [
            `${h.name} heat level`,
            `${q('temperature', h.drawTemperature_C)} to ${q('temperature', h.returnTemperature_C)}; ${q('duty', h.aboveTemperature_kW)} above the useful temperature`,
          ]),
          ['Loads rated at the suggestion', loadsSourceText(sugPoint?.loads, r.calibration !== null)],
        ]
      : [['Suggested split', 'none: no split in the duty ranges keeps every tray within its limits and the margin']],
    marginHeaders: [
      'Margin',
      ...r.pumpArounds.map((n) => `${n} (${unitLabel('duty', sys)})`),
      `Above the useful temperature (${unitLabel('duty', sys)})`,
    ],
    margins: r.marginSensitivity.map((m) => [
      `${Math.round(m.margin * 100)} %`,
      ...r.pumpArounds.map((_, i) => (m.suggestion ? n('duty', m.suggestion.duties_kW[i]!) : null)),
      m.suggestion ? n('duty', m.suggestion.recoveredAboveTemperature_kW) : null,
    ]),
    limitHeaders: ['Tray', 'Check', 'Points found', ...r.pumpArounds.map((n) => `${n} range (${unitLabel('duty', sys)})`)],
    limits: [...groups.entries()].map(([key, pts]) => {
      const [tray, check] = key.split('\u0000') as [string, string];
      const range = (i: number) => {
        const v = pts.map((d) => d[i]!);
        return `${formatQuantity('duty', Math.min(...v), sys)} – ${formatQuantity('duty', Math.max(...v), sys)}`;
      };
      return [Number(tray), checkWords(check), pts.length, ...r.pumpArounds.map((_, i) => range(i))];
    }),
    trafficHeaders: [
      'Tray',
      `Vapour (${unitLabel('massFlow', sys)})`,
      `Liquid (${unitLabel('massFlow', sys)})`,
      'Controlling check',
      '% of limit',
    ],
    traffic: (sugPoint?.trays ?? []).map((t) => {
      const i = r.checkNames.indexOf(t.controllingCheck);
      return [
        t.tray,
        n('massFlow', t.vapourMassFlow_kg_h),
        n('massFlow', t.liquidMassFlow_kg_h),
        CHECK_LABELS[t.controllingCheck],
        i >= 0 ? Math.round(t.percent[i]!) : null,
      ];
    }),
    fitted: (r.calibration?.fitted ?? []).map((f): [string, string] => [f.name, `${f.value.toPrecision(4)} ${f.unit}`]),
    pointHeaders: [
      ...r.pumpArounds.map((name) => `${name} (${unitLabel('duty', sys)})`),
      'Loads rated',
      'Within limits',
      'Within margin',
      `Above the useful temperature (${unitLabel('duty', sys)})`,
      'Worst % of limit',
      'Worst tray and check',
    ],
    points: r.grid.map(pointRow),
    simulatedPoints: r.grid.filter((g) => g.loads && g.loads.source !== 'model').map(pointRow),
    pointsSummary: pointsSummary(r),
    fit: r.calibration
      ? r.calibration.summary
      : 'No simulation cases were used: away from the base case the traffic comes from the shortcut model alone, not checked against a simulation.',
    cautions: ['Screening estimate — not an operating instruction.', ...HEAT_PLAN_CAUTIONS],
    // the cautions above already say what the engine's screening note says
    notes: r.notes.filter((n) => !n.startsWith('Screening estimate')),
  };
}

/** How many grid points were rated on simulated loads, and on what the rest were. */
function pointsSummary(r: HeatPlanRecord['result']): string {
  if (!r.calibration) return `All ${r.grid.length} grid points are rated on the shortcut model's traffic.`;
  const sim = r.grid.filter((g) => g.loads && g.loads.source !== 'model').length;
  return sim
    ? `${sim} of the ${r.grid.length} grid points are rated on simulated loads (listed below); the other ${r.grid.length - sim} on the model calibrated against the simulation cases.`
    : `No grid point lies at a simulation case's duties or on the line between two cases: all ${r.grid.length} are rated on the model calibrated against the simulation cases.`;
}
