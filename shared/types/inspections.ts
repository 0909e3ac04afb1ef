/**
 * Turnaround tray inspections (issue 6): per-tray/per-pass findings and measurements, tolerance checks,
 * photos, punch list and sign-off. Lengths in mm.
 */

export const INSPECTION_STATUSES = ['draft', 'inspector-signed', 'engineer-signed'] as const;
/** draft → inspector-signed (the inspector) → engineer-signed (the column's engineer); signed records are read-only. */
export type InspectionStatus = (typeof INSPECTION_STATUSES)[number];

export const DAMAGE_KINDS = ['none', 'uplift', 'crushing', 'both'] as const;
export type DamageKind = (typeof DAMAGE_KINDS)[number];

export interface TrayFindings {
  fouling: boolean;
  /** estimated share of holes or valves blocked [%], 0–100 */
  blockedPercent: number;
  corrosion: boolean;
  damage: DamageKind;
  valvesMissing: number;
  valvesStuck: number;
  looseFasteners: boolean;
  manwayInstalled: boolean;
  closureWitnessed: boolean;
  debris: boolean;
  notes: string;
}

export interface TrayMeasurements {
  /** outlet weir height at several points [mm] */
  weirHeight_mm: number[];
  /** downcomer clearance at several points along the chord [mm] */
  downcomerClearance_mm: number[];
  /** levelness, high point minus low point [mm] */
  levelness_mm: number | null;
  traySpacing_mm: number | null;
}

export type ToleranceItem = 'weirHeight' | 'downcomerClearance' | 'traySpacing' | 'levelness';

export interface LevelnessBand {
  /** upper bound of the column inside diameter for this band [mm], null = no upper bound */
  maxDiameter_mm: number | null;
  classA_mm: number;
  classB_mm: number;
}

export interface ToleranceRule {
  item: ToleranceItem;
  label: string;
  /** symmetric tolerance about the design value [mm] */
  plusMinus_mm?: number;
  /** levelness: largest allowed high−low by column diameter */
  byDiameter?: LevelnessBand[];
  /** levelness: a single limit for a project set [mm] */
  max_mm?: number;
  us?: string;
  source: string;
}

export interface ToleranceRuleSet {
  id: string;
  name: string;
  source: string;
  note?: string;
  rules: ToleranceRule[];
}

/** Which rule set an inspection checks against: the published set (class A or B levelness) or a project set. */
export interface InspectionRuleChoice {
  kind: 'published' | 'project';
  levelnessClass: 'A' | 'B';
  /** the project-specific set, entered by the user (kind 'project') */
  project?: ToleranceRuleSet;
}

/** Design values a tray's measurements are checked against (from the column's tray section geometry). */
export interface TrayDesign {
  sectionId: string | null;
  weirHeight_mm: number | null;
  downcomerClearance_mm: number | null;
  traySpacing_mm: number | null;
  columnDiameter_mm: number | null;
}

export interface MeasurementCheck {
  item: ToleranceItem;
  /** 0-based measuring point for multi-point items */
  point: number | null;
  measured: number;
  design: number | null;
  /** measured − design [mm] (levelness: the measured high−low) */
  deviation: number | null;
  /** allowed |deviation| (or max high−low) [mm] */
  tolerance: number | null;
  pass: boolean | null;
  source: string;
  message: string;
}

export interface InspectionTrayRecord {
  id: string;
  tray: number;
  pass: number;
  findings: TrayFindings;
  asFound: TrayMeasurements;
  asLeft: TrayMeasurements;
  design: TrayDesign;
  checks: { asFound: MeasurementCheck[]; asLeft: MeasurementCheck[] };
  version: number;
}

export const PUNCH_PRIORITIES = ['before-box-up', 'if-time-allows', 'next-turnaround'] as const;
export type PunchPriority = (typeof PUNCH_PRIORITIES)[number];
/** 'void': withdrawn with a reason (a duplicate, a wrong entry); kept on the list, not counted as open. */
export type PunchStatus = 'open' | 'closed' | 'void';

export interface PunchItem {
  id: string;
  itemNo: number;
  tray: number | null;
  pass: number | null;
  finding: string;
  action: string;
  priority: PunchPriority;
  owner: string;
  status: PunchStatus;
  closedBy: string | null;
  closedByName: string | null;
  closedAt: string | null;
  voidedBy: string | null;
  voidedByName: string | null;
  voidedAt: string | null;
  voidReason: string;
  version: number;
}

