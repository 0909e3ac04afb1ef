import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import type {
  ColumnDetail,
  CreateColumnBody,
  PumpAroundBody,
  PumpAroundRecord,
  SectionBody,
  TraySectionRecord,
  UpdateColumnBody,
  UpdatePumpAroundBody,
  UpdateSectionBody,
} from '../../shared/types/columns';
import type { CreateLoadCaseBody, LoadCaseRecord, PutLoadsBody } from '../../shared/types/loads';
import type { ImportCommitBody, ImportPreview } from '../../shared/types/imports';

/** The open column and the calls that edit what hangs off it (sections, load cases, imports). */
export const useColumnStore = defineStore('column', () => {
  const column = ref<ColumnDetail | null>(null);
  const loading = ref(false);

  async function load(id: string, opts?: RequestOptions): Promise<ColumnDetail> {
    loading.value = true;
    try {
      column.value = await api.get<ColumnDetail>(`/columns/${id}`, opts);
      return column.value;
    } finally {
      loading.value = false;
    }
  }
  async function ensure(id: string): Promise<ColumnDetail> {
    return column.value?.id === id ? column.value : load(id);
  }

  /** Administrators create columns through the plant set-up route; specialists through /columns (same body). */
  const createColumn = (body: CreateColumnBody, asAdmin: boolean) =>
    api.post<ColumnDetail>(asAdmin ? '/admin/columns' : '/columns', body, { quiet: true });
  async function updateColumn(id: string, body: UpdateColumnBody): Promise<ColumnDetail> {
    column.value = await api.put<ColumnDetail>(`/columns/${id}`, body, { quiet: true });
    return column.value;
  }

  const createPumpAround = (columnId: string, body: PumpAroundBody) =>
    api.post<PumpAroundRecord>(`/columns/${columnId}/pump-arounds`, body, { quiet: true });
  const updatePumpAround = (id: string, body: UpdatePumpAroundBody) =>
    api.put<PumpAroundRecord>(`/pump-arounds/${id}`, body, { quiet: true });
  const deletePumpAround = (id: string, version: number) =>
    api.del<void>(`/pump-arounds/${id}`, { query: { version }, quiet: true });

  const createSection = (columnId: string, body: SectionBody) =>
    api.post<TraySectionRecord>(`/columns/${columnId}/sections`, body, { quiet: true });
  const updateSection = (id: string, body: UpdateSectionBody) =>
    api.put<TraySectionRecord>(`/sections/${id}`, body, { quiet: true });

  const loadCase = (id: string, opts?: RequestOptions) => api.get<LoadCaseRecord>(`/load-cases/${id}`, opts);
  const createLoadCase = (columnId: string, body: CreateLoadCaseBody) =>
    api.post<LoadCaseRecord>(`/columns/${columnId}/load-cases`, body, { quiet: true });
  const putLoads = (id: string, body: PutLoadsBody) => api.put<LoadCaseRecord>(`/load-cases/${id}/loads`, body, { quiet: true });

  function previewImport(columnId: string, file: File, sheet?: string): Promise<ImportPreview> {
    const form = new FormData();
    form.append('file', file);
    return api.post<ImportPreview>(`/columns/${columnId}/imports`, form, { quiet: true, query: { sheet } });
  }
  const commitImport = (columnId: string, body: ImportCommitBody) =>
    api.post<LoadCaseRecord>(`/columns/${columnId}/imports/commit`, body, { quiet: true });

  return {
    column,
    loading,
    load,
    ensure,
    createColumn,
    updateColumn,
    createPumpAround,
    updatePumpAround,
    deletePumpAround,
    createSection,
    updateSection,
    loadCase,
    createLoadCase,
    putLoads,
    previewImport,
    commitImport,
  };
});
