import { ref } from 'vue';
import { Notify } from 'quasar';
import { ApiError, describeApiError } from '../boot/api';

/** Why a record page has nothing to show: the API's refusal, or a record missing from what was loaded. */
export type MissingRecord = { status: number; message: string };

/**
 * A record page's main load, made with `QUIET` (the page, not a notification, tells the user). A record that
 * does not exist (404), an address that cannot name one (400) or one the user may not open (403) is kept in
 * `missing`, so the page says so instead of loading for ever; any other API failure is notified here and
 * thrown on.
 */
/** Request options for a load made through `loading`. */
export const QUIET = { quiet: true } as const;

export function useMissingRecord() {
  const missing = ref<MissingRecord | null>(null);

  async function loading<T>(p: Promise<T>): Promise<T | undefined> {
    missing.value = null;
    try {
      return await p;
    } catch (e) {
      if (e instanceof ApiError && [400, 403, 404].includes(e.status)) {
        missing.value = { status: e.status, message: e.body.error };
        return undefined;
      }
      if (e instanceof ApiError && e.status !== 401) Notify.create({ type: 'negative', message: describeApiError(e.body), multiLine: true });
      throw e;
    }
  }

  return { missing, loading };
}
