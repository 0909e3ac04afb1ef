import 'reflect-metadata';
import { createApp } from './app.js';
import { checkStartup, config } from './config.js';
import { AppDataSource } from './db/data-source.js';
import { logger } from './logger.js';
import { startMailSender } from './mail/sender.js';

async function main(): Promise<void> {
  const { fatal, warning } = checkStartup(config);
  if (fatal) throw new Error(fatal);
  if (warning) logger.warn(warning);
  await AppDataSource.initialize();
  const app = createApp({ ds: AppDataSource });
  const stopMail = startMailSender(AppDataSource, config.isTest ? 1000 : 5000);
  const server = app.listen(config.port, config.host, () => {
    logger.info(`Frothline listening on http://${config.host}:${config.port}`);
  });
  const stop = (): void => {
    stopMail();
    server.close(() => {
      void AppDataSource.destroy().finally(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 3000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err: unknown) => {
  logger.fatal({ err }, 'Frothline failed to start');
  if (err instanceof Error) process.stderr.write(`Frothline failed to start: ${err.message}\n`);
  process.exit(1);
});
