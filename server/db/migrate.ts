import 'reflect-metadata';
import { makeDataSource } from './data-source.js';

/** Apply pending migrations (used by npm start, npm test and the test setup). */
export async function migrate(url?: string): Promise<string[]> {
  const ds = makeDataSource(url);
  await ds.initialize();
  try {
    const done = await ds.runMigrations({ transaction: 'each' });
    return done.map((m) => m.name);
  } finally {
    await ds.destroy();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  migrate()
    .then((names) => {
      console.log(names.length ? `Applied migrations: ${names.join(', ')}` : 'Database schema is up to date');
    })
    .catch((err: unknown) => {
      console.error(err);
      process.exit(1);
    });
}
