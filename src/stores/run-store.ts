import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import type { CreateRunBody, RunRecord, RunWindow } from '../../shared/types/runs';
import type { MethodsPayload } from '../../shared/types/methods';
import { runContract } from '../../shared/contract/runs';
import { methodsContract } from '../../shared/contract/methods';

/** The open rating run, its review actions, operating windows, comparisons and the method sources. */
export const useRunStore = defineStore('run', () => {
  const run = ref<RunRecord | null>(null);
  const methods = ref<MethodsPayload | null>(null);
  const windows = new Map<string, RunWindow>();

  async function load(id: string, opts?: RequestOptions): Promise<RunRecord> {
    run.value = await api.call(runContract.get, { params: { id } }, opts);
    return run.value;
  }
  const create = (body: CreateRunBody) => api.call(runContract.create, { body });

  /** submit for review, with an optional note for the reviewer */
  async function submit(comment?: string): Promise<RunRecord> {
    if (!run.value) throw new Error('no run loaded');
    const body = { version: run.value.version, ...(comment ? { comment } : {}) };
    run.value = await api.call(runContract.submit, { params: { id: run.value.id }, body });
    return run.value;
  }
  /** approve or return a submitted run: both need the reviewer's comment */
  async function decide(action: 'approve' | 'return', comment: string): Promise<RunRecord> {
    if (!run.value) throw new Error('no run loaded');
    const body = { version: run.value.version, comment };
    run.value = await api.call(runContract[action], { params: { id: run.value.id }, body });
    return run.value;
  }

  async function window(runId: string, tray: number): Promise<RunWindow> {
    const key = `${runId}:${tray}`;
    const hit = windows.get(key);
    if (hit) return hit;
    const w = await api.call(runContract.window, { params: { id: runId, tray } });
    windows.set(key, w);
    return w;
  }
  const compare = (a: string, b: string) => api.call(runContract.compare, { query: { a, b } });

  async function loadMethods(): Promise<MethodsPayload> {
    methods.value ??= await api.call(methodsContract.list);
    return methods.value;
  }
  return { run, methods, load, create, submit, decide, window, compare, loadMethods };
});
