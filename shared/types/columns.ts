/** Sites, units, columns, tray sections and pump-arounds: defined once, as schemas, in shared/contract/ (these are their types). */
export type {
  ColumnDetail,
  ColumnSummary,
  CreateColumnBody,
  CreateSiteBody,
  CreateUnitBody,
  SiteSummary,
  TrayMark,
  TrayMarkKind,
  TrayNumbering,
  UnitRecord,
  UpdateColumnBody,
} from '../contract/columns.js';
export type {
  GeometryProvenance,
  PumpAroundBody,
  PumpAroundRecord,
  SectionBody,
  TraySectionRecord,
  UpdatePumpAroundBody,
  UpdateSectionBody,
} from '../contract/sections.js';