export interface PhotoRecord {
  id: string;
  tray: number | null;
  pass: number | null;
  finding: string;
  caption: string;
  contentType: string;
  bytes: number;
  width: number | null;
  height: number | null;
  uploadedAt: string;
  uploadedByName: string | null;
}

export interface SignatureRecord {
  userId: string;
  name: string;
  role: string;
  at: string;
}

export interface InspectionSummary {
  id: string;
  columnId: string;
  columnTag: string;
  turnaround: string;
  startDate: string;
  endDate: string | null;
  inspectorId: string | null;
  inspectorName: string | null;
  status: InspectionStatus;
  trayCount: number;
  openPunchItems: number;
  /** measurements out of tolerance (as found and as left); null in lists, where checks are not computed */
  failedChecks: number | null;
  version: number;
  updatedAt: string;
}

export interface InspectionRecord extends InspectionSummary {
  permitRef: string;
  gasTestRef: string;
  rules: InspectionRuleChoice;
  ruleSet: ToleranceRuleSet;
  notes: string;
  engineerId: string | null;
  engineerName: string | null;
  inspectorSignature: SignatureRecord | null;
  engineerSignature: SignatureRecord | null;
  trays: InspectionTrayRecord[];
  punch: PunchItem[];
  photos: PhotoRecord[];
  asFoundRunIds: string[];
  /** trays of the column (1..columnTrayCount) and the design values of each tray section */
  columnTrayCount: number;
  /** the column's tray sections: span, number of liquid passes (the pass numbers a tray has) and design values */
  designSections: { firstTray: number; lastTray: number; passes: number; design: TrayDesign }[];
}

// ---- request bodies ----

export interface CreateInspectionBody {
  columnId: string;
  turnaround: string;
  startDate: string;
  endDate?: string | null;
  permitRef?: string;
  gasTestRef?: string;
  rules?: InspectionRuleChoice;
  notes?: string;
}

export interface UpdateInspectionBody {
  turnaround?: string;
  startDate?: string;
  endDate?: string | null;
  permitRef?: string;
  gasTestRef?: string;
  rules?: InspectionRuleChoice;
  notes?: string;
  version: number;
}

/** PUT /inspections/:id/trays/:tray/:pass — create or replace one tray/pass record */
export interface SaveTrayBody {
  findings: TrayFindings;
  asFound: TrayMeasurements;
  asLeft: TrayMeasurements;
  /** omit to create; current version to replace */
  version?: number;
}

export interface CreatePunchBody {
  tray?: number | null;
  pass?: number | null;
  finding: string;
  action: string;
  priority: PunchPriority;
  owner?: string;
}

export interface UpdatePunchBody {
  finding?: string;
  action?: string;
  priority?: PunchPriority;
  owner?: string;
  /** open or closed; voiding goes through VoidPunchBody (it needs a reason) */
  status?: Exclude<PunchStatus, 'void'>;
  version: number;
}

/** POST /inspections/:id/punch/:itemId/void */
export interface VoidPunchBody {
  reason: string;
  version: number;
}

export interface SignBody {
  version: number;
}

/** POST /inspections/:id/as-found */
export interface AsFoundBody {
  loadCaseId: string;
  /** how per-tray measurements are combined per section: mean, or the worst tray (lowest clearance, highest weir, most plugging) */
  combine: 'average' | 'worst';
  /** 'asFound' (default) or 'asLeft' measurements */
  state?: 'asFound' | 'asLeft';
}

export interface AsFoundTrayChange {
  tray: number;
  designControlling: string | null;
  asFoundControlling: string | null;
  controllingChanged: boolean;
  /** checks whose status changed (ok/near/over) */
  movedChecks: { check: string; design: number; asFound: number; designStatus: string; asFoundStatus: string }[];
  /** dry-tray head of the tray's liquid [mm], design and as found */
  dryPressureDrop_mm: { design: number; asFound: number };
  /** the load case's liquid density on the tray [kg/m³], to show the dry ΔP in the user's ΔP unit */
  liquidDensity_kg_m3: number | null;
}

export interface AsFoundResult {
  designRunId: string;
  asFoundRunId: string;
  /** geometry used per section id (after measurements, plugging and missing valves) */
  geometry: Record<
    string,
    {
      weirHeight_mm: number;
      downcomerClearance_mm: number;
      holeArea_m2: number;
      valveCount: number | null;
      blockedPercent: number;
      trays: number[];
    }
  >;
  design: { controllingTray: number; controllingCheck: string; maxPercentOfLimit: number };
  asFound: { controllingTray: number; controllingCheck: string; maxPercentOfLimit: number };
  trays: AsFoundTrayChange[];
}
