import { Dialog, Notify } from 'quasar';
import { api, ApiError, describeApiError } from '../boot/api';
import { useColumnStore } from '../stores/column-store';
import { loadCaseContract } from '../../shared/contract/loads';
import { sectionContract } from '../../shared/contract/sections';
import type { TraySectionRecord } from '../../shared/types/columns';
import type { LoadCaseSummary } from '../../shared/types/loads';

/** What the caller does after the outcome: leave the page once deleted; load the latest record after a refusal. */
export interface DeleteHandlers {
  deleted?: () => void;
  reload: () => unknown;
}

interface Target {
  noun: string;
  /** the DELETE route (?version=N) */
  route: typeof sectionContract.delete | typeof loadCaseContract.delete;
  id: string;
  name: string;
  version: number;
  columnId: string;
  /** what disappears, in one sentence */
  effect: string;
  /** what stored runs keep a copy of */
  kept: string;
}

/**
 * Deleting a tray section or a load case, from its own page or from the column page: a confirmation naming
 * it, the DELETE with the version the caller loaded (optimistic lock), the column refreshed afterwards. A 409
 * shows the server's message and offers to load the latest version; other failures are notified the way the
 * pump-around card does (the calls are quiet so a 409 is not also shown as a plain error).
 */
export function useConfirmDelete() {
  const store = useColumnStore();

  async function remove(t: Target, on: DeleteHandlers): Promise<void> {
    try {
      await api.call(t.route, { params: { id: t.id }, query: { version: t.version } }, { quiet: true });
      Notify.create({ type: 'positive', message: `${t.noun[0]!.toUpperCase()}${t.noun.slice(1)} “${t.name}” deleted` });
    } catch (e) {
      if (!(e instanceof ApiError)) throw e;
      if (e.status === 401) return; // the API client has already sent the user to sign in
      if (e.status === 409) {
        Dialog.create({
          title: `“${t.name}” was not deleted`,
          message: e.body.error,
          cancel: { flat: true, noCaps: true, label: 'Close' },
          ok: { color: 'primary', unelevated: true, noCaps: true, label: 'Load the latest version' },
        }).onOk(() => void on.reload());
        return;
      }
      Notify.create({ type: 'negative', multiLine: true, message: describeApiError(e.body, Infinity) });
      if (e.status !== 404) return; // 404: someone else deleted it already, so carry on as if deleted
    }
    await store.load(t.columnId);
    on.deleted?.();
  }

  function confirm(t: Target, on: DeleteHandlers): void {
    Dialog.create({
      title: `Delete ${t.noun} “${t.name}”?`,
      message: `${t.effect} Rating runs already stored keep their own copy of the ${t.kept}, so their results and reports do not change. The deletion cannot be undone.`,
      cancel: { flat: true, noCaps: true, label: 'Keep it' },
      ok: { color: 'negative', unelevated: true, noCaps: true, label: `Delete ${t.noun}` },
    }).onOk(() => void remove(t, on));
  }

  type SectionRef = Pick<TraySectionRecord, 'id' | 'columnId' | 'name' | 'firstTray' | 'lastTray' | 'version'>;
  function deleteSection(s: SectionRef, columnTag: string, on: DeleteHandlers): void {
    confirm(
      {
        noun: 'tray section',
        route: sectionContract.delete,
        id: s.id,
        name: s.name,
        version: s.version,
        columnId: s.columnId,
        effect: `Trays ${s.firstTray}–${s.lastTray} of ${columnTag} lose this geometry; rating them again needs a section that covers them.`,
        kept: 'tray geometry',
      },
      on,
    );
  }

  type LoadCaseRef = Pick<LoadCaseSummary, 'id' | 'columnId' | 'name' | 'trayCount' | 'version'>;
  function deleteLoadCase(lc: LoadCaseRef, columnTag: string, on: DeleteHandlers): void {
    confirm(
      {
        noun: 'load case',
        route: loadCaseContract.delete,
        id: lc.id,
        name: lc.name,
        version: lc.version,
        columnId: lc.columnId,
        effect: `The case and its loads on ${lc.trayCount} tray(s) are removed from ${columnTag}.`,
        kept: 'tray loads',
      },
      on,
    );
  }

  return { deleteSection, deleteLoadCase };
}
