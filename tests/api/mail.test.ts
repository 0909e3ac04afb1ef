import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { queueNotice, reviewerEmails, userEmail } from '../../server/mail/outbox.js';
import { deliverPending } from '../../server/mail/sender.js';
import { makeUser, setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makePlant } from './columnsFixture.js';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupApp();
});
afterAll(() => ctx.close());

/** Messages the SMTP fake (started by npm test on SMTP_PORT) wrote to config.mailboxDir. */
async function waitForMail(subject: string, timeoutMs = 8000): Promise<{ to: string[]; subject: string; text: string }> {
  const t0 = Date.now();
  for (;;) {
    if (existsSync(config.mailboxDir))
      for (const f of readdirSync(config.mailboxDir).filter((n) => n.endsWith('.json'))) {
        const m = JSON.parse(readFileSync(path.join(config.mailboxDir, f), 'utf8')) as {
          to: string[];
          subject: string;
          text: string;
        };
        if (m.subject === subject) return m;
      }
    if (Date.now() - t0 > timeoutMs) throw new Error(`no mail with subject "${subject}" in ${config.mailboxDir}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('mail outbox', () => {
  it('a queued notice is delivered over SMTP and captured by the fake', async () => {
    const subject = `Test notice ${Date.now()}`;
    await ctx.ds.transaction((em) => queueNotice(em, { kind: 'test', to: ['someone@test.example'], subject, text: 'Hello' }));
    await deliverPending(ctx.ds);
    const m = await waitForMail(subject);
    expect(m.to).toEqual(['someone@test.example']);
    expect(m.text).toContain('Hello');
    const rows = await ctx.ds.query<
      {
        status: string;
        attempts: number;
      }[]
    >(`SELECT status, attempts FROM mail_outbox WHERE subject = $1`, [subject]);
    expect(rows[0]).toEqual({ status: 'sent', attempts: 1 });
  });

  it('a notice rolled back with its transaction is never sent', async () => {
    const subject = `Rolled back ${Date.now()}`;
    await expect(
      ctx.ds.transaction(async (em) => {
        await queueNotice(em, { kind: 'test', to: ['x@test.example'], subject, text: '' });
        throw new Error('action failed');
      }),
    ).rejects.toThrow('action failed');
    expect(await ctx.ds.query(`SELECT 1 FROM mail_outbox WHERE subject = $1`, [subject])).toHaveLength(0);
  });

  it('an SMTP failure is recorded with attempts and the error, kept for retry and shown to admins', async () => {
    const subject = `Undeliverable ${Date.now()}`;
    await ctx.ds.transaction(async (em) => {
      await queueNotice(em, { kind: 'test', to: ['y@test.example'], subject, text: '' });
      // keep the running server's background sender away from this row
      await em.query(`UPDATE mail_outbox SET next_attempt_at = now() + interval '1 hour' WHERE subject = $1`, [subject]);
    });
    const [queued] = await ctx.ds.query<{ id: string }[]>(`SELECT id FROM mail_outbox WHERE subject = $1`, [subject]);
    // a port where nothing listens: the connection is refused
    const dead = nodemailer.createTransport({
      host: '127.0.0.1',
      port: 9,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 2000,
    });
    const r = await deliverPending(ctx.ds, { via: dead, ids: [String(queued?.id)] });
    expect(r.failed).toBe(1);
    const rows = await ctx.ds.query<
      {
        id: string;
        status: string;
        attempts: number;
        last_error: string;
      }[]
    >(`SELECT id, status, attempts, last_error FROM mail_outbox WHERE subject = $1`, [subject]);
    expect(rows[0]?.status).toBe('pending');
    expect(rows[0]?.attempts).toBe(1);
    expect(rows[0]?.last_error).toMatch(/ECONNREFUSED|connect/i);

    const { agent } = await signedIn(ctx, 'admin');
    const list = await agent.get('/api/mail/outbox');
    expect(list.status).toBe(200);
    const item = (list.body.items as { subject: string; lastError: string | null; attempts: number }[]).find(
      (i) => i.subject === subject,
    );
    expect(item?.attempts).toBe(1);
    expect(item?.lastError).toBeTruthy();

    const retry = await agent.post(`/api/mail/outbox/${rows[0]?.id}/retry`);
    expect(retry.status).toBe(200);
    await waitForMail(subject);
  });

  it("reviewerEmails lists active users whose role may approve and who see the column's site; userEmail skips inactive users", async () => {
    const plant = await makePlant(ctx.ds);
    const elsewhere = await makePlant(ctx.ds);
    const reviewer = await makeUser(ctx.ds, 'internals-specialist', [plant.siteId]);
    const otherSite = await makeUser(ctx.ds, 'internals-specialist', [elsewhere.siteId]);
    const inspector = await makeUser(ctx.ds, 'inspector', [plant.siteId]);
    const gone = await makeUser(ctx.ds, 'internals-specialist', [plant.siteId]);
    await ctx.ds.query(`UPDATE users SET active = false WHERE id = $1`, [gone.id]);
    const list = await reviewerEmails(ctx.ds.manager, plant.columnId);
    expect(list).toContain(reviewer.email);
    expect(list).not.toContain(otherSite.email);
    expect(list).not.toContain(inspector.email);
    expect(list).not.toContain(gone.email);
    expect(await userEmail(ctx.ds.manager, inspector.id)).toBe(inspector.email);
    expect(await userEmail(ctx.ds.manager, gone.id)).toBeNull();
    expect(await userEmail(ctx.ds.manager, otherSite.id, plant.columnId)).toBeNull();
    expect(await userEmail(ctx.ds.manager, reviewer.id, plant.columnId)).toBe(reviewer.email);
  });

  it('the outbox and the development mailbox are for admins only', async () => {
    const { agent } = await signedIn(ctx, 'inspector');
    expect((await agent.get('/api/mail/outbox')).status).toBe(403);
    expect((await agent.get('/api/mail/mailbox')).status).toBe(403);
  });
});
