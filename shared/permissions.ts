/**
 * The one permission matrix: who may do what. Client (navigation, guards) and server (every route)
 * both read it.
 */
export const ROLES = ['admin', 'process-engineer', 'internals-specialist', 'inspector', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = [
  'users.manage',
  'geometry.edit',
  'loads.edit',
  'ratings.run',
  'reviews.approve',
  'inspections.record',
  'evidence.record',
  'read',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  'process-engineer': 'Process engineer',
  'internals-specialist': 'Internals specialist',
  inspector: 'Inspector',
  viewer: 'Viewer',
};

export const PERMISSION_LABELS: Record<Permission, string> = {
  'users.manage': 'Manage users',
  'geometry.edit': 'Edit column geometry',
  'loads.edit': 'Edit load cases',
  'ratings.run': 'Run ratings and studies',
  'reviews.approve': 'Review and approve',
  'inspections.record': 'Record inspections',
  'evidence.record': 'Record field evidence',
  read: 'Read',
};

export const PERMISSION_MATRIX: Record<Role, readonly Permission[]> = {
  admin: ['users.manage', 'read'],
  'process-engineer': ['loads.edit', 'ratings.run', 'evidence.record', 'read'],
  'internals-specialist': ['geometry.edit', 'loads.edit', 'ratings.run', 'reviews.approve', 'evidence.record', 'read'],
  inspector: ['inspections.record', 'evidence.record', 'read'],
  viewer: ['read'],
};

export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return PERMISSION_MATRIX[role].includes(permission);
}

/**
 * What a column's engineer must hold: who may be assigned as a column's engineer and countersign its
 * inspections (besides seeing the column's site). Process engineers and internals specialists hold it.
 */
export const COLUMN_ENGINEER_PERMISSION: Permission = 'ratings.run';

/** The roles that hold a permission. */
export const rolesWith = (permission: Permission): Role[] => ROLES.filter((r) => can(r, permission));
