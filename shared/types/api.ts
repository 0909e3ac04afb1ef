/** Account, user and health payloads: defined once, as schemas, in shared/contract/ (these are their types). */
import type { ErrorBody } from '../contract/schema.js';

/** Body of every error answer from the API. */
export type ApiErrorBody = ErrorBody;

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type {
  ChangePasswordBody,
  CreateUserBody,
  PreferencesBody,
  ResetPasswordBody,
  SessionUser,
  SignInBody,
  SiteRecord,
  UnitSystem,
  UpdateUserBody,
  UserRecord,
} from '../contract/auth.js';
export type { HealthBody } from '../contract/health.js';
