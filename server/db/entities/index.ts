import { AuditEntry } from './AuditEntry.js';
import { ProcessUnit } from './ProcessUnit.js';
import { Site } from './Site.js';
import { SiteMember } from './SiteMember.js';
import { TowerColumn } from './TowerColumn.js';
import { User } from './User.js';

export { AuditEntry, ProcessUnit, Site, SiteMember, TowerColumn, User };

/** Every entity; add new ones here. */
export const entities = [User, Site, SiteMember, ProcessUnit, TowerColumn, AuditEntry];
