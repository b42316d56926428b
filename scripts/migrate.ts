/**
 * Apply the committed migrations in drizzle/ to DATABASE_URL, creating the database when missing.
 *   tsx scripts/migrate.ts            create if missing, then migrate
 *   tsx scripts/migrate.ts --recreate drop and recreate first (the test database)
 */
import { applyMigrations, ensureDatabase } from '../db/migrate';
import { databaseUrl } from '../db/url';

async function main(): Promise<void> {
  const url = databaseUrl();
  await ensureDatabase(url, process.argv.includes('--recreate'));
  await applyMigrations(url);
  console.log(`[zonewright] migrations applied to ${new URL(url).pathname.slice(1)}`);
}

main().catch((error: unknown) => {
  console.error(`[zonewright] migration failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
