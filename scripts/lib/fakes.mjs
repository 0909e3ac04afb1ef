// Local fakes for the hosted services: an S3-compatible store (s3rver) and an SMTP catcher.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { log, start, waitForPort } from './util.mjs';

export async function startFakes({ dataDir, s3Port, smtpPort, bucket, quiet = false }) {
  const s3Dir = path.join(dataDir, 's3');
  const mailDir = path.join(dataDir, 'mailbox');
  mkdirSync(s3Dir, { recursive: true });
  mkdirSync(mailDir, { recursive: true });
  const stdio = quiet ? 'ignore' : ['ignore', 'ignore', 'inherit'];
  const s3 = start(
    'node_modules/.bin/s3rver',
    ['-d', s3Dir, '-a', '127.0.0.1', '-p', String(s3Port), '--silent', '--configure-bucket', bucket],
    { stdio },
  );
  const smtp = start(process.execPath, ['scripts/fake-smtp.mjs'], {
    stdio,
    env: { ...process.env, SMTP_PORT: String(smtpPort), MAILBOX_DIR: mailDir },
  });
  await Promise.all([waitForPort(s3Port), waitForPort(smtpPort)]);
  if (!quiet) log(`local fakes: S3 on 127.0.0.1:${s3Port} (bucket ${bucket}), SMTP on 127.0.0.1:${smtpPort} → ${mailDir}`);
  return {
    stop() {
      for (const p of [s3, smtp]) if (p.exitCode === null) p.kill('SIGTERM');
    },
  };
}
