/**
 * Turnaround tray inspections (issue 6): payload types defined once by their contract
 * (shared/contract/inspectionPayloads.ts) and re-exported here for the client, services and entities.
 */
export { DAMAGE_KINDS, INSPECTION_STATUSES, PUNCH_PRIORITIES, TOLERANCE_ITEMS } from '../contract/inspectionPayloads.js';
export type {
  AsFoundBody,
  AsFoundRequest,
  AsFoundResult,
  AsFoundTrayChange,
  CreateInspectionBody,
  CreatePunchBody,
  DamageKind,
  InspectionRecord,
  InspectionRuleChoice,
  InspectionStatus,
  InspectionSummary,
  InspectionTrayRecord,
  LevelnessBand,
  MeasurementCheck,
  PhotoRecord,
  PunchItem,
  PunchPriority,
  PunchStatus,
  SaveTrayBody,
  SignatureRecord,
  SignBody,
  ToleranceItem,
  ToleranceRule,
  ToleranceRuleSet,
  TrayDesign,
  TrayFindings,
  TrayMeasurements,
  UpdateInspectionBody,
  UpdatePunchBody,
  VoidPunchBody,
} from '../contract/inspectionPayloads.js';
