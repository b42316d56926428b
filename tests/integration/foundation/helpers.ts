/**
 * Helpers for integration tests against the running app (APP_URL) and its real database
 * (DATABASE_URL), both started by scripts/test.sh. No mocks: requests go over HTTP, rows into PostgreSQL.
 */
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { memberships, teams, users } from '@/db/schema';
import type { TeamRole } from '@/lib/auth/roles';

export const APP_URL = (process.env.APP_URL ?? 'http://127.0.0.1:3100').replace(/\/+$/, '');
export const DEMO_PASSWORD = 'zonewright-demo';
export const DEMO_TEAM_SLUG = 'demo-harbour-street';

export interface ApiResponse {
  status: number;
  headers: Headers;
  /** Parsed JSON, or null when the body was not JSON. */
  body: any;
  text: string;
}

/** One HTTP call; `body` as a string is sent raw (for malformed JSON), otherwise as JSON. */
export async function api(path: string, options: { method?: string; cookie?: string; body?: unknown } = {}): Promise<ApiResponse> {
  const headers: Record<string, string> = {};
  if (options.cookie) headers.cookie = options.cookie;
  if (options.body !== undefined) headers['content-type'] = 'application/json';
  const response = await fetch(`${APP_URL}${path}`, {
    method: options.method ?? 'GET',
    headers,
    body: options.body === undefined ? undefined : typeof options.body === 'string' ? options.body : JSON.stringify(options.body),
    redirect: 'manual',
  });
  const text = await response.text();
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    body = null;
  }
  return { status: response.status, headers: response.headers, body, text };
}

function cookiesOf(response: Response): string[] {
  return response.headers.getSetCookie().map((c) => c.split(';')[0]);
}

/** Sign in with e-mail and password through next-auth's own endpoints; returns the Cookie header. */
export async function signInCookie(email: string, password = DEMO_PASSWORD): Promise<string> {
  const csrfResponse = await fetch(`${APP_URL}/api/auth/csrf`);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken: string };
  const jar = cookiesOf(csrfResponse);
  const response = await fetch(`${APP_URL}/api/auth/callback/password`, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar.join('; ') },
    body: new URLSearchParams({ email, password, csrfToken, json: 'true' }),
    redirect: 'manual',
  });
  const all = [...jar, ...cookiesOf(response)];
  const session = all.find((c) => c.startsWith('next-auth.session-token='));
  if (!session) throw new Error(`signing in as ${email} failed (HTTP ${response.status})`);
  return all.join('; ');
}

export async function demoTeamId(): Promise<string> {
  const [team] = await db.select({ id: teams.id }).from(teams).where(eq(teams.slug, DEMO_TEAM_SLUG));
  if (!team) throw new Error('the demo team is missing: run scripts/seed.ts on the test database');
  return team.id;
}

/** A throw-away team with one member per given role; e-mails are unique per call. */
export async function makeTeam(roles: TeamRole[], password = 'integration-password'): Promise<{ teamId: string; members: { id: string; email: string; role: TeamRole }[]; password: string }> {
  const tag = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
  const [team] = await db.insert(teams).values({ name: `Test team ${tag}`, slug: `test-${tag}` }).returning({ id: teams.id });
  const passwordHash = await bcrypt.hash(password, 4);
  const members = [];
  for (const [index, role] of roles.entries()) {
    const email = `${role}-${index}-${tag}@example.com`;
    const [user] = await db.insert(users).values({ email, name: `${role} ${tag}`, passwordHash }).returning({ id: users.id });
    await db.insert(memberships).values({ teamId: team.id, userId: user.id, role });
    members.push({ id: user.id, email, role });
  }
  return { teamId: team.id, members, password };
}
