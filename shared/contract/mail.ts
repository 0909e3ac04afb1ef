/** Contracts of the administrators' mail routes: the outbox of notices and the development mailbox. */
import { Type, type Static } from '@sinclair/typebox';
import { route } from './route.js';
import { ItemsOf, Nullable, Obj, StringEnum, Timestamp } from './schema.js';

export const OutboxItemSchema = Obj({
  id: Type.String(),
  kind: Type.String(),
  to: Type.Array(Type.String()),
  subject: Type.String(),
  status: StringEnum(['pending', 'sent', 'failed'] as const),
  attempts: Type.Integer({ minimum: 0 }),
  lastError: Nullable(Type.String()),
  nextAttemptAt: Timestamp(),
  createdAt: Timestamp(),
  sentAt: Nullable(Timestamp()),
});
/** Outbox row as shown to admins. */
export type OutboxItem = Static<typeof OutboxItemSchema>;

const count = () => Type.Integer({ minimum: 0 });
export const OutboxListSchema = Obj({
  items: Type.Array(OutboxItemSchema),
  counts: Obj({ pending: count(), sent: count(), failed: count() }),
});
export type OutboxList = Static<typeof OutboxListSchema>;

/** A message captured by the local SMTP fake (scripts/fake-smtp.mjs), development only. */
export const CapturedMailSchema = Obj({
  id: Type.String(),
  receivedAt: Type.String(),
  from: Type.String(),
  to: Type.Array(Type.String()),
  subject: Type.String(),
  text: Type.String(),
});
export type CapturedMail = Static<typeof CapturedMailSchema>;

export const DeliveryCountSchema = Obj({ sent: count(), failed: count() });

export const mailContract = {
  outbox: route({
    method: 'get',
    path: '/mail/outbox',
    access: 'users.manage',
    summary: 'Outgoing e-mail notices with delivery state, attempts and the last error',
    response: OutboxListSchema,
  }),
  retry: route({
    method: 'post',
    path: '/mail/outbox/:id/retry',
    access: 'users.manage',
    summary: 'Queue a failed notice again and try to deliver it now',
    params: Obj({ id: Type.String({ pattern: '^[0-9]{1,18}$' }) }),
    response: DeliveryCountSchema,
  }),
  mailbox: route({
    method: 'get',
    path: '/mail/mailbox',
    access: 'users.manage',
    summary: 'Development only: messages captured by the local SMTP fake',
    response: ItemsOf(CapturedMailSchema),
  }),
};
