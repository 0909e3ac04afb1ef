/**
 * Rating request and result payloads, shared by the engine, the API, the CLI and the client.
 * SI units throughout; the unit is part of each field name.
 */

export type TrayType = 'sieve' | 'fixed-valve' | 'moving-valve';
export type FoamingClass = 'low' | 'moderate' | 'high' | 'very-high';
export type JetFloodMethod = 'fair' | 'kister-haas';
/**
 * 'ok' within the limit, 'near' close to it, 'over' beyond it; 'na' the check does not apply to this tray
 * (the liquid-side checks of a dry tray, entrainment past flood, a seal the geometry already provides).
 */
export type CheckStatus = 'ok' | 'near' | 'over' | 'na';
/**
 * Verdict on a whole tray (shared/verdict.ts): 'dry' no liquid on the tray; 'flooded' at or past jet flood
 * (100 % of flood by the chosen method); otherwise the worst status of its checks.
 */
export type TrayState = 'ok' | 'near' | 'over' | 'flooded' | 'dry';

export interface ValveData {
  count: number;
  orificeDiameter_mm: number;
  valveThickness_mm: number;
  materialDensity_kg_m3: number;
  /** weight with legs / weight without legs (Klein 1982, R_vw) */
  legFactor: number;
  orificeShape: 'flat' | 'venturi';
}

/**
 * Where a multipass tray's passes drain. Two-pass: 'side' = to the two side downcomers, 'inner' = to the
 * centre downcomer. Four-pass: 'side' = to the side downcomers and the centre downcomer, 'inner' = to the
 * two off-centre downcomers. Trays alternate, so the other kind is the even-numbered trays.
 */
export type PassOutlets = 'side' | 'inner';

/**
 * Layout of a two- or four-pass tray, symmetric about the column axis, with vertical downcomers (the
 * top widths bound the pass panels). Widths are measured across the flow direction at the tray deck.
 */
export interface PassLayout {
  /** width of each side downcomer, shell to weir [mm] */
  sideDowncomerWidth_mm: number;
  /** full width of the centre downcomer [mm] */
  centreDowncomerWidth_mm: number;
  /** four-pass: full width of each off-centre downcomer [mm] */
  offCentreDowncomerWidth_mm?: number;
  /** four-pass: distance from the column axis to each off-centre downcomer's centre line [mm] */
  offCentreDowncomerOffset_mm?: number;
  /** where the odd-numbered trays drain (the even-numbered ones drain to the other downcomers) */
  oddTrayOutlets: PassOutlets;
  /**
   * Fraction of the tray's liquid in each pass, across the tray from one shell wall to the other
   * (one entry per pass, summing to 1). Absent: equal split.
   */
  liquidSplit?: number[];
}

export interface SectionGeometry {
  trayType: TrayType;
  passes: 1 | 2 | 4;
  /** two- and four-pass trays: the pass layout; absent, passes are rated as equal shares of the totals */
  passLayout?: PassLayout;
  columnDiameter_m: number;
  traySpacing_mm: number;
  activeArea_m2: number;
  downcomerTopArea_m2: number;
  downcomerBottomArea_m2: number;
  outletWeirLength_m: number;
  weirHeight_mm: number;
  downcomerClearance_mm: number;
  holeArea_m2: number;
  holeDiameter_mm: number;
  deckThickness_mm: number;
  systemFactor?: number;
  foaming?: FoamingClass;
  valves?: ValveData;
  /**
   * valve trays: open slot (curtain) area of all valves fully open [m²], the vertical opening through which
   * vapour leaves the valves; gives the fractional open area A_f of the flood correlations (Perry's 8th ed.)
   */
  slotArea_m2?: number;
  /** optional measured or vendor dry-tray orifice coefficient C_v (sieve trays); overrides the Hughmark & O'Connell fit */
  orificeCoefficient?: number;
}

