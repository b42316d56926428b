/** Create a database and apply the committed migrations in drizzle/ to it. */
import path from 'node:path';
import { Client } from 'pg';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';

function databaseName(url: URL): string {
  const name = decodeURIComponent(url.pathname.replace(/^\//, ''));
  if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(name)) throw new Error(`unsupported database name "${name}" in DATABASE_URL`);
  return name;
}

/** Create (or with recreate, drop and create) the database named in the URL, via the maintenance database. */
export async function ensureDatabase(url: string, recreate: boolean): Promise<void> {
  const target = new URL(url);
  const name = databaseName(target);
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    if (recreate) await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${name}"`);
  } finally {
    await client.end();
  }
}

export async function applyMigrations(url: string): Promise<void> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    await migrate(drizzle(client), { migrationsFolder: path.resolve(__dirname, '../drizzle') });
  } finally {
    await client.end();
  }
}
