import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import { columnContract } from '../../shared/contract/columns';
import { loadCaseContract } from '../../shared/contract/loads';
import { pumpAroundContract, sectionContract } from '../../shared/contract/sections';
import type {
  ColumnDetail,
  CreateColumnBody,
  PumpAroundBody,
  SectionBody,
  UpdateColumnBody,
  UpdatePumpAroundBody,
  UpdateSectionBody,
} from '../../shared/types/columns';
import type { CreateLoadCaseBody, PutLoadsBody } from '../../shared/types/loads';
import type { ImportCommitBody } from '../../shared/types/imports';
import { importContract } from '../../shared/contract/imports';

const QUIET = { quiet: true } as const;

/** The open column and the calls that edit what hangs off it (sections, load cases, imports). */
export const useColumnStore = defineStore('column', () => {
  const column = ref<ColumnDetail | null>(null);
  const loading = ref(false);

  async function load(id: string, opts?: RequestOptions): Promise<ColumnDetail> {
    loading.value = true;
    try {
      column.value = await api.call(columnContract.get, { params: { id } }, opts);
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
    api.call(asAdmin ? columnContract.adminCreate : columnContract.create, { body }, QUIET);
  async function updateColumn(id: string, body: UpdateColumnBody): Promise<ColumnDetail> {
    column.value = await api.call(columnContract.update, { params: { id }, body }, QUIET);
    return column.value;
  }

  const createPumpAround = (columnId: string, body: PumpAroundBody) =>
    api.call(pumpAroundContract.create, { params: { id: columnId }, body }, QUIET);
  const updatePumpAround = (id: string, body: UpdatePumpAroundBody) =>
    api.call(pumpAroundContract.update, { params: { id }, body }, QUIET);
  const deletePumpAround = (id: string, version: number) =>
    api.call(pumpAroundContract.delete, { params: { id }, query: { version } }, QUIET);

  const createSection = (columnId: string, body: SectionBody) =>
    api.call(sectionContract.create, { params: { id: columnId }, body }, QUIET);
  const updateSection = (id: string, body: UpdateSectionBody) =>
    api.call(sectionContract.update, { params: { id }, body }, QUIET);

  const loadCase = (id: string, opts?: RequestOptions) => api.call(loadCaseContract.get, { params: { id } }, opts);
  const createLoadCase = (columnId: string, body: CreateLoadCaseBody) =>
    api.call(loadCaseContract.create, { params: { id: columnId }, body }, QUIET);
  const putLoads = (id: string, body: PutLoadsBody) => api.call(loadCaseContract.putLoads, { params: { id }, body }, QUIET);

  const previewImport = (columnId: string, file: File, sheet?: string) =>
    api.call(importContract.preview, { params: { id: columnId }, query: { sheet }, form: { file } }, { quiet: true });
  const commitImport = (columnId: string, body: ImportCommitBody) =>
    api.call(importContract.commit, { params: { id: columnId }, body }, { quiet: true });

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
