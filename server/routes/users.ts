import { implement } from '../http/route.js';
import { listSitesWithMembers, setUserSites } from '../services/access/siteAccess.js';
import { resetPassword } from '../services/auth/passwords.js';
import { createUser, listUsers, updateUser } from '../services/auth/users.js';
import { userContract as c } from '../../shared/contract/auth.js';

export const userRoutes = [
  implement(c.list)({ handler: async ({ ds }) => ({ items: await listUsers(ds) }) }),
  implement(c.create)({ handler: async ({ ds, user, body }) => createUser(ds, user.id, body) }),
  implement(c.update)({ handler: async ({ ds, user, params, body }) => updateUser(ds, user.id, params.id, body) }),
  implement(c.resetPassword)({
    handler: async ({ ds, user, params, body }) => resetPassword(ds, user.id, params.id, body.password),
  }),
  implement(c.sites)({ handler: async ({ ds }) => ({ items: await listSitesWithMembers(ds) }) }),
  implement(c.setSites)({
    handler: async ({ ds, user, params, body }) => ({ siteIds: await setUserSites(ds, user.id, params.id, body.siteIds) }),
  }),
];
