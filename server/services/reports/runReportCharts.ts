/** The two charts of the rating report: percent of limit per tray, and the controlling tray's operating window. */
import { chartSvg, legendSvg } from './reportCharts.js';
import type { Content } from './pdfEngine.js';
import { STATUS_LABELS } from '../../../shared/labels.js';
import { STATUS_COLOURS, palette } from '../../../shared/palette.js';
import { formatQuantity, unitLabel } from '../../../shared/units.js';
import type { CheckStatus } from '../../../shared/types/rating.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { RunRecord, RunWindow } from '../../../shared/types/runs.js';

const CURVE_COLOURS = [
  palette.negative,
  palette.rose,
  palette.plum,
  palette.info,
  palette.lagoon,
  palette.secondary,
  palette.accent,
  palette.olive,
];

export function runCharts(run: RunRecord, w: RunWindow | null, sys: SessionUser['unitSystem']): Content[] {
  const trays = run.results.trays;
  const pct = chartSvg({
    width: 730,
    height: 210,
    xTitle: 'Tray',
    yTitle: 'Highest percent of limit on the tray (%)',
    xIntegers: true,
    yMin: 0,
    series: [
      {
        name: 'controlling',
        color: STATUS_COLOURS.ok,
        kind: 'bar',
        points: trays.map((t) => [t.tray, t.checks[t.controllingCheck]?.percentOfLimit ?? 0]),
        colors: trays.map((t) => STATUS_COLOURS[t.checks[t.controllingCheck]?.status ?? 'ok']),
      },
    ],
    yLines: [{ y: 100, label: 'limit', color: STATUS_COLOURS.over }],
    xLines: run.results.sections.slice(1).map((s) => ({ x: Math.min(s.firstTray, s.lastTray) - 0.5, label: s.name })),
  });
  const out: Content[] = [
    {
      unbreakable: true,
      stack: [
        { text: 'Percent of limit per tray (the controlling check of each tray)', style: 'h2' },
        { svg: pct, width: 730 },
        {
          svg: legendSvg(
            (['ok', 'near', 'over'] as CheckStatus[]).map((s) => ({
              name: `${STATUS_LABELS[s]}${s === 'near' ? ' to' : ''} the limit`,
              color: STATUS_COLOURS[s],
            })),
            400,
          ),
        },
      ],
    },
  ];
  if (!w) return out;
  const m = (v: number) => formatQuantity('massFlow', v, sys).replace(/,/g, '');
  const curves = w.window.curves.filter((c) => c.liquid_kg_h.length > 1);
  const svg = chartSvg({
    width: 620,
    height: 300,
    xMin: 0,
    yMin: 0,
    xTitle: `Liquid (${unitLabel('massFlow', sys)})`,
    yTitle: `Vapour (${unitLabel('massFlow', sys)})`,
    series: [
      ...curves.map((c, i) => ({
        name: c.label,
        color: CURVE_COLOURS[i % CURVE_COLOURS.length]!,
        points: c.liquid_kg_h.map((x, k) => [Number(m(x)), Number(m(c.vapour_kg_h[k]!))] as [number, number]),
      })),
      {
        name: 'operating point',
        color: '#111111',
        kind: 'marker' as const,
        points: [[Number(m(w.window.operatingPoint.liquid_kg_h)), Number(m(w.window.operatingPoint.vapour_kg_h))]],
      },
    ],
  });
  out.push(
    { text: `Operating window of the controlling tray ${w.window.tray}`, style: 'h2', pageBreak: 'before' },
    { svg, width: 620 },
    {
      svg: legendSvg(
        [
          ...curves.map((c, i) => ({ name: c.label, color: CURVE_COLOURS[i % CURVE_COLOURS.length]! })),
          { name: `operating point of tray ${w.window.tray}`, color: '#111111' },
        ],
        620,
      ),
    },
  );
  return out;
}
