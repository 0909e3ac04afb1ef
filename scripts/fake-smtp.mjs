// Local SMTP fake: accepts every message on 127.0.0.1 and stores it, parsed, as JSON in MAILBOX_DIR.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const dir = process.env.MAILBOX_DIR ?? '.data/mailbox';
const port = Number(process.env.SMTP_PORT ?? 5125);
mkdirSync(dir, { recursive: true });

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const id = `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
        const record = {
          id,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
        };
        writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(record, null, 2));
        callback();
      })
      .catch(callback);
  },
});
server.listen(port, '127.0.0.1');
const stop = () => server.close(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
