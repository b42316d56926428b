/**
 * The key that signs and encrypts session cookies. AUTH_SECRET (or NEXTAUTH_SECRET) when set; otherwise
 * one generated on first use and kept in .data/auth-secret, so sessions survive a restart.
 */
import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

let cached: string | undefined;

export function authSecret(): string {
  if (cached) return cached;
  const fromEnv = process.env.AUTH_SECRET || process.env.NEXTAUTH_SECRET;
  if (fromEnv) return (cached = fromEnv);
  const file = path.join(process.cwd(), '.data', 'auth-secret');
  try {
    cached = readFileSync(file, 'utf8').trim();
  } catch {
    mkdirSync(path.dirname(file), { recursive: true });
    const fresh = randomBytes(32).toString('base64url');
    // 'wx' fails if another process wrote it first; then read theirs.
    try {
      writeFileSync(file, fresh, { flag: 'wx', mode: 0o600 });
      cached = fresh;
    } catch {
      cached = readFileSync(file, 'utf8').trim();
    }
  }
  return cached;
}
