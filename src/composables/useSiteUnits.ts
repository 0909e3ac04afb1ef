import { computed, ref, watch } from 'vue';
import { api } from '../boot/api';
import { siteContract } from '../../shared/contract/columns';
import type { SiteSummary, UnitRecord } from '../../shared/types/columns';

/** Site and unit choices for a new column: visible sites, then the chosen site's units (a single choice is preselected). */
export function useSiteUnits() {
  const sites = ref<SiteSummary[]>([]);
  const units = ref<UnitRecord[]>([]);
  const siteId = ref<string | null>(null);
  const unitId = ref<string | null>(null);
  const siteOptions = computed(() => sites.value.map((s) => ({ label: s.name, value: s.id })));
  const unitOptions = computed(() => units.value.map((u) => ({ label: u.name, value: u.id })));

  async function loadSites(): Promise<void> {
    sites.value = (await api.call(siteContract.visible)).items;
    if (!siteId.value && sites.value.length === 1) siteId.value = sites.value[0]!.id;
  }
  watch(siteId, async (id) => {
    unitId.value = null;
    units.value = id ? (await api.call(siteContract.units, { params: { id } })).items : [];
    if (units.value.length === 1) unitId.value = units.value[0]!.id;
  });
  return { siteId, unitId, siteOptions, unitOptions, loadSites };
}
