/**
 * next-auth configuration: e-mail + password (bcrypt) and a one-time sign-in link by e-mail.
 * Sessions are encrypted JWT cookies keyed by authSecret(), so they survive a server restart.
 */
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import EmailProvider from 'next-auth/providers/email';
import { db } from '@/db';
import { users } from '@/db/schema';
import { mailConfig, sendMail, signInLinkEmail } from '@/lib/mail';
import { recordAudit } from '../audit';
import { zonewrightAdapter } from './adapter';
import { authSecret } from './secret';

const SIGN_IN_LINK_MINUTES = 15;

// Compared against when the e-mail is unknown, so both failures take the same time.
const NO_SUCH_USER_HASH = bcrypt.hashSync('no such user', 10);

export async function checkPassword(email: string, password: string): Promise<{ id: string; email: string; name: string } | null> {
  const user = await db.query.users.findFirst({ where: eq(users.email, email.trim().toLowerCase()) });
  const matches = await bcrypt.compare(password, user?.passwordHash ?? NO_SUCH_USER_HASH);
  return user && user.passwordHash && matches ? { id: user.id, email: user.email, name: user.name } : null;
}

async function userExists(email: string): Promise<boolean> {
  const row = await db.query.users.findFirst({ where: eq(users.email, email.toLowerCase()), columns: { id: true } });
  return Boolean(row);
}

export function authOptions(): NextAuthOptions {
  const mail = mailConfig();
  return {
    secret: authSecret(),
    adapter: zonewrightAdapter(),
    session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
    pages: { signIn: '/sign-in', verifyRequest: '/sign-in/check-mail', error: '/sign-in' },
    providers: [
      CredentialsProvider({
        id: 'password',
        name: 'E-mail and password',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials) {
          if (!credentials?.email || !credentials.password) return null;
          return checkPassword(credentials.email, credentials.password);
        },
      }),
      EmailProvider({
        server: { host: mail.host, port: mail.port },
        from: mail.from,
        maxAge: SIGN_IN_LINK_MINUTES * 60,
        normalizeIdentifier: (identifier) => identifier.trim().toLowerCase(),
        // Only people with an account get a link; the page says "check your mail" either way, so
        // the form does not reveal who has an account.
        async sendVerificationRequest({ identifier, url }) {
          if (!(await userExists(identifier))) return;
          const message = signInLinkEmail(url, SIGN_IN_LINK_MINUTES);
          await sendMail({ to: identifier, kind: 'sign-in-link', ...message });
        },
      }),
    ],
    callbacks: {
      async signIn({ user, account, email }) {
        if (account?.provider !== 'email' || email?.verificationRequest) return true;
        // The link itself: never create accounts this way; people join by invitation.
        return typeof user.email === 'string' && userExists(user.email);
      },
      async session({ session, token }) {
        if (session.user && token.sub) session.user.id = token.sub;
        return session;
      },
    },
    events: {
      async signIn({ user, account }) {
        await recordAudit({ actorId: user.id, action: 'auth.signIn', details: { method: account?.provider ?? 'unknown' } });
      },
    },
    logger: {
      error: (code, metadata) => console.error(`[auth] ${code}`, metadata instanceof Error ? metadata.message : ''),
      warn: (code) => {
        if (code !== 'NEXTAUTH_URL' && code !== 'DEBUG_ENABLED') console.warn(`[auth] ${code}`);
      },
      debug: () => {},
    },
  };
}
