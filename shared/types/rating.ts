/**
 * Rating request and result payloads, shared by the engine, the API, the CLI and the client.
 * SI units throughout; the unit is part of each field name.
 */
import type { JsonPayload as Request } from './jsonPayload.js';
import type {
  methodOptionsSchema,
  passLayoutSchema,
  ratingRequestSchema,
  sectionGeometrySchema,
  trayLoadSchema,
  valveDataSchema,
} from '../schemas/ratingRequest.js';

/*
 * Request types are derived from their JSON schemas (shared/schemas/ratingRequest.ts), where each field is
 * declared once with its bounds and description. Fields with a schema default (systemFactor, foaming,
 * methods, jetFlood, nearFraction) stay optional: the engine applies the same defaults itself
 * (server/engine/prepare.ts, limits.ts).
 */
export type ValveData = Request<typeof valveDataSchema>;
/** Layout of a two- or four-pass tray (passLayoutSchema). */
export type PassLayout = Request<typeof passLayoutSchema>;
export type SectionGeometry = Request<typeof sectionGeometrySchema>;
export type TrayLoad = Request<typeof trayLoadSchema>;
export type MethodOptions = Request<typeof methodOptionsSchema>;
export type RatingRequest = Request<typeof ratingRequestSchema>;

export type TrayType = SectionGeometry['trayType'];
export type FoamingClass = NonNullable<SectionGeometry['foaming']>;
export type JetFloodMethod = NonNullable<MethodOptions['jetFlood']>;
/** Where a multipass tray's odd-numbered trays drain (passLayoutSchema oddTrayOutlets). */
export type PassOutlets = PassLayout['oddTrayOutlets'];
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
