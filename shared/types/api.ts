import type { Role } from '../permissions.js';

/** Body of every error answer from the API. */
export interface ApiErrorBody {
  error: string;
  details?: { path: string; message: string }[];
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type UnitSystem = 'SI' | 'US';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  unitSystem: UnitSystem;
  /** an administrator set a temporary password: the user changes it before anything else */
  mustChangePassword: boolean;
}

export interface UserRecord extends SessionUser {
  active: boolean;
  createdAt: string;
  version: number;
}

export interface SignInBody {
  email: string;
  password: string;
}

/** The signed-in user changes their own password. */
export interface ChangePasswordBody {
  currentPassword: string;
  newPassword: string;
}

/** An administrator sets a temporary password for another user. */
export interface ResetPasswordBody {
  password: string;
}

export interface CreateUserBody {
  email: string;
  name: string;
  role: Role;
  password: string;
}

export interface UpdateUserBody {
  name?: string;
  role?: Role;
  active?: boolean;
  unitSystem?: UnitSystem;
  version: number;
}

export interface HealthBody {
  status: 'ok' | 'degraded';
  database: 'reachable' | 'unreachable';
  engineVersion?: string;
}

export interface SiteRecord {
  id: string;
  name: string;
  location: string;
  /** users granted sight of the site's columns */
  memberIds: string[];
}
