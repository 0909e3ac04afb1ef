import type { SectionGeometry } from './rating.js';
import type { LoadCaseSummary } from './loads.js';
import type { RunSummary } from './runs.js';

export type TrayNumbering = 'top-down' | 'bottom-up';

export interface ColumnSummary {
  id: string;
  tag: string;
  service: string;
  numbering: TrayNumbering;
  trayCount: number;
  siteId: string;
  siteName: string;
  unitId: string;
  unitName: string;
  engineerId: string | null;
  version: number;
  updatedAt: string;
}

// ---- Sites, units, columns (issue 4) ----

export interface SiteRecord {
  id: string;
  name: string;
  location: string;
  version: number;
}

export interface UnitRecord {
  id: string;
  siteId: string;
  name: string;
  version: number;
}

/** A flag on one tray of a column: feed, side draw, pump-around draw/return, chimney tray, free note. */
export type TrayMarkKind = 'feed' | 'side-draw' | 'pa-draw' | 'pa-return' | 'chimney' | 'note';
export interface TrayMark {
  tray: number;
  kind: TrayMarkKind;
  label: string;
}

export interface CreateSiteBody {
  name: string;
  location?: string;
}
export interface CreateUnitBody {
  siteId: string;
  name: string;
}

/** POST /columns body (trays are numbered 1..trayCount in the column's numbering direction). */
export interface CreateColumnBody {
  unitId: string;
  tag: string;
  service?: string;
  numbering: TrayNumbering;
  trayCount: number;
  engineerId?: string | null;
  trayMarks?: TrayMark[];
}

/** PUT /columns/:id body: every editable field is optional; version is the one loaded. */
export interface UpdateColumnBody {
  tag?: string;
  service?: string;
  numbering?: TrayNumbering;
  trayCount?: number;
  engineerId?: string | null;
  trayMarks?: TrayMark[];
  version: number;
}

/** Where a section's geometry comes from: design drawings, as left after a turnaround, or as found at inspection. */
export type GeometryProvenance = 'design' | 'as-left' | 'as-found';

/** A tray section: an inclusive tray range (firstTray ≤ lastTray, in the column's numbering) with one geometry. */
export interface TraySectionRecord {
  id: string;
  columnId: string;
  name: string;
  firstTray: number;
  lastTray: number;
  geometry: SectionGeometry;
  provenance: GeometryProvenance;
  /** ISO date (YYYY-MM-DD); required for as-left and as-found, null for design */
  provenanceDate: string | null;
  notes: string;
  version: number;
  updatedAt: string;
}

export interface SectionBody {
  name: string;
  firstTray: number;
  lastTray: number;
  geometry: SectionGeometry;
  provenance: GeometryProvenance;
  provenanceDate?: string | null;
  notes?: string;
}
export type UpdateSectionBody = SectionBody & { version: number };

export interface PumpAroundRecord {
  id: string;
  columnId: string;
  name: string;
  /** tray the liquid is drawn from (the bottom of the pump-around zone) */
  drawTray: number;
  /** tray the cooled liquid returns to (the top of the zone) */
  returnTray: number;
  baseDuty_kW: number;
  version: number;
}
export interface PumpAroundBody {
  name: string;
  drawTray: number;
  returnTray: number;
  baseDuty_kW: number;
}
export type UpdatePumpAroundBody = PumpAroundBody & { version: number };

/** GET /columns/:id */
export interface ColumnDetail extends ColumnSummary {
  trayMarks: TrayMark[];
  sections: TraySectionRecord[];
  pumpArounds: PumpAroundRecord[];
  loadCases: LoadCaseSummary[];
  runs: RunSummary[];
}

/** GET /columns query: paging plus filters. */
export interface ColumnListQuery {
  page?: number;
  pageSize?: number;
  q?: string;
  siteId?: string;
  unitId?: string;
}
