/**
 * Operating window of one tray: for its geometry and physical properties, the curves of vapour load
 * against liquid load at which each limit is reached, solved with the shared solver (solve.ts).
 */
import type {
  MethodOptions,
  OperatingWindow,
  OperatingWindowCurve,
  SectionGeometry,
  TrayLoad,
} from '../../shared/types/rating.js';
import { prepareSection, type PreparedSection } from './prepare.js';
import { trayHydraulics, type Hydraulics } from './hydraulics.js';
import { solveIncreasing } from './solve.js';
import { weirLoadingForCrestFrancis } from './weir.js';
import { passLimitSizes } from './multipass.js';
import { S_PER_H } from './units.js';

export interface OperatingWindowOptions {
  /** number of liquid-load samples per curve (default 21) */
  points?: number;
}

type Metric = (h: Hydraulics) => number;

function at(p: PreparedSection, load: TrayLoad, vapour: number, liquid: number): Hydraulics {
  return trayHydraulics(p, { ...load, vapourMassFlow_kg_h: vapour, liquidMassFlow_kg_h: liquid }, null);
}

/** Vapour [kg/h] at which metric(h) reaches limit for the given liquid, or undefined if none. */
function vapourAtLimit(
  p: PreparedSection,
  load: TrayLoad,
  liquid: number,
  metric: Metric,
  limit: number,
  guess: number,
): number | undefined {
  const f = (v: number): number => metric(at(p, load, v, liquid)) - limit;
  const r = solveIncreasing(f, 0, guess, { xTol: 1e-6 * guess });
  return r.converged && r.root > 0 && Number.isFinite(r.root) ? r.root : undefined;
}

export function operatingWindow(
  section: SectionGeometry,
  load: TrayLoad,
  methods?: MethodOptions,
  options: OperatingWindowOptions = {},
): OperatingWindow {
  const p = prepareSection(section, methods);
  const lim = p.limits;
  const rhoL = load.liquidDensity_kg_m3;
  const n = Math.max(2, options.points ?? 21);
  // multipass layout: the lines where the worst pass reaches each limit
  const sizes = p.passLayout ? passLimitSizes(p.passLayout, load.tray) : undefined;
  const liquidAtWeirLoading = (w: number, weir: number): number => w * weir * rhoL; // m³/(h·m) × m × kg/m³ = kg/h
  const lMinWeir = liquidAtWeirLoading(weirLoadingForCrestFrancis(lim.liquidLoad), sizes?.minCrestWeir_m ?? p.weirLength);
  const lMaxWeir = liquidAtWeirLoading(lim.weirLoading, sizes?.maxLoadingWeir_m ?? p.weirLength);
  const lInlet = lim.downcomerInletVelocity * (sizes?.inletArea_m2 ?? p.downcomerTopArea) * rhoL * S_PER_H;
  const lMax = 1.25 * Math.max(load.liquidMassFlow_kg_h, lMaxWeir, lInlet);
  const guess = Math.max(load.vapourMassFlow_kg_h, 1);

  const implicit: { limit: string; label: string; metric: Metric; value: number }[] = [
    { limit: 'flood', label: 'Jet flood (100 %)', metric: (h) => h.percentFlood, value: 100 },
    {
      limit: 'floodDesign',
      label: `Jet flood design line (${lim.jetFlood} %)`,
      metric: (h) => h.percentFlood,
      value: lim.jetFlood,
    },
    {
      limit: 'entrainment',
      label: `Entrainment (ψ = ${lim.entrainment})`,
      metric: (h) => h.details.entrainmentFraction,
      value: lim.entrainment,
    },
    {
      limit: 'downcomerBackup',
      label: `Downcomer backup (${lim.downcomerBackup} % of TS + hw)`,
      metric: (h) => h.details.downcomerBackupPercent ?? 0,
      value: lim.downcomerBackup,
    },
  ];
  const curves: OperatingWindowCurve[] = [];
  let vTop = load.vapourMassFlow_kg_h;
  for (const c of implicit) {
    const curve: OperatingWindowCurve = { limit: c.limit, label: c.label, liquid_kg_h: [], vapour_kg_h: [] };
    for (let i = 0; i < n; i++) {
      const liquid = (lMax * i) / (n - 1);
      const v = vapourAtLimit(p, load, liquid, c.metric, c.value, guess);
      if (v === undefined) continue;
      curve.liquid_kg_h.push(liquid);
      curve.vapour_kg_h.push(v);
      if (v > vTop) vTop = v;
    }
    curves.push(curve);
  }
  // Weep line: the weep-point hole velocity does not depend on the vapour rate.
  const weep: OperatingWindowCurve = { limit: 'weep', label: 'Weep point', liquid_kg_h: [], vapour_kg_h: [] };
  for (let i = 0; i < n; i++) {
    const liquid = (lMax * i) / (n - 1);
    const uW = at(p, load, 0, liquid).details.weepPointHoleVelocity_m_s;
    weep.liquid_kg_h.push(liquid);
    weep.vapour_kg_h.push(uW * load.vapourDensity_kg_m3 * p.holeArea * S_PER_H);
  }
  curves.push(weep);
  const top = 1.1 * vTop;
  const vertical = (limit: string, label: string, liquid: number): OperatingWindowCurve => ({
    limit,
    label,
    liquid_kg_h: [liquid, liquid],
    vapour_kg_h: [0, top],
  });
  curves.push({
    ...vertical('downcomerInletVelocity', `Downcomer inlet velocity (${lim.downcomerInletVelocity} m/s)`, lInlet),
    value: lim.downcomerInletVelocity,
  });
  curves.push({
    ...vertical('minWeirLoading', `Minimum weir loading (crest ${lim.liquidLoad} mm)`, lMinWeir),
    value: lim.liquidLoad,
  });
  curves.push({
    ...vertical('maxWeirLoading', `Maximum weir loading (${lim.weirLoading} m³/(h·m))`, lMaxWeir),
    value: lim.weirLoading,
  });
  return {
    tray: load.tray,
    curves,
    operatingPoint: { liquid_kg_h: load.liquidMassFlow_kg_h, vapour_kg_h: load.vapourMassFlow_kg_h },
  };
}
