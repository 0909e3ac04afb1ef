import { defineStore } from 'pinia';
import { computed } from 'vue';
import { useAuthStore } from './auth-store';
import {
  PRESSURE_DROP_UNIT_LABELS,
  QUANTITIES,
  checkDisplay,
  defaultPressureDropUnit,
  formatPressureDrop,
  formatQuantity,
  fromDisplay,
  pressureDropIn,
  pressureDropShownUnit,
  toDisplay,
  unitLabel,
  type PressureDropUnit,
  type QuantityId,
} from '../../shared/units';
import type { CheckResult } from '../../shared/types/rating';

/** The signed-in user's unit system applied to values held in SI: labels, display values, entry; and the tray ΔP unit. */
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

  /** the user's tray ΔP unit (their choice, else their unit system's head of liquid) */
  const dpUnit = computed<PressureDropUnit>(() => auth.user?.pressureDropUnit ?? defaultPressureDropUnit(system.value));
  /** the ΔP unit label as shown for a tray of that liquid density (a head needs one; else mbar) */
  const dpLabel = (rhoL?: number): string => PRESSURE_DROP_UNIT_LABELS[pressureDropShownUnit(dpUnit.value, rhoL)];
  const dpFmt = (pa: number | null | undefined, rhoL?: number): string => formatPressureDrop(pa, dpUnit.value, rhoL);
  const dpShow = (pa: number, rhoL?: number): number => pressureDropIn(pa, dpUnit.value, rhoL);

  /** A check's value and limit as read: tray ΔP in the ΔP unit (with the tray's liquid density), others by quantity. */
  const checkText = (c: CheckResult, rhoL?: number) => checkDisplay(c, system.value, dpUnit.value, rhoL);
  return { system, label, show, enter, fmt, withUnit, decimals, dpUnit, dpLabel, dpFmt, dpShow, checkText };
});
