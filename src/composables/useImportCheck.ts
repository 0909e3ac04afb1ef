import { computed, ref, watch, type Ref } from 'vue';
import { api, ApiError, describeApiError } from '../boot/api';
import { useColumnStore } from '../stores/column-store';
import { stageMapErrors } from '../../shared/stageMap';
import type { ImportMapping, ImportNumbering, ImportPreview, ImportRowError, ImportUnits } from '../../shared/types/imports';
import type { TrayLoad } from '../../shared/types/rating';
import { importContract } from '../../shared/contract/imports';

export interface ImportChoices {
  mapping: ImportMapping;
  units: ImportUnits;
  numbering: ImportNumbering;
}
const DEBOUNCE_MS = 400;
const keyOf = (c: ImportChoices): string => JSON.stringify([c.mapping, c.units, c.numbering]);

/**
 * Row errors of a previewed import, kept current: every change of mapping, units or numbering re-checks the rows
 * on the server (POST /columns/:id/imports/check, nothing stored) after a short pause; answers to superseded
 * requests are dropped. A stage-to-tray map with faults is not sent: the map editor names its faults.
 */
export function useImportCheck(
  columnId: string,
  preview: Ref<ImportPreview | null>,
  refs: { [K in keyof ImportChoices]: Ref<ImportChoices[K]> },
) {
  const store = useColumnStore();
  const choices = (): ImportChoices => ({
    mapping: refs.mapping.value,
    units: refs.units.value,
    numbering: refs.numbering.value,
  });
  const errors = ref<ImportRowError[]>([]);
  /** all row errors (the server lists the first ones) */
  const errorCount = ref(0);
  const trays = ref(0);
  /** the converted loads (SI, stored tray numbers) of the last check */
  const loads = ref<TrayLoad[]>([]);
  const checking = ref(false);
  const failure = ref<string | null>(null);
  const checkedKey = ref('');
  let timer: ReturnType<typeof setTimeout> | undefined;
  let seq = 0;

  const mapFaults = computed(() => {
    const n = choices().numbering;
    const count = store.column?.id === columnId ? store.column.trayCount : undefined;
    return n.key === 'stage' && n.stageMap && count ? stageMapErrors(n.stageMap, count, 'numbering.stageMap') : [];
  });

  /** Check now (also called before showing the result step); nothing is sent when the choices were checked already. */
  async function run(): Promise<void> {
    clearTimeout(timer);
    const p = preview.value;
    const c = choices();
    const key = keyOf(c);
    const n = ++seq; // answers to any earlier request are now dropped
    if (!p || key === checkedKey.value) {
      [checking.value, failure.value] = [false, null]; // errors already belong to these choices
      return;
    }
    if (mapFaults.value.length) {
      checking.value = false;
      failure.value = 'The stage-to-tray map has faults; the rows are checked again once it is right.';
      return;
    }
    checking.value = true;
    try {
      const r = await api.call(
        importContract.check,
        { params: { id: columnId }, body: { token: p.token, ...c } },
        { quiet: true },
      );
      if (n !== seq) return;
      [checkedKey.value, errors.value, errorCount.value, loads.value, trays.value, failure.value] = [
        key,
        r.errors,
        r.errorCount,
        r.loads,
        r.loads.length,
        null,
      ];
    } catch (e) {
      if (n !== seq) return;
      if (!(e instanceof ApiError)) throw e;
      failure.value = describeApiError(e.body, Infinity);
    } finally {
      if (n === seq) checking.value = false;
    }
  }

  /** A fresh preview: its errors are those of the detected choices. */
  function reset(p: ImportPreview): void {
    clearTimeout(timer);
    seq++;
    checkedKey.value = keyOf(p);
    loads.value = p.loads;
    [errors.value, errorCount.value, trays.value, failure.value, checking.value] = [
      p.errors,
      p.errorCount,
      p.loads.length,
      null,
      false,
    ];
  }

  /** Stop a pending check (the commit answers with the rows' errors itself). */
  function cancel(): void {
    clearTimeout(timer);
    seq++;
    checking.value = false;
  }

  watch(
    choices,
    () => {
      clearTimeout(timer);
      timer = setTimeout(() => void run(), DEBOUNCE_MS);
    },
    { deep: true },
  );

  /** Why "Store" is not offered now (null when it is): storing waits for a clean check of the current choices. */
  const blockReason = computed((): string | null => {
    if (mapFaults.value.length) return 'The stage-to-tray map has faults: fix them first.';
    if (checking.value || keyOf(choices()) !== checkedKey.value) return 'The rows are being checked with these choices…';
    if (failure.value) return `The rows could not be checked: ${failure.value}`;
    if (errorCount.value) return `Fix the ${errorCount.value} problem(s) listed first: nothing is stored while any row is wrong.`;
    if (!trays.value) return 'No tray was read from the file.';
    return null;
  });
  const blocked = computed(() => blockReason.value !== null);
  return { errors, errorCount, loads, trays, checking, failure, blocked, blockReason, run, reset, cancel };
}
