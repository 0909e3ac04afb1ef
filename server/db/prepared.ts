/**
 * Hot queries as named prepared statements: PostgreSQL parses and plans them once per connection instead
 * of on every call. Outside a transaction they go straight to the pool of TypeORM's PostgreSQL driver;
 * inside one (an EntityManager with a query runner) they go through that runner, unprepared, so they stay
 * in the transaction.
 */
import type { DataSource, EntityManager } from 'typeorm';

interface PgPool {
  query(config: { name: string; text: string; values: unknown[] }): Promise<{ rows: unknown[] }>;
}

export async function preparedQuery<T>(
  db: DataSource | EntityManager,
  name: string,
  text: string,
  values: unknown[],
): Promise<T[]> {
  const em = 'manager' in db ? db.manager : db;
  if (em.queryRunner) return await em.query<T[]>(text, values);
  return (await driverPool(em).query({ name, text, values })).rows as T[];
}

/** The pg pool behind TypeORM's PostgreSQL driver (outside transactions). */
export function driverPool(db: DataSource | EntityManager): PgPool {
  const em = 'manager' in db ? db.manager : db;
  return (em.connection.driver as unknown as { master: PgPool }).master;
}
