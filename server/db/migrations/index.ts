import { Foundation1764633600000 } from './1764633600000-Foundation.js';
import { ColumnsLoadsRuns1764640000000 } from './1764640000000-ColumnsLoadsRuns.js';
import { MailOutbox1764650000000 } from './1764650000000-MailOutbox.js';
import { Inspections1764650000001 } from './1764650000001-Inspections.js';
import { PumpAroundStudies1764660000000 } from './1764660000000-PumpAroundStudies.js';
import { RunResultsCompressed1764670000000 } from './1764670000000-RunResultsCompressed.js';
import { AsFoundDesignRuns1764740000000 } from './1764740000000-AsFoundDesignRuns.js';
import { UserSessions1764680000000 } from './1764680000000-UserSessions.js';
import { ImportPreviews1764690000000 } from './1764690000000-ImportPreviews.js';
import { RunResultsByName1764750000000 } from './1764750000000-RunResultsByName.js';
import { PunchVoid1764840000000 } from './1764840000000-PunchVoid.js';
import { FieldEvidence1764820000000 } from './1764820000000-FieldEvidence.js';
import { HeatPlans1764830000000 } from './1764830000000-HeatPlans.js';
import { PressureDropUnit1764840000001 } from './1764840000001-PressureDropUnit.js';

/** Every migration in order; add new ones at the end. */
export const migrations = [
  Foundation1764633600000,
  MailOutbox1764650000000,
  PumpAroundStudies1764660000000,
  ColumnsLoadsRuns1764640000000,
  Inspections1764650000001,
  RunResultsCompressed1764670000000,
  AsFoundDesignRuns1764740000000,
  UserSessions1764680000000,
  ImportPreviews1764690000000,
  RunResultsByName1764750000000,
  PunchVoid1764840000000,
  FieldEvidence1764820000000,
  HeatPlans1764830000000,
  PressureDropUnit1764840000001,
];
