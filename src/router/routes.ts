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
      { path: 'columns/:id', name: 'column', component: () => import('../pages/ColumnPage.vue'), meta: { permission: 'read' } },
      {
        path: 'columns/:id/sections/new',
        name: 'section-new',
        component: () => import('../pages/SectionPage.vue'),
        meta: { permission: 'geometry.edit' },
      },
      {
        path: 'columns/:id/sections/:sectionId',
        name: 'section',
        component: () => import('../pages/SectionPage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'columns/:id/import',
        name: 'load-import',
        component: () => import('../pages/LoadCaseImportPage.vue'),
        meta: { permission: 'loads.edit' },
      },
      {
        path: 'load-cases/:id',
        name: 'load-case',
        component: () => import('../pages/LoadCasePage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'runs/compare',
        name: 'compare',
        component: () => import('../pages/CompareRunsPage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'columns/:id/evidence/import',
        name: 'evidence-import',
        component: () => import('../pages/EvidenceScanImportPage.vue'),
        meta: { permission: 'evidence.record' },
      },
      {
        path: 'evidence/:id',
        name: 'evidence',
        component: () => import('../pages/EvidencePage.vue'),
        meta: { permission: 'read' },
      },
      { path: 'runs/:id', name: 'run', component: () => import('../pages/RunPage.vue'), meta: { permission: 'read' } },
      {
        path: 'runs/:id/report',
        name: 'run-report',
        component: () => import('../pages/RunReportPage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'columns/:id/studies/new',
        name: 'study-new',
        component: () => import('../pages/StudyPage.vue'),
        meta: { permission: 'ratings.run' },
      },
      { path: 'studies/:id', name: 'study', component: () => import('../pages/StudyPage.vue'), meta: { permission: 'read' } },
      {
        path: 'columns/:id/heat-plans/new',
        name: 'heat-plan-new',
        component: () => import('../pages/HeatPlanPage.vue'),
        meta: { permission: 'ratings.run' },
      },
      {
        path: 'heat-plans/:id',
        name: 'heat-plan',
        component: () => import('../pages/HeatPlanPage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'inspections',
        name: 'inspections',
        component: () => import('../pages/InspectionListPage.vue'),
        meta: { permission: 'read', nav: { label: 'Inspections', icon: 'fact_check', order: 40 } },
      },
      {
        path: 'inspections/:id',
        name: 'inspection',
        component: () => import('../pages/InspectionPage.vue'),
        meta: { permission: 'read' },
      },
      {
        path: 'admin/mail',
        name: 'mailbox',
        component: () => import('../pages/MailboxPage.vue'),
        meta: { permission: 'users.manage', nav: { label: 'Mail', icon: 'mail', order: 95 } },
      },
    ],
  },
  { path: '/:catchAll(.*)*', component: () => import('../pages/ErrorNotFound.vue'), meta: { public: true } },
];
