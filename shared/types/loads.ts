/**
 * Load cases: per-tray vapour and liquid loads with properties at actual conditions (SI, the unit is in
 * the field name), as the engine's TrayLoad. Vapour is the vapour entering the tray from below, liquid the
 * liquid leaving the tray. Tray numbers follow the column's numbering direction.
 */
import type { TrayLoad } from './rating.js';

export const LOAD_BASES = ['normal', 'maximum', 'minimum', 'alternative-feed', 'pump-around-study', 'other'] as const;
export type LoadBasis = (typeof LOAD_BASES)[number];

export const LOAD_SOURCES = ['typed', 'pasted', 'imported'] as const;
export type LoadSource = (typeof LOAD_SOURCES)[number];

/** One simulation stage covering an inclusive range of actual trays (each tray takes the stage's loads). */
export interface StageMapEntry {
  stage: number;
  firstTray: number;
  lastTray: number;
}

/**
 * The duty of one of the column's pump-arounds at which a load case (usually a simulation case) was made.
 * Tagged cases calibrate a heat-recovery plan's traffic model (issue 17); PUT /load-cases/:id/pump-around-duties.
 */
export interface PumpAroundDutyTag {
  pumpAroundId: string;
  duty_kW: number;
}

export interface LoadCaseSummary {
  id: string;
  columnId: string;
  name: string;
  basis: LoadBasis;
  source: LoadSource;
  /** file name when imported, else null */
  sourceFile: string | null;
  trayCount: number;
  /** lowest and highest tray number with loads (null when empty) */
  firstTray: number | null;
  lastTray: number | null;
  createdBy: string | null;
  createdByName: string | null;
  /** pump-around duties the case was made at; empty when not tagged */
  pumpAroundDuties: PumpAroundDutyTag[];
  version: number;
  updatedAt: string;
}

export interface LoadCaseRecord extends LoadCaseSummary {
  notes: string;
  /** ordered by tray number */
  loads: TrayLoad[];
  stageMap: StageMapEntry[] | null;
}

export interface CreateLoadCaseBody {
  name: string;
  basis: LoadBasis;
  source: LoadSource;
  sourceFile?: string | null;
  notes?: string;
  loads: TrayLoad[];
  stageMap?: StageMapEntry[] | null;
}

/** PATCH /load-cases/:id: name, basis, notes. */
export interface UpdateLoadCaseBody {
  name?: string;
  basis?: LoadBasis;
  notes?: string;
  version: number;
}

/** PUT /load-cases/:id/loads: the whole per-tray grid replaces the stored one. */
export interface PutLoadsBody {
  loads: TrayLoad[];
  stageMap?: StageMapEntry[] | null;
  /** how the grid was last filled ('typed' or 'pasted'); unchanged when absent */
  source?: LoadSource;
  version: number;
}
