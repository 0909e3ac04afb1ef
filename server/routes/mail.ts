import { config } from '../config.js';
import { NotFoundError } from '../errors.js';
import { defineRoutes } from '../http/route.js';
import { listCapturedMail, listOutbox } from '../mail/mailbox.js';
import { deliverPending, retryNotice } from '../mail/sender.js';

const idParams = {
  type: 'object',
  properties: { id: { type: 'string', pattern: '^[0-9]{1,18}$' } },
  required: ['id'],
  additionalProperties: false,
} as const;

export const mailRoutes = defineRoutes([
  {
    method: 'get',
    path: '/mail/outbox',
    access: 'users.manage',
    summary: 'Outgoing e-mail notices with delivery state, attempts and the last error',
    handler: async ({ ds }) => listOutbox(ds),
  },
  {
    method: 'post',
    path: '/mail/outbox/:id/retry',
    access: 'users.manage',
    summary: 'Queue a failed notice again and try to deliver it now',
    params: idParams,
    handler: async ({ ds, params }) => {
      const { id } = params as { id: string };
      if (!(await retryNotice(ds, id))) throw new NotFoundError('Undelivered notice');
      return deliverPending(ds, { ids: [id] });
    },
  },
  {
    method: 'get',
    path: '/mail/mailbox',
    access: 'users.manage',
    summary: 'Development only: messages captured by the local SMTP fake',
    handler: async () => {
      if (!config.devMailbox) throw new NotFoundError('Development mailbox');
      return { items: await listCapturedMail() };
    },
  },
]);
