/**
 * Dates as engineers exchange them across sites: ISO order (2026-12-02, 2026-12-02 14:05, local time),
 * never the ambiguous month/day order. Quasar's date utilities do the formatting.
 */
import { date } from 'quasar';

type DateLike = string | number | Date;

export const fmtDate = (v: DateLike): string => date.formatDate(v, 'YYYY-MM-DD');
export const fmtDateTime = (v: DateLike): string => date.formatDate(v, 'YYYY-MM-DD HH:mm');
