import type { RouteRecordRaw } from 'vue-router';
import type { Permission } from '../../shared/permissions';

declare module 'vue-router' {
  interface RouteMeta {
    /** reachable without a session */
    public?: boolean;
    /** permission needed to open the page (else: any signed-in user) */
    permission?: Permission;
    /** navigation entry label and icon */
    nav?: { label: string; icon: string; order: number };
  }
}

/** Pages are lazy; the layout is the parent; the catch-all stays last. Other areas add children here. */
export const routes: RouteRecordRaw[] = [
  {
    path: '/sign-in',
    component: () => import('../layouts/BlankLayout.vue'),
    children: [{ path: '', name: 'sign-in', component: () => import('../pages/SignInPage.vue'), meta: { public: true } }],
  },
  {
    path: '/',
    component: () => import('../layouts/MainLayout.vue'),
    children: [
      {
        path: '',
        name: 'home',
        component: () => import('../pages/HomePage.vue'),
        meta: { permission: 'read', nav: { label: 'Columns', icon: 'view_column', order: 10 } },
      },
      {
        path: 'admin/users',
        name: 'users',
        component: () => import('../pages/UsersAdminPage.vue'),
        meta: { permission: 'users.manage', nav: { label: 'Users', icon: 'manage_accounts', order: 90 } },
      },
    ],
  },
  { path: '/:catchAll(.*)*', component: () => import('../pages/ErrorNotFound.vue'), meta: { public: true } },
];
