import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { api, setUnauthorizedHandler } from '../boot/api';
import { can, type Permission } from '../../shared/permissions';
import { authContract } from '../../shared/contract/auth';
import type { SessionUser, SignInBody, UnitSystem } from '../../shared/types/api';
import type { PressureDropUnit } from '../../shared/units';

export const useAuthStore = defineStore('auth', () => {
  const user = ref<SessionUser | null>(null);
  const loaded = ref(false);
  setUnauthorizedHandler(() => {
    user.value = null;
  });

  const signedIn = computed(() => user.value !== null);
  const unitSystem = computed<UnitSystem>(() => user.value?.unitSystem ?? 'SI');
  const allows = (p: Permission): boolean => can(user.value?.role, p);

  async function load(): Promise<void> {
    if (loaded.value) return;
    try {
      user.value = (await api.call(authContract.me, {}, { quiet: true })).user;
    } catch {
      user.value = null;
    }
    loaded.value = true;
  }
  async function signIn(body: SignInBody): Promise<void> {
    user.value = (await api.call(authContract.signIn, { body }, { quiet: true })).user;
    loaded.value = true;
  }
  async function signOut(): Promise<void> {
    await api.call(authContract.signOut);
    user.value = null;
  }
  /** Change the signed-in user's password; the server signs out their other sessions. */
  async function changePassword(currentPassword: string, newPassword: string): Promise<void> {
    const body = { currentPassword, newPassword };
    user.value = (await api.call(authContract.changePassword, { body }, { quiet: true })).user;
  }
  async function setUnitSystem(u: UnitSystem): Promise<void> {
    user.value = (await api.call(authContract.preferences, { body: { unitSystem: u } })).user;
  }
  async function setPressureDropUnit(u: PressureDropUnit | null): Promise<void> {
    user.value = (await api.call(authContract.preferences, { body: { pressureDropUnit: u } })).user;
  }
  return {
    user,
    loaded,
    signedIn,
    unitSystem,
    allows,
    load,
    signIn,
    signOut,
    changePassword,
    setUnitSystem,
    setPressureDropUnit,
  };
});
