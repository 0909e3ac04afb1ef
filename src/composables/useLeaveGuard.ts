import { Dialog } from 'quasar';
import { onBeforeUnmount, onMounted, type Ref } from 'vue';
import { onBeforeRouteLeave, onBeforeRouteUpdate } from 'vue-router';

/** Ask before leaving a page with unsaved edits: in-app navigation gets our dialog, closing the tab the browser's. */
export function useLeaveGuard(dirty: Ref<boolean>, what: string): void {
  const ask = (): Promise<boolean> =>
    new Promise((resolve) => {
      Dialog.create({
        title: 'Leave without saving?',
        message: `Your changes to ${what} are not saved. Leaving discards them.`,
        cancel: { label: 'Stay', flat: true, noCaps: true },
        ok: { label: 'Discard changes', color: 'negative', noCaps: true },
        persistent: true,
      })
        .onOk(() => resolve(true))
        .onCancel(() => resolve(false));
    });
  const guard = async () => (dirty.value ? ask() : true);
  onBeforeRouteLeave(guard);
  onBeforeRouteUpdate(guard);
  const onUnload = (e: BeforeUnloadEvent) => {
    if (!dirty.value) return;
    e.preventDefault();
    e.returnValue = ''; // older Chromium shows its prompt only when returnValue is set
  };
  onMounted(() => window.addEventListener('beforeunload', onUnload));
  onBeforeUnmount(() => window.removeEventListener('beforeunload', onUnload));
}
