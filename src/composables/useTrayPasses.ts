import { computed, watch, type Ref } from 'vue';
import { passNumbers, trayPassCount } from '../../shared/passes';
import type { InspectionRecord } from '../../shared/types/inspections';

/**
 * The pass numbers a tray has, from the tray section that holds it (shared/passes.ts); with no tray, those any
 * tray of the column has. A chosen pass the tray does not have is cleared (to 1 where a pass is required).
 */
export function useTrayPasses(
  rec: Readonly<Ref<InspectionRecord>>,
  tray: Readonly<Ref<number | null | undefined | string>>,
  pass: Ref<number | null | undefined>,
  required = false,
) {
  const options = computed(() => {
    const t = typeof tray.value === 'number' && Number.isInteger(tray.value) && tray.value > 0 ? tray.value : null;
    const sections = rec.value.designSections;
    return passNumbers(t === null ? Math.max(1, ...sections.map((s) => s.passes)) : trayPassCount(sections, t));
  });
  watch(
    options,
    (o) => {
      if (pass.value !== null && pass.value !== undefined && !o.includes(pass.value)) pass.value = required ? 1 : null;
    },
    { immediate: true },
  );
  return options;
}
