/**
 * The database handle: one pg Pool per process, chosen by DATABASE_URL.
 * Import `db` for queries and `schema` for tables; server code only.
 */
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from './schema';
import { databaseUrl } from './url';

export type Database = NodePgDatabase<typeof schema>;

type Handle = { pool: Pool; db: Database };

// Kept on globalThis so the dev server's module reloads do not open a new pool each time.
const holder = globalThis as unknown as { __zonewrightDb?: Handle };

function handle(): Handle {
  if (!holder.__zonewrightDb) {
    const pool = new Pool({ connectionString: databaseUrl(), max: Number(process.env.DB_POOL_MAX ?? 10) });
    // An idle client losing its connection must not crash the process; the next query reconnects.
    pool.on('error', (error) => console.error('[db] idle client error:', error.message));
    holder.__zonewrightDb = { pool, db: drizzle(pool, { schema }) };
  }
  return holder.__zonewrightDb;
}

/** Lazily connected, so importing this module never opens a connection by itself. */
export const db: Database = new Proxy({} as Database, {
  get: (_target, property) => Reflect.get(handle().db, property),
});

export function pool(): Pool {
  return handle().pool;
}

/** Close the pool (scripts and tests call this before exiting). */
export async function closeDb(): Promise<void> {
  const current = holder.__zonewrightDb;
  holder.__zonewrightDb = undefined;
  await current?.pool.end();
}

export { schema };
