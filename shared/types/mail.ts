/** Mail routes' payloads, defined once by their contract (shared/contract/mail.ts) and re-exported here. */
export type { CapturedMail, OutboxItem, OutboxList } from '../contract/mail.js';
