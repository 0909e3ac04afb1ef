import { ref } from 'vue';
import { ApiError } from '../boot/api';
import { pathWords } from '../utils/fieldNames';

/** A 409 for a stale version (optimistic lock), as opposed to another conflict such as a name already taken. */
export function isStale(e: unknown): boolean {
  return e instanceof ApiError && e.status === 409 && (e.body.details ?? []).some((d) => d.path === 'version');
}

/**
 * Errors from a form's API call: `{ path, message }` details whose path names a field shown on the form go
 * beside that field; the rest (and the error's own message) go in a banner above it.
 */
export function useApiErrors(fields: readonly string[]) {
  const fieldErrors = ref<Record<string, string>>({});
  const banner = ref<string | null>(null);
  const conflict = ref(false);

  function clear(): void {
    fieldErrors.value = {};
    banner.value = null;
    conflict.value = false;
  }

  /** Record an error thrown by the API client; anything else is rethrown. */
  function take(e: unknown): void {
    if (!(e instanceof ApiError)) throw e;
    clear();
    conflict.value = isStale(e);
    const rest: string[] = [];
    for (const d of e.body.details ?? []) {
      if (fields.includes(d.path))
        fieldErrors.value[d.path] = `${fieldErrors.value[d.path] ? `${fieldErrors.value[d.path]}; ` : ''}${d.message}`;
      else rest.push(`${pathWords(d.path)}: ${d.message}`);
    }
    banner.value = conflict.value
      ? 'Someone else changed this since you opened it. The latest version has been loaded; check it and make your change again.'
      : rest.length
        ? `${e.body.error} — ${rest.join('; ')}`
        : Object.keys(fieldErrors.value).length
          ? null // every detail is shown beside its field
          : e.body.error;
  }

  /** Props for a Quasar field: red outline and the message under it, cleared as soon as the user edits the field. */
  const on = (key: string) => ({
    error: !!fieldErrors.value[key],
    errorMessage: fieldErrors.value[key],
    'onUpdate:modelValue': () => {
      if (fieldErrors.value[key]) delete fieldErrors.value[key];
    },
  });

  return { fieldErrors, banner, conflict, clear, take, on };
}
