/**
 * Invented per-tray loads for T-701 (tray 1 at the top; vapour entering each tray from below, liquid
 * leaving it; properties at tray conditions). Smooth profiles of our own with steps at the pump-around
 * returns and side draws; no number is copied from a book or a simulation of a real plant.
 */
import type { CreateLoadCaseBody } from '../../../shared/types/loads.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

export interface ProfileOptions {
  /** multiplier on every vapour rate */
  vapour: number;
  /** multiplier on every liquid rate */
  liquid: number;
  /** extra multiplier on the vapour of trays 1–8 (lighter winter crude: more overhead vapour) */
  topVapour?: number;
  /** liquid leaving tray 1 (above the top PA return) [kg/h]; a higher top-PA duty condenses less reflux */
  topReflux_kg_h: number;
}

const r = (x: number, d = 0): number => +x.toFixed(d);

/** Liquid leaving tray t [kg/h] for the normal case, before multipliers. */
function liquidBase(t: number, topReflux: number): number {
  if (t === 1) return topReflux;
  if (t <= 4) return 290000 - 4000 * t; // top PA circulation returns on tray 2, drawn from tray 4
  if (t <= 10) return 165000 - 2500 * t; // above the kerosene draw
  if (t <= 16) return 118000 - 1500 * t;
  if (t <= 20) return 300000 - 3000 * t; // diesel PA circulation, trays 17–20
  if (t <= 30) return 98000 - 1800 * t; // below the diesel draw
  if (t <= 40) return 62000 - 900 * t; // wash zone: little liquid above the flash zone
  return 310000 - 1500 * (t - 41); // stripping trays: atmospheric residue
}

function trayLoad(t: number, o: ProfileOptions): TrayLoad {
  const stripping = t > 40;
  const f = (t - 1) / 39; // 0 at the top, 1 at tray 40
  const vapour = stripping ? 46000 + 1500 * (46 - t) : 262000 - 50000 * f;
  const liquid = t === 1 ? o.topReflux_kg_h : liquidBase(t, o.topReflux_kg_h) * o.liquid;
  return {
    tray: t,
    vapourMassFlow_kg_h: r(vapour * o.vapour * (t <= 8 ? (o.topVapour ?? 1) : 1)),
    liquidMassFlow_kg_h: r(liquid),
    vapourDensity_kg_m3: r(stripping ? 2.1 - 0.05 * (t - 41) : 3.1 + 1.4 * f, 2),
    liquidDensity_kg_m3: r(stripping ? 835 - (t - 41) : 688 + 95 * f, 1),
    surfaceTension_mN_m: r(stripping ? 11.5 : 19.5 - 7 * f, 2),
    liquidViscosity_mPa_s: r(stripping ? 1.1 : 0.45 + 0.35 * f, 3),
    temperature_C: r(stripping ? 352 - 3 * (t - 41) : 118 + 232 * f, 1),
    pressure_kPa: r(168 + 0.75 * (t - 1), 1),
  };
}

export const demoProfile = (o: ProfileOptions): TrayLoad[] => Array.from({ length: 46 }, (_, i) => trayLoad(i + 1, o));

export const DEMO_LOAD_CASES: (CreateLoadCaseBody & { runLabel: string })[] = [
  {
    name: 'Summer normal',
    basis: 'normal',
    source: 'typed',
    notes: 'Invented demo case: summer crude slate at normal throughput',
    loads: demoProfile({ vapour: 1, liquid: 1, topReflux_kg_h: 150000 }),
    runLabel: 'Summer normal — base rating',
  },
  {
    name: 'Winter maximum',
    basis: 'maximum',
    source: 'typed',
    notes: 'Invented demo case: winter slate at maximum throughput',
    loads: demoProfile({ vapour: 1.12, topVapour: 1.27, liquid: 1.15, topReflux_kg_h: 185000 }),
    runLabel: 'Winter maximum — throughput check',
  },
  {
    name: 'High top-PA duty',
    basis: 'pump-around-study',
    source: 'typed',
    notes: 'Invented demo case: top PA duty raised; less reflux reaches tray 1',
    loads: demoProfile({ vapour: 0.97, liquid: 1, topReflux_kg_h: 9000 }),
    runLabel: 'High top-PA duty — dry-out check',
  },
];
