import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import type { CreateRunBody, ReviewActionBody, RunComparison, RunRecord, RunWindow } from '../../shared/types/runs';
import type { MethodsPayload } from '../../shared/types/methods';
import { runContract } from '../../shared/contract/runs';
import { methodsContract } from '../../shared/contract/methods';

/** The open rating run, its review actions, operating windows, comparisons and the method sources. */
export const useRunStore = defineStore('run', () => {
  const run = ref<RunRecord | null>(null);
  const methods = ref<MethodsPayload | null>(null);
  const windows = new Map<string, RunWindow>();

  async function load(id: string, opts?: RequestOptions): Promise<RunRecord> {
    run.value = await api.get<RunRecord>(`/runs/${id}`, opts);
    return run.value;
  }
  const create = (body: CreateRunBody) => api.call(runContract.create, { body });

  async function review(action: 'submit' | 'approve' | 'return', comment?: string): Promise<RunRecord> {
    if (!run.value) throw new Error('no run loaded');
    const body: ReviewActionBody = { version: run.value.version, ...(comment ? { comment } : {}) };
    run.value = await api.post<RunRecord>(`/runs/${run.value.id}/${action}`, body);
    return run.value;
  }

  async function window(runId: string, tray: number): Promise<RunWindow> {
    const key = `${runId}:${tray}`;
    const hit = windows.get(key);
    if (hit) return hit;
    const w = await api.get<RunWindow>(`/runs/${runId}/window/${tray}`);
    windows.set(key, w);
    return w;
  }
  const compare = (a: string, b: string) => api.get<RunComparison>('/runs/compare', { query: { a, b } });

  async function loadMethods(): Promise<MethodsPayload> {
    methods.value ??= await api.call(methodsContract.list);
    return methods.value;
  }
  return { run, methods, load, create, review, window, compare, loadMethods };
});
