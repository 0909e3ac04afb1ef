import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import type {
  AsFoundBody,
  AsFoundResult,
  CreateInspectionBody,
  CreatePunchBody,
  InspectionRecord,
  InspectionSummary,
  PhotoRecord,
  SaveTrayBody,
  UpdateInspectionBody,
  UpdatePunchBody,
  VoidPunchBody,
} from '../../shared/types/inspections';

/** The open inspection and its actions; every write returns the whole record, which replaces the local copy. */
export const useInspectionStore = defineStore('inspection', () => {
  const rec = ref<InspectionRecord | null>(null);
  const url = (suffix = '') => `/inspections/${rec.value!.id}${suffix}`;

  const list = async (columnId?: string) =>
    (await api.get<{ items: InspectionSummary[] }>('/inspections', { query: { columnId } })).items;
  const create = (body: CreateInspectionBody) => api.post<InspectionRecord>('/inspections', body);
  async function load(id: string, opts?: RequestOptions): Promise<void> {
    if (rec.value?.id !== id) rec.value = null; // never show another inspection under this address
    rec.value = await api.get<InspectionRecord>(`/inspections/${id}`, opts);
  }
  async function update(body: UpdateInspectionBody): Promise<void> {
    rec.value = await api.patch<InspectionRecord>(url(), body);
  }
  async function saveTray(tray: number, pass: number, body: SaveTrayBody): Promise<void> {
    rec.value = await api.put<InspectionRecord>(url(`/trays/${tray}/${pass}`), body);
  }
  async function addPunch(body: CreatePunchBody): Promise<void> {
    rec.value = await api.post<InspectionRecord>(url('/punch'), body);
  }
  async function updatePunch(itemId: string, body: UpdatePunchBody): Promise<void> {
    rec.value = await api.patch<InspectionRecord>(url(`/punch/${itemId}`), body);
  }
  async function voidPunch(itemId: string, body: VoidPunchBody): Promise<void> {
    rec.value = await api.post<InspectionRecord>(url(`/punch/${itemId}/void`), body);
  }
  async function uploadPhoto(file: File, fields: Record<string, string>): Promise<PhotoRecord> {
    const fd = new FormData();
    for (const [k, v] of Object.entries(fields)) fd.append(k, v);
    fd.append('photo', file);
    const p = await api.post<PhotoRecord>(url('/photos'), fd);
    rec.value!.photos.push(p);
    return p;
  }
  async function sign(who: 'inspector' | 'engineer', opts?: RequestOptions): Promise<void> {
    rec.value = await api.post<InspectionRecord>(url(`/sign/${who}`), { version: rec.value!.version }, opts);
  }
  const asFound = (body: AsFoundBody) => api.post<AsFoundResult>(url('/as-found'), body);
  const photoUrl = (photoId: string, size: 'thumb' | 'original' = 'thumb') => `/api${url(`/photos/${photoId}`)}?size=${size}`;

  return { rec, list, create, load, update, saveTray, addPunch, updatePunch, voidPunch, uploadPhoto, sign, asFound, photoUrl };
});
