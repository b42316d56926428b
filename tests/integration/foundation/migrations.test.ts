import { randomBytes } from 'node:crypto';
import { Client } from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { applyMigrations, ensureDatabase } from '@/db/migrate';
import { databaseUrl } from '@/db/url';

// A database of its own, so this test never touches the one the app under test uses.
const name = `zw_migrations_${randomBytes(4).toString('hex')}`;
const url = (() => {
  const u = new URL(databaseUrl());
  u.pathname = `/${name}`;
  return u.toString();
})();

async function query<T = Record<string, unknown>>(sql: string): Promise<T[]> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query(sql)).rows as T[];
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new Client({ connectionString: admin.toString() });
  await client.connect();
  await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  await client.end();
});

describe('migrations', () => {
  it('apply to an empty database and create the foundation tables', async () => {
    await ensureDatabase(url, true);
    expect(await query("select table_name from information_schema.tables where table_schema = 'public'")).toEqual([]);
    await applyMigrations(url);
    const tables = (await query<{ table_name: string }>("select table_name from information_schema.tables where table_schema = 'public'")).map(
      (r) => r.table_name,
    );
    for (const table of ['users', 'accounts', 'verification_tokens', 'teams', 'memberships', 'invitations', 'captured_mail', 'mail_outbox', 'audit_events', 'designs', 'revisions', 'comments']) {
      expect(tables, table).toContain(table);
    }
  });

  it('apply again without change (already applied migrations are skipped)', async () => {
    const before = await query('select hash from drizzle.__drizzle_migrations order by id');
    await applyMigrations(url);
    expect(await query('select hash from drizzle.__drizzle_migrations order by id')).toEqual(before);
  });

  it('enforce the rules the app relies on: unique e-mails, one revision number per design', async () => {
    await query("insert into users (email) values ('same@example.com')");
    await expect(query("insert into users (email) values ('same@example.com')")).rejects.toThrow(/users_email_unique/);
    await query("insert into teams (name, slug) values ('t', 't')");
    await query("insert into designs (team_id, name) select id, 'd' from teams where slug = 't'");
    await query("insert into revisions (design_id, number, source) select id, 1, 'x' from designs");
    await expect(query("insert into revisions (design_id, number, source) select id, 1, 'y' from designs")).rejects.toThrow(
      /revisions_design_number_unique/,
    );
  });
});
