import { AuditEntry } from './AuditEntry.js';
import { ImportPreviewEntity } from './ImportPreview.js';
import { LoadCase } from './LoadCase.js';
import { PumpAround } from './PumpAround.js';
import { RatingRun } from './RatingRun.js';
import { TraySection } from './TraySection.js';
import { MailOutbox } from './MailOutbox.js';
import { FieldEvidence } from './FieldEvidence.js';
import { Inspection } from './Inspection.js';
import { InspectionPhoto } from './InspectionPhoto.js';
import { InspectionTray } from './InspectionTray.js';
import { PunchItemEntity } from './PunchItem.js';
import { ProcessUnit } from './ProcessUnit.js';
import { PumpAroundStudy } from './PumpAroundStudy.js';
import { HeatPlan } from './HeatPlan.js';
import { HeatPlanPoint } from './HeatPlanPoint.js';
import { Site } from './Site.js';
import { SiteMember } from './SiteMember.js';
import { TowerColumn } from './TowerColumn.js';
import { User } from './User.js';

export { MailOutbox };
export { ImportPreviewEntity };
export { Inspection, InspectionPhoto, InspectionTray, PunchItemEntity };
export { LoadCase, PumpAround, RatingRun, TraySection };
export { FieldEvidence };
export { HeatPlan, HeatPlanPoint, PumpAroundStudy };
export { AuditEntry, ProcessUnit, Site, SiteMember, TowerColumn, User };

/** Every entity; add new ones here. */
export const entities = [
  User,
  Site,
  SiteMember,
  ProcessUnit,
  TowerColumn,
  AuditEntry,
  MailOutbox,
  PumpAroundStudy,
  HeatPlan,
  HeatPlanPoint,
  TraySection,
  PumpAround,
  LoadCase,
  RatingRun,
  Inspection,
  InspectionTray,
  InspectionPhoto,
  PunchItemEntity,
  ImportPreviewEntity,
  FieldEvidence,
];
