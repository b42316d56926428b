import { defineConfig } from 'drizzle-kit';
import { databaseUrl } from './db/url';

// Migrations are generated from db/schema into drizzle/ and committed; forward-only.
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema/index.ts',
  out: './drizzle',
  dbCredentials: { url: databaseUrl() },
});
