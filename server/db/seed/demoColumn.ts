/**
 * Invented demo geometry for column T-701 (atmospheric crude column, 46 trays numbered top-down).
 * Every number here is our own, chosen to be physically sensible for a crude column of about 5.5 m;
 * none is taken from a book or a vendor.
 */
import type { PumpAroundBody, SectionBody, TrayMark } from '../../../shared/types/columns.js';
import type { SectionGeometry, ValveData } from '../../../shared/types/rating.js';

const valves = (holeArea_m2: number, orifice_mm: number): ValveData => ({
  count: Math.round(holeArea_m2 / ((Math.PI / 4) * (orifice_mm / 1000) ** 2)),
  orificeDiameter_mm: orifice_mm,
  valveThickness_mm: 1.5,
  materialDensity_kg_m3: 8000,
  legFactor: 1.2,
  orificeShape: 'flat',
});

/** Top section, trays 1–8 (above and around the top pump-around): two-pass moving valves. */
const top: SectionGeometry = {
  trayType: 'moving-valve',
  passes: 2,
  columnDiameter_m: 5.5,
  traySpacing_mm: 690,
  activeArea_m2: 18.4,
  downcomerTopArea_m2: 2.7,
  downcomerBottomArea_m2: 2.4,
  outletWeirLength_m: 8.1,
  weirHeight_mm: 50,
  downcomerClearance_mm: 45,
  holeArea_m2: 2.4,
  holeDiameter_mm: 39,
  deckThickness_mm: 2.7,
  systemFactor: 0.9,
  foaming: 'moderate',
  valves: valves(2.4, 39),
};

/** Middle section, trays 9–30 (kerosene and diesel draws, diesel pump-around): two-pass moving valves, 760 mm spacing. */
const middle: SectionGeometry = {
  ...top,
  traySpacing_mm: 760,
  activeArea_m2: 18.2,
  downcomerTopArea_m2: 2.7,
  downcomerBottomArea_m2: 2.4,
  outletWeirLength_m: 8.2,
  weirHeight_mm: 50,
  downcomerClearance_mm: 50,
  holeArea_m2: 2.2,
  valves: valves(2.2, 39),
};

/**
 * Wash zone, trays 31–40 (above the flash zone): two-pass sieve trays with their pass layout (side downcomers
 * 620 mm, centre downcomer 520 mm; odd trays drain to the centre): side weirs 2 × 3.48 m, centre weirs
 * 2 × 5.48 m, flow paths 1.87 m (derived from the widths). The wash liquid is small: on the odd trays, whose
 * long centre weirs carry it, the crest comes close to the 6 mm minimum.
 */
const wash: SectionGeometry = {
  trayType: 'sieve',
  passes: 2,
  columnDiameter_m: 5.5,
  traySpacing_mm: 760,
  activeArea_m2: 17.8,
  downcomerTopArea_m2: 2.9,
  downcomerBottomArea_m2: 2.6,
  outletWeirLength_m: 8.4,
  weirHeight_mm: 65,
  downcomerClearance_mm: 55,
  passLayout: { sideDowncomerWidth_mm: 620, centreDowncomerWidth_mm: 520, oddTrayOutlets: 'inner' },
  holeArea_m2: 1.25,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3.4,
  systemFactor: 0.9,
  foaming: 'moderate',
};

/** Stripping trays 41–46 below the flash zone, in the swaged 3.6 m bottom: two-pass sieve trays. */
const stripping: SectionGeometry = {
  trayType: 'sieve',
  passes: 2,
  columnDiameter_m: 3.6,
  traySpacing_mm: 610,
  activeArea_m2: 7.6,
  downcomerTopArea_m2: 1.3,
  downcomerBottomArea_m2: 1.2,
  outletWeirLength_m: 5.4,
  weirHeight_mm: 50,
  downcomerClearance_mm: 50,
  holeArea_m2: 0.46,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3.4,
  systemFactor: 0.9,
  foaming: 'moderate',
};

export const DEMO_SECTIONS: SectionBody[] = [
  {
    name: 'Top (above top PA)',
    firstTray: 1,
    lastTray: 8,
    geometry: top,
    provenance: 'as-left',
    provenanceDate: '2025-10-14',
    notes: 'Re-trayed at the 2025 turnaround',
  },
  {
    name: 'Middle (kero / diesel)',
    firstTray: 9,
    lastTray: 30,
    geometry: middle,
    provenance: 'design',
    provenanceDate: null,
    notes: '',
  },
  {
    name: 'Wash zone',
    firstTray: 31,
    lastTray: 40,
    geometry: wash,
    provenance: 'design',
    provenanceDate: null,
    notes: 'Flash zone below tray 40',
  },
  {
    name: 'Stripping (3.6 m bottom)',
    firstTray: 41,
    lastTray: 46,
    geometry: stripping,
    provenance: 'design',
    provenanceDate: null,
    notes: 'Steam-stripped residue',
  },
];

export const DEMO_PUMP_AROUNDS: PumpAroundBody[] = [
  { name: 'Top PA', drawTray: 4, returnTray: 2, baseDuty_kW: 14500 },
  { name: 'Diesel PA', drawTray: 20, returnTray: 17, baseDuty_kW: 21800 },
];

export const DEMO_TRAY_MARKS: TrayMark[] = [
  { tray: 2, kind: 'pa-return', label: 'Top PA return' },
  { tray: 4, kind: 'pa-draw', label: 'Top PA draw' },
  { tray: 10, kind: 'side-draw', label: 'Kerosene draw' },
  { tray: 17, kind: 'pa-return', label: 'Diesel PA return' },
  { tray: 20, kind: 'pa-draw', label: 'Diesel PA draw' },
  { tray: 21, kind: 'side-draw', label: 'Diesel draw' },
  { tray: 40, kind: 'feed', label: 'Flash zone below tray 40 (crude feed)' },
];
