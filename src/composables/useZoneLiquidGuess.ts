import { computed, ref, watch, type Ref } from 'vue';
import { useColumnStore } from '../stores/column-store';
import { useUnitsStore } from '../stores/units-store';
import type { StudyForm } from './useStudyForm';
import type { ColumnDetail } from '../../shared/types/columns';
import type { TrayLoad } from '../../shared/types/rating';
import { baseCirculation, guessZoneLiquid } from '../../shared/zoneLiquidGuess';

/** What the chosen load case suggests about its zone liquid, kept up to date with the study form. */
export function useZoneLiquidGuess(column: Ref<ColumnDetail | null>, f: StudyForm) {
  const store = useColumnStore();
  const units = useUnitsStore();
  const loads = ref<TrayLoad[]>([]);
  watch(
    () => f.loadCaseId,
    async (id) => {
      loads.value = [];
      if (id) loads.value = (await store.loadCase(id)).loads;
    },
    { immediate: true },
  );
  const pa = computed(() => column.value?.pumpArounds.find((p) => p.id === f.pumpAroundId) ?? null);
  const zone = computed<[number, number] | null>(() => (pa.value ? [pa.value.returnTray, pa.value.drawTray] : null));
  const guess = computed(() => {
    if (!pa.value || !column.value || !loads.value.length) return null;
    const si = (v: number | null, q: 'duty' | 'massFlow') => (v === null ? null : units.enter(q, v));
    const m0 = baseCirculation({
      baseDuty_kW: si(f.baseDuty, 'duty'),
      cp_kJ_kgK: f.cp,
      returnDrop_K: f.mode === 'dT' ? f.dT : null,
      circulation_kg_h: f.mode === 'circulation' ? si(f.circulation, 'massFlow') : null,
    });
    return guessZoneLiquid(loads.value, pa.value, column.value.numbering, m0);
  });
  return { guess, zone };
}
