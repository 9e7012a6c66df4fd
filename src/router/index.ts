/** Explicit routes with lazy pages; signed-out users are sent to the sign-in page. */
import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router';
import { useSessionStore } from '@/stores/session';

const routes: RouteRecordRaw[] = [
  { path: '/signin', name: 'signin', component: () => import('@/pages/signin/SignInPage.vue'), meta: { public: true } },
  { path: '/setup', name: 'setup', component: () => import('@/pages/signin/SetupPage.vue'), meta: { public: true } },
  { path: '/invite/:token', name: 'invite', component: () => import('@/pages/signin/InvitePage.vue'), meta: { public: true } },
  { path: '/forgot', name: 'forgot', component: () => import('@/pages/signin/ForgotPasswordPage.vue'), meta: { public: true } },
  { path: '/reset/:token', name: 'reset', component: () => import('@/pages/signin/ResetPasswordPage.vue'), meta: { public: true } },
  { path: '/', name: 'home', component: () => import('@/pages/home/HomePage.vue') },
  { path: '/w/:wid', name: 'workspace', component: () => import('@/pages/workspace/WorkspacePage.vue') },
  { path: '/w/:wid/team', name: 'team', component: () => import('@/pages/team/TeamPage.vue') },
  { path: '/w/:wid/outbox', name: 'outbox', component: () => import('@/pages/team/OutboxPage.vue') },
  { path: '/projects/:pid', name: 'project', component: () => import('@/pages/project/ProjectPage.vue') },
  { path: '/assemblies/:aid', name: 'assembly', component: () => import('@/pages/assembly/AssemblyPage.vue') },
  { path: '/assemblies/:aid/compare', name: 'compare', component: () => import('@/pages/compare/ComparePage.vue') },
  { path: '/w/:wid/library', name: 'library', component: () => import('@/pages/library/LibraryPage.vue') },
  { path: '/variants/:vid/report', name: 'report', component: () => import('@/pages/report/ReportPage.vue') },
  { path: '/variants/:vid', name: 'variant', component: () => import('@/pages/variant/VariantPage.vue') },
  { path: '/:rest(.*)*', name: 'missing', component: () => import('@/pages/home/MissingPage.vue'), meta: { public: true } },
];

/** The app's router (history mode: the server falls back to index.html). */
export const router = createRouter({ history: createWebHistory(), routes });

router.beforeEach(async (to) => {
  const session = useSessionStore();
  if (!session.loaded) await session.refresh();
  if (!to.meta.public && !session.me) return { name: 'signin', query: { next: to.fullPath } };
  if (to.name === 'signin' && session.me) return { name: 'home' };
  return true;
});