export interface TrayLoad {
  tray: number;
  vapourMassFlow_kg_h: number;
  liquidMassFlow_kg_h: number;
  vapourDensity_kg_m3: number;
  liquidDensity_kg_m3: number;
  surfaceTension_mN_m: number;
  liquidViscosity_mPa_s?: number;
  temperature_C?: number;
  pressure_kPa?: number;
}

export interface MethodOptions {
  jetFlood?: JetFloodMethod;
  /** limit overrides, keyed by check name */
  limits?: Partial<Record<CheckName, number>>;
  /** fraction of a limit at which status becomes 'near' (default 0.9) */
  nearFraction?: number;
}

export interface RatingRequest {
  section: SectionGeometry;
  trays: TrayLoad[];
  methods?: MethodOptions;
}

export const CHECK_NAMES = [
  'jetFlood',
  'entrainment',
  'weeping',
  'pressureDrop',
  'weirLoading',
  'liquidLoad',
  'downcomerBackup',
  'downcomerInletVelocity',
  'downcomerResidenceTime',
  'downcomerSeal',
] as const;
export type CheckName = (typeof CHECK_NAMES)[number];

export interface CheckResult {
  value: number;
  unit: string;
  limit: number;
  /** 'max' when the value must stay below the limit, 'min' when above */
  sense: 'max' | 'min';
  /** value as percent of limit, oriented so that 100 % is the limit for both senses */
  percentOfLimit: number;
  status: CheckStatus;
  method: string;
}

export interface EngineWarning {
  code: string;
  message: string;
  tray?: number;
}

export interface TrayDetails {
  flowParameter: number;
  capacityFactor_m_s: number;
  fFactor_Pa05: number;
  netAreaVelocity_m_s: number;
  floodVelocity_m_s: number;
  holeVelocity_m_s: number;
  weepPointHoleVelocity_m_s: number;
  dryPressureDrop_mm: number;
  clearLiquidHeight_mm: number;
  residualHead_mm: number;
  crestOverWeir_mm: number;
  weirLoading_m3_h_m: number;
  downcomerInletVelocity_m_s: number;
  downcomerHeadLoss_mm: number;
  downcomerClearBackup_mm: number;
  downcomerAeratedBackup_mm: number;
  downcomerResidenceTime_s: number;
  entrainmentFraction: number;
  entrainedLiquid_kg_h: number;
  totalPressureDrop_Pa: number;
  [key: string]: number;
}

export interface TrayResult {
  tray: number;
  checks: Record<CheckName, CheckResult>;
  details: TrayDetails;
  controllingCheck: CheckName;
  warnings: EngineWarning[];
}

export interface SectionSummaryEntry {
  check: CheckName;
  worstTray: number;
  worstValue: number;
  percentOfLimit: number;
  status: CheckStatus;
}

export interface SectionSummary {
  worst: SectionSummaryEntry[];
  controllingCheck: CheckName;
  controllingTray: number;
  /** 100 − highest percent of limit over all trays and checks */
  marginToNearestLimit_percent: number;
  /** lowest ratio over trays of vapour load to weep-point vapour load */
  turndown: number;
  /** trays flooded, dry or beyond a limit (shared/verdict.ts trayState) */
  traysOver: number[];
  /** trays close to a limit and none beyond */
  traysNear: number[];
}

export interface RatingResult {
  engineVersion: string;
  trays: TrayResult[];
  summary: SectionSummary;
  warnings: EngineWarning[];
}

export interface OperatingWindowCurve {
  /** e.g. 'flood', 'floodDesign', 'entrainment', 'downcomerBackup', 'downcomerInletVelocity', 'weep', 'minWeirLoading', 'maxWeirLoading' */
  limit: string;
  label: string;
  /** for a limit drawn at one value: that value in SI (m/s, mm of crest, m³/(h·m)), so clients can relabel it in their units */
  value?: number;
  /** points of liquid mass flow [kg/h] against vapour mass flow [kg/h] */
  liquid_kg_h: number[];
  vapour_kg_h: number[];
}

export interface OperatingWindow {
  tray: number;
  curves: OperatingWindowCurve[];
  operatingPoint: { liquid_kg_h: number; vapour_kg_h: number };
}
