/** Contracts of sign-in, the signed-in account, user administration and site access. */
import { Type, type Static } from '@sinclair/typebox';
import { ROLES } from '../permissions.js';
import { PRESSURE_DROP_UNITS } from '../units.js';
import { IdParams, ItemsOf, Obj, Ok, StringEnum, Timestamp, Uuid } from './schema.js';
import { route } from './route.js';

export const RoleSchema = StringEnum(ROLES);
export const UnitSystemSchema = StringEnum(['SI', 'US'] as const);
export type UnitSystem = Static<typeof UnitSystemSchema>;
export const PressureDropUnitSchema = StringEnum(PRESSURE_DROP_UNITS);

const sessionUserFields = {
  id: Uuid(),
  email: Type.String(),
  name: Type.String(),
  role: RoleSchema,
  unitSystem: UnitSystemSchema,
  /** tray ΔP unit chosen by the user; null: the unit system's default (mm liquid SI, in liquid US) */
  pressureDropUnit: Type.Union([PressureDropUnitSchema, Type.Null()]),
  /** an administrator set a temporary password: the user changes it before anything else */
  mustChangePassword: Type.Boolean(),
};
export const SessionUserSchema = Obj(sessionUserFields);
export type SessionUser = Static<typeof SessionUserSchema>;

export const UserRecordSchema = Obj({
  ...sessionUserFields,
  active: Type.Boolean(),
  createdAt: Timestamp(),
  version: Type.Integer(),
});
export type UserRecord = Static<typeof UserRecordSchema>;

export const SiteRecordSchema = Obj({
  id: Uuid(),
  name: Type.String(),
  location: Type.String(),
  /** users granted sight of the site's columns */
  memberIds: Type.Array(Uuid()),
});
export type SiteRecord = Static<typeof SiteRecordSchema>;

/**
 * What a new password must meet (server/services/auth/passwordPolicy.ts applies it; the client repeats the
 * length checks as hints): bcrypt uses only the first 72 bytes of a password, so longer ones are refused.
 */
export const PASSWORD_RULES = { minLength: 12, maxBytes: 72, minScore: 3 } as const;

const email = Type.String({ format: 'email', maxLength: 254 });
const password = Type.String({ minLength: 1, maxLength: 200 });

export const SignInBodySchema = Obj({ email, password });
export type SignInBody = Static<typeof SignInBodySchema>;

/** The signed-in user changes their own password (lengths and strength: server/services/auth/passwordPolicy.ts). */
export const ChangePasswordBodySchema = Obj({ currentPassword: password, newPassword: password });
export type ChangePasswordBody = Static<typeof ChangePasswordBodySchema>;

/** An administrator sets a temporary password for another user. */
export const ResetPasswordBodySchema = Obj({ password });
export type ResetPasswordBody = Static<typeof ResetPasswordBodySchema>;

export const CreateUserBodySchema = Obj({
  email,
  name: Type.String({ minLength: 1, maxLength: 120 }),
  role: RoleSchema,
  password,
});
export type CreateUserBody = Static<typeof CreateUserBodySchema>;

export const UpdateUserBodySchema = Obj({
  name: Type.Optional(Type.String({ minLength: 1, maxLength: 120 })),
  role: Type.Optional(RoleSchema),
  active: Type.Optional(Type.Boolean()),
  unitSystem: Type.Optional(UnitSystemSchema),
  version: Type.Integer({ minimum: 1 }),
});
export type UpdateUserBody = Static<typeof UpdateUserBodySchema>;

/** either or both; pressureDropUnit null returns to the unit system's default */
export const PreferencesBodySchema = Obj(
  {
    unitSystem: Type.Optional(UnitSystemSchema),
    pressureDropUnit: Type.Optional(Type.Union([PressureDropUnitSchema, Type.Null()])),
  },
  { minProperties: 1 },
);
export type PreferencesBody = Static<typeof PreferencesBodySchema>;
export const UserSitesBodySchema = Obj({ siteIds: Type.Array(Uuid(), { maxItems: 200 }) });

const UserAnswer = Obj({ user: SessionUserSchema });

export const authContract = {
  signIn: route({
    method: 'post',
    path: '/auth/sign-in',
    access: 'public',
    summary: 'Sign in with e-mail and password; sets the session cookie',
    body: SignInBodySchema,
    response: UserAnswer,
  }),
  signOut: route({
    method: 'post',
    path: '/auth/sign-out',
    access: 'public',
    summary: 'Sign out: ends the session on the server and clears the cookie',
    response: Ok,
  }),
  me: route({
    method: 'get',
    path: '/auth/me',
    access: 'signed-in',
    summary: 'The signed-in user; renews the session',
    response: UserAnswer,
  }),
  changePassword: route({
    method: 'post',
    path: '/auth/password',
    access: 'signed-in',
    summary: 'Change the signed-in user’s password (current password required); ends their other sessions',
    body: ChangePasswordBodySchema,
    response: UserAnswer,
  }),
  preferences: route({
    method: 'put',
    path: '/auth/preferences',
    access: 'signed-in',
    summary: 'Set the signed-in user’s unit system and tray ΔP unit',
    body: PreferencesBodySchema,
    response: UserAnswer,
  }),
};

export const userContract = {
  list: route({
    method: 'get',
    path: '/users',
    access: 'users.manage',
    summary: 'List every user',
    response: ItemsOf(UserRecordSchema),
  }),
  create: route({
    method: 'post',
    path: '/users',
    access: 'users.manage',
    summary: 'Create a user',
    body: CreateUserBodySchema,
    status: 201,
    response: UserRecordSchema,
  }),
  update: route({
    method: 'patch',
    path: '/users/:id',
    access: 'users.manage',
    summary: 'Rename, change role, deactivate or reactivate a user (optimistic lock on version)',
    params: IdParams,
    body: UpdateUserBodySchema,
    response: UserRecordSchema,
  }),
  resetPassword: route({
    method: 'post',
    path: '/users/:id/password',
    access: 'users.manage',
    summary: 'Set a temporary password for a user: their sessions end and they change it at next sign-in',
    params: IdParams,
    body: ResetPasswordBodySchema,
    response: UserRecordSchema,
  }),
  sites: route({
    method: 'get',
    path: '/sites',
    access: 'users.manage',
    summary: 'Every site with the users who may see its columns',
    response: ItemsOf(SiteRecordSchema),
  }),
  setSites: route({
    method: 'put',
    path: '/users/:id/sites',
    access: 'users.manage',
    summary: 'Set the sites whose columns a user may see',
    params: IdParams,
    body: UserSitesBodySchema,
    response: Obj({ siteIds: Type.Array(Uuid()) }),
  }),
};
