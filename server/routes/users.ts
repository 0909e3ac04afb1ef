import { defineRoutes } from '../http/route.js';
import { listSitesWithMembers, setUserSites } from '../services/access/siteAccess.js';
import { resetPassword } from '../services/auth/passwords.js';
import { createUser, listUsers, updateUser } from '../services/auth/users.js';
import { createUserBody, resetPasswordBody, updateUserBody, userSitesBody } from '../../shared/schemas/auth.js';
import { uuidParams } from '../../shared/schemas/common.js';
import type { CreateUserBody, ResetPasswordBody, UpdateUserBody } from '../../shared/types/api.js';

export const userRoutes = defineRoutes([
  {
    method: 'get',
    path: '/users',
    access: 'users.manage',
    summary: 'List every user',
    handler: async ({ ds }) => ({ items: await listUsers(ds) }),
  },
  {
    method: 'post',
    path: '/users',
    access: 'users.manage',
    summary: 'Create a user',
    body: createUserBody,
    status: 201,
    handler: async ({ ds, user, body }) => createUser(ds, user.id, body as CreateUserBody),
  },
  {
    method: 'patch',
    path: '/users/:id',
    access: 'users.manage',
    summary: 'Rename, change role, deactivate or reactivate a user (optimistic lock on version)',
    params: uuidParams,
    body: updateUserBody,
    handler: async ({ ds, user, params, body }) => updateUser(ds, user.id, (params as { id: string }).id, body as UpdateUserBody),
  },
  {
    method: 'post',
    path: '/users/:id/password',
    access: 'users.manage',
    summary: 'Set a temporary password for a user: their sessions end and they change it at next sign-in',
    params: uuidParams,
    body: resetPasswordBody,
    handler: async ({ ds, user, params, body }) =>
      resetPassword(ds, user.id, (params as { id: string }).id, (body as ResetPasswordBody).password),
  },
  {
    method: 'get',
    path: '/sites',
    access: 'users.manage',
    summary: 'Every site with the users who may see its columns',
    handler: async ({ ds }) => ({ items: await listSitesWithMembers(ds) }),
  },
  {
    method: 'put',
    path: '/users/:id/sites',
    access: 'users.manage',
    summary: 'Set the sites whose columns a user may see',
    params: uuidParams,
    body: userSitesBody,
    handler: async ({ ds, user, params, body }) => ({
      siteIds: await setUserSites(ds, user.id, (params as { id: string }).id, (body as { siteIds: string[] }).siteIds),
    }),
  },
]);
