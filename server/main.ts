import 'reflect-metadata';
import { createApp } from './app.js';
import { config } from './config.js';
import { AppDataSource } from './db/data-source.js';
import { logger } from './logger.js';
import { startMailSender } from './mail/sender.js';

async function main(): Promise<void> {
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
  process.exit(1);
});
