import { computed, ref, watch, type Ref } from 'vue';
import { api, ApiError, describeApiError } from '../boot/api';
import { useColumnStore } from '../stores/column-store';
import { stageMapErrors } from '../../shared/stageMap';
import type {
  ImportCheckResult,
  ImportMapping,
  ImportNumbering,
  ImportPreview,
  ImportRowError,
  ImportUnits,
} from '../../shared/types/imports';

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
  const checking = ref(false);
  const failure = ref<string | null>(null);
  let checkedKey = '';
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
    if (!p || key === checkedKey) {
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
      const r = await api.post<ImportCheckResult>(
        `/columns/${columnId}/imports/check`,
        { token: p.token, ...c },
        { quiet: true },
      );
      if (n !== seq) return;
      [checkedKey, errors.value, errorCount.value, trays.value, failure.value] = [
        key,
        r.errors,
        r.errorCount,
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
    checkedKey = keyOf(p);
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

  /** storing waits until the map is right */
  const blocked = computed(() => mapFaults.value.length > 0);
  return { errors, errorCount, trays, checking, failure, blocked, run, reset, cancel };
}
