import { ref } from 'vue';
import { ApiError, type RequestOptions } from '../boot/api';

/** Why a record page has nothing to show: the API's refusal, or a record missing from what was loaded. */
export type MissingRecord = { status: number; message: string };

/** The statuses that mean a page's record cannot be shown: malformed address, not allowed, not there. */
const MISSING_STATUSES = [400, 403, 404] as const;

/** Request options for a page's main load: the page, not a notification, says the record is missing. */
export const QUIET: RequestOptions = { quietFor: MISSING_STATUSES };

/**
 * A record page's main load, made with `QUIET`. A record that does not exist (404), an address that
 * cannot name one (400) or one the user may not open (403) is kept in `missing`, so the page says so
 * instead of loading for ever; any other failure is notified by the API client and thrown on.
 */
export function useMissingRecord() {
  const missing = ref<MissingRecord | null>(null);

  async function loading<T>(p: Promise<T>): Promise<T | undefined> {
    missing.value = null;
    try {
      return await p;
    } catch (e) {
      if (e instanceof ApiError && (MISSING_STATUSES as readonly number[]).includes(e.status)) {
        missing.value = { status: e.status, message: e.body.error };
        return undefined;
      }
      throw e;
    }
  }

  return { missing, loading };
}
