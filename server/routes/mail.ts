import { config } from '../config.js';
import { NotFoundError } from '../errors.js';
import { implement } from '../http/route.js';
import { listCapturedMail, listOutbox } from '../mail/mailbox.js';
import { deliverPending, retryNotice } from '../mail/sender.js';
import { mailContract as c } from '../../shared/contract/mail.js';

export const mailRoutes = [
  implement(c.outbox)({ handler: async ({ ds }) => listOutbox(ds) }),
  implement(c.retry)({
    handler: async ({ ds, params }) => {
      if (!(await retryNotice(ds, params.id))) throw new NotFoundError('Undelivered notice');
      return deliverPending(ds, { ids: [params.id] });
    },
  }),
  implement(c.mailbox)({
    handler: async () => {
      if (!config.devMailbox) throw new NotFoundError('Development mailbox');
      return { items: await listCapturedMail() };
    },
  }),
];
