import { defineStore } from 'pinia';
import { shallowRef } from 'vue';
import { api, type RequestOptions } from '../boot/api';
import { inspectionContract as c } from '../../shared/contract/inspections';
import { pathOf, type FormOf } from '../../shared/contract/route';
import type {
  AsFoundBody,
  CreateInspectionBody,
  CreatePunchBody,
  InspectionRecord,
  PhotoRecord,
  SaveTrayBody,
  UpdateInspectionBody,
  UpdatePunchBody,
  VoidPunchBody,
} from '../../shared/types/inspections';

/** The photo form without its file: tray, pass, finding, caption as text. */
export type PhotoFields = Omit<FormOf<(typeof c.uploadPhoto)['form']>, 'photo'>;

/**
 * The open inspection and its actions; every write returns the whole record, which replaces the local copy
 * (a shallow ref: the record is only ever replaced, never changed in place).
 */
export const useInspectionStore = defineStore('inspection', () => {
  const rec = shallowRef<InspectionRecord | null>(null);
  const id = () => ({ id: rec.value!.id });

  /** the newest inspections (the server's cut) and how many there are in all */
  const list = (columnId?: string) => api.call(c.list, { query: { columnId } });
  const create = (body: CreateInspectionBody) => api.call(c.create, { body });
  async function load(inspectionId: string, opts?: RequestOptions): Promise<void> {
    if (rec.value?.id !== inspectionId) rec.value = null; // never show another inspection under this address
    rec.value = await api.call(c.get, { params: { id: inspectionId } }, opts);
  }
  async function update(body: UpdateInspectionBody): Promise<void> {
    rec.value = await api.call(c.update, { params: id(), body });
  }
  async function saveTray(tray: number, pass: number, body: SaveTrayBody): Promise<void> {
    rec.value = await api.call(c.saveTray, { params: { ...id(), tray, pass }, body });
  }
  async function addPunch(body: CreatePunchBody): Promise<void> {
    rec.value = await api.call(c.addPunch, { params: id(), body });
  }
  async function updatePunch(itemId: string, body: UpdatePunchBody): Promise<void> {
    rec.value = await api.call(c.updatePunch, { params: { ...id(), itemId }, body });
  }
  async function voidPunch(itemId: string, body: VoidPunchBody): Promise<void> {
    rec.value = await api.call(c.voidPunch, { params: { ...id(), itemId }, body });
  }
  async function uploadPhoto(photo: File, fields: PhotoFields): Promise<PhotoRecord> {
    const p = await api.call(c.uploadPhoto, { params: id(), form: { ...fields, photo } });
    if (rec.value) rec.value = { ...rec.value, photos: [...rec.value.photos, p] };
    return p;
  }
  async function sign(who: 'inspector' | 'engineer', opts?: RequestOptions): Promise<void> {
    const route = who === 'inspector' ? c.signInspector : c.signEngineer;
    rec.value = await api.call(route, { params: id(), body: { version: rec.value!.version } }, opts);
  }
  const asFound = (body: AsFoundBody) => api.call(c.asFound, { params: id(), body });
  const photoUrl = (photoId: string, size: 'thumb' | 'original' = 'thumb') =>
    `/api${pathOf(c.photo, { ...id(), photoId })}?size=${size}`;

  return { rec, list, create, load, update, saveTray, addPunch, updatePunch, voidPunch, uploadPhoto, sign, asFound, photoUrl };
});
