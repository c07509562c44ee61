import type { RouteRecordRaw } from 'vue-router'

declare module 'vue-router' {
  interface RouteMeta {
    /** Shown in the browser tab, before " · Chimeline". */
    title?: string
    /** Signed-out users are sent to sign in, and back here afterwards. */
    requiresAuth?: boolean
    /** Only for site admins. */
    requiresAdmin?: boolean
    /** Sign-in and friends: a signed-in user goes on to the app. */
    guestOnly?: boolean
    /** `plain` pages (sign-in, errors) have no navigation. */
    layout?: 'shell' | 'plain'
  }
}

// Views are loaded on demand so that the sign-in page does not wait for the Bench's editor and charts.
export const routes: RouteRecordRaw[] = [
  { path: '/', redirect: { name: 'bench' } },
  {
    path: '/bench',
    name: 'bench',
    component: () => import('@/views/BenchView.vue'),
    meta: { title: 'Bench', requiresAuth: true },
  },
  {
    path: '/scenarios',
    name: 'scenarios',
    component: () => import('@/views/ScenariosView.vue'),
    meta: { title: 'Scenarios', requiresAuth: true },
  },
  {
    path: '/workspace/settings',
    name: 'workspace-settings',
    component: () => import('@/views/WorkspaceSettingsView.vue'),
    meta: { title: 'Workspace settings', requiresAuth: true },
  },
  {
    // A share link works signed out when it allows it; the view asks the server, which decides.
    path: '/s/:token',
    name: 'share',
    component: () => import('@/views/ShareView.vue'),
    meta: { title: 'Shared scenario', layout: 'plain' },
  },
  {
    path: '/sweeps',
    name: 'sweeps',
    component: () => import('@/views/SweepsView.vue'),
    meta: { title: 'Sweeps', requiresAuth: true },
  },
  {
    path: '/sweeps/:id',
    name: 'sweep',
    component: () => import('@/views/SweepsView.vue'),
    props: true,
    meta: { title: 'Sweep', requiresAuth: true },
  },
  {
    // Side by side: both runs and the view are in the query (src/lib/compare/url.ts).
    path: '/compare',
    name: 'compare',
    component: () => import('@/views/CompareView.vue'),
    meta: { title: 'Side by side', requiresAuth: true },
  },
  {
    path: '/suites',
    name: 'suites',
    component: () => import('@/views/SuitesView.vue'),
    meta: { title: 'Suites', requiresAuth: true },
  },
  {
    path: '/suites/:id',
    name: 'suite',
    component: () => import('@/views/SuiteView.vue'),
    props: true,
    meta: { title: 'Suite', requiresAuth: true },
  },
  {
    path: '/suites/:id/report',
    name: 'suite-report',
    component: () => import('@/views/ReportView.vue'),
    props: true,
    meta: { title: 'Characterisation report', requiresAuth: true },
  },
  {
    path: '/learn',
    name: 'learn',
    component: () => import('@/views/LearnView.vue'),
    meta: { title: 'Learn', requiresAuth: true },
  },
  {
    path: '/learn/:lessonId',
    name: 'learn-lesson',
    component: () => import('@/views/LearnLessonView.vue'),
    props: true,
    meta: { title: 'Lesson', requiresAuth: true },
  },
  {
    path: '/admin/outbox',
    name: 'outbox',
    component: () => import('@/views/OutboxView.vue'),
    meta: { title: 'Outbox', requiresAuth: true, requiresAdmin: true },
  },
  {
    path: '/signin',
    name: 'signin',
    component: () => import('@/views/SignInView.vue'),
    meta: { title: 'Sign in', guestOnly: true, layout: 'plain' },
  },
  {
    path: '/signup',
    name: 'signup',
    component: () => import('@/views/SignUpView.vue'),
    meta: { title: 'Create an account', guestOnly: true, layout: 'plain' },
  },
  {
    path: '/forgot',
    name: 'forgot',
    component: () => import('@/views/ForgotPasswordView.vue'),
    meta: { title: 'Forgotten password', guestOnly: true, layout: 'plain' },
  },
  {
    // Reachable signed in too: the link in the e-mail must work in whatever tab it opens.
    path: '/reset',
    name: 'reset',
    component: () => import('@/views/ResetPasswordView.vue'),
    meta: { title: 'Choose a new password', layout: 'plain' },
  },
  {
    path: '/invite',
    name: 'invite',
    component: () => import('@/views/AcceptInvitationView.vue'),
    meta: { title: 'Invitation', layout: 'plain' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@/views/NotFoundView.vue'),
    meta: { title: 'Page not found', layout: 'plain' },
  },
]
