import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { config } from '../config.js';
import { entities } from './entities/index.js';
import { migrations } from './migrations/index.js';

/** The one data source: used by the server, the seed and the migration CLI. Never synchronize. */
export function makeDataSource(url = config.databaseUrl): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: false,
    // a database host that does not answer fails a request after 5 s (503) instead of holding it forever
    extra: { max: 20, connectionTimeoutMillis: 5000 },
  });
}

export const AppDataSource = makeDataSource();
export default AppDataSource;
