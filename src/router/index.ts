import { Notify } from 'quasar';
import { createRouter, createWebHistory } from 'vue-router';
import { useAuthStore } from '../stores/auth-store';
import { routes } from './routes';

export const router = createRouter({ history: createWebHistory(), routes });

router.beforeEach(async (to) => {
  if (to.meta.public) return true;
  const auth = useAuthStore();
  await auth.load();
  if (!auth.signedIn) return { name: 'sign-in', query: { redirect: to.fullPath } };
  const needed = to.matched.map((r) => r.meta.permission).filter((p) => p !== undefined);
  if (needed.some((p) => !auth.allows(p))) {
    Notify.create({ type: 'warning', message: 'Your role does not open that page' });
    return to.name === 'home' ? false : { name: 'home' };
  }
  return true;
});
