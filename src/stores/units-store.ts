import { defineStore } from 'pinia';
import { computed } from 'vue';
import { useAuthStore } from './auth-store';
import { QUANTITIES, formatQuantity, fromDisplay, toDisplay, unitLabel, type QuantityId } from '../../shared/units';

/** The signed-in user's unit system applied to values held in SI: labels, display values, entry. */
export const useUnitsStore = defineStore('units', () => {
  const auth = useAuthStore();
  const system = computed(() => auth.unitSystem);
  const label = (q: QuantityId): string => unitLabel(q, system.value);
  const show = (q: QuantityId, si: number): number => toDisplay(q, si, system.value);
  const enter = (q: QuantityId, v: number): number => fromDisplay(q, v, system.value);
  const fmt = (q: QuantityId, si: number | null | undefined, decimals?: number): string =>
    formatQuantity(q, si, system.value, decimals);
  /** "Weir height (in)" */
  const withUnit = (text: string, q: QuantityId): string => `${text} (${label(q)})`;
  const decimals = (q: QuantityId): number => QUANTITIES[q].decimals[system.value];
  return { system, label, show, enter, fmt, withUnit, decimals };
});
