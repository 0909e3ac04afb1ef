/**
 * What a pump-around study's printed report and exports say, in the reader's units: the inputs, the duties
 * found, the traffic at the base duty, the suggested and limiting duties and the cautions.
 */
import { CHECK_LABELS } from '../../../shared/labels.js';
import { STUDY_CAUTIONS } from '../../../shared/studyCautions.js';
import { formatQuantity, unitLabel, type QuantityId } from '../../../shared/units.js';
import type { UnitSystem } from '../../../shared/types/api.js';
import type { StudyLimit } from '../../../shared/types/pumpAround.js';
import type { StudyRecord } from '../../../shared/types/studies.js';

export type Row = (string | number | null)[];
export interface StudyReportData {
  inputs: [string, string][];
  duties: [string, string, string][];
  trafficHeaders: string[];
  traffic: Row[];
  cautions: string[];
  notes: string[];
}

const REGION_WORDS = { above: 'above the zone', zone: 'pump-around zone', below: 'below the zone' } as const;
const limitWords = (c: StudyLimit | null) => (c === null ? '' : c === 'dryOut' ? 'liquid runs out' : CHECK_LABELS[c]);

export function studyReportData(s: StudyRecord, sys: UnitSystem): StudyReportData {
  const q = (k: QuantityId, v: number | null | undefined) =>
    v === null || v === undefined ? '—' : `${formatQuantity(k, v, sys)} ${unitLabel(k, sys)}`;
  const r = s.result;
  const req = s.inputs.source.request;
  const pa = s.inputs.input.pumpAround;
  const at = (tray: number | null, check: StudyLimit | null) =>
    tray === null ? '' : `tray ${tray}${check ? `, ${limitWords(check)}` : ''}`;
  const base = r.keyPoints.find((k) => k.kind === 'base')?.point;
  return {
    inputs: [
      ['Column', s.columnTag],
      ['Pump-around', `${pa.name}: returned to tray ${pa.returnTray}, drawn from tray ${pa.drawTray}`],
      ['Base load case', s.loadCaseName],
      ['Duty in the base case', q('duty', pa.baseDuty_kW)],
      ['Latent heat λ', `${s.inputs.input.latentHeat_kJ_kg} kJ/kg`],
      ['Liquid heat capacity c_p', `${pa.liquidHeatCapacity_kJ_kgK} kJ/(kg·K)`],
      pa.circulation_kg_h !== undefined
        ? ['Circulation, held fixed', q('massFlow', pa.circulation_kg_h)]
        : ['Return temperature drop ΔT, held fixed', `${pa.returnTemperatureDrop_K} K`],
      [
        'Zone liquid in the load case',
        req.zoneLiquidIncludesCirculation ? 'includes the circulation (base circulation taken off first)' : 'net internal liquid',
      ],
      [
        'Duties swept',
        `${q('duty', req.sweep.fromDuty_kW)} to ${q('duty', req.sweep.toDuty_kW)} in ${req.sweep.steps ?? 40} steps`,
      ],
      ['Margin on the dry-out duty', `${Math.round(r.margin * 100)} % (common practice)`],
    ],
    duties: [
      ['Base duty', q('duty', r.baseDuty_kW), ''],
      ['Dry-out duty', q('duty', r.dryOutDuty_kW), at(r.dryOutTray, null)],
      ['Minimum-liquid duty', q('duty', r.minimumLiquidDuty_kW), at(r.minimumLiquidTray, r.minimumLiquidCheck)],
      ['Zone overload duty', q('duty', r.zoneOverloadDuty_kW), at(r.zoneOverloadTray, r.zoneOverloadCheck)],
      ['Limiting duty', q('duty', r.limitingDuty_kW), at(r.limitingTray, r.limitingCheck)],
      [
        'Suggested duty',
        r.recommendedDuty_kW === null ? 'none in the range searched' : q('duty', r.recommendedDuty_kW),
        `lower of ${Math.round(r.margin * 100)} % of the dry-out duty and the highest duty with no watched check over its limit`,
      ],
    ],
    trafficHeaders: [
      'Tray',
      'Where',
      `Vapour (${unitLabel('massFlow', sys)})`,
      `Liquid (${unitLabel('massFlow', sys)})`,
      'Controlling check',
      '% of limit',
    ],
    traffic: (base?.trays ?? []).map((t) => {
      const i = r.checkNames.indexOf(t.controllingCheck);
      return [
        t.tray,
        REGION_WORDS[t.region],
        Number(formatQuantity('massFlow', t.vapourMassFlow_kg_h, sys).replace(/,/g, '')),
        Number(formatQuantity('massFlow', t.liquidMassFlow_kg_h, sys).replace(/,/g, '')),
        CHECK_LABELS[t.controllingCheck],
        i >= 0 ? Math.round(t.percent[i]!) : null,
      ];
    }),
    cautions: ['Screening estimate — not an operating instruction.', ...STUDY_CAUTIONS],
    notes: r.notes.map((n) => n.replace(/\b([Rr])ecommended duty\b/g, (_, c: string) => `${c === 'R' ? 'S' : 's'}uggested duty`)),
  };
}
