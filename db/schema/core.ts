/**
 * Core tables: people, sign-in, teams, mail and the audit trail.
 * Owned by the foundation; other areas add their own schema files (see DEVELOPERS.md).
 */
import { sql } from 'drizzle-orm';
import {
  boolean,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { TEAM_ROLES } from '../../lib/auth/roles';

const createdAt = () => timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow();

export { TEAM_ROLES };

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** Always stored lower-case, so sign-in is case-insensitive. */
    email: text('email').notNull(),
    name: text('name').notNull().default(''),
    /** bcrypt hash; null for people who only sign in by e-mail link. */
    passwordHash: text('password_hash'),
    emailVerified: timestamp('email_verified', { withTimezone: true, mode: 'date' }),
    image: text('image'),
    /** E-mail preferences; the review area sends by them. */
    notifyReviewRequested: boolean('notify_review_requested').notNull().default(true),
    notifyReviewOutcome: boolean('notify_review_outcome').notNull().default(true),
    notifyReleased: boolean('notify_released').notNull().default(true),
    notifyMention: boolean('notify_mention').notNull().default(true),
    createdAt: createdAt(),
    updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email)],
);

/** Linked sign-in accounts (next-auth's adapter model); the e-mail link provider records one per user. */
export const accounts = pgTable(
  'accounts',
  {
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    type: text('type').notNull(),
    provider: text('provider').notNull(),
    providerAccountId: text('provider_account_id').notNull(),
    refreshToken: text('refresh_token'),
    accessToken: text('access_token'),
    expiresAt: integer('expires_at'),
    tokenType: text('token_type'),
    scope: text('scope'),
    idToken: text('id_token'),
    sessionState: text('session_state'),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);

/** One-time tokens of e-mail sign-in links (stored hashed by next-auth). */
export const verificationTokens = pgTable(
  'verification_tokens',
  {
    identifier: text('identifier').notNull(),
    token: text('token').notNull(),
    expires: timestamp('expires', { withTimezone: true, mode: 'date' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);

export const teams = pgTable('teams', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  /** Short, URL-safe, unique. */
  slug: text('slug').notNull().unique(),
  createdAt: createdAt(),
});

export const memberships = pgTable(
  'memberships',
  {
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text('role', { enum: TEAM_ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);

export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: TEAM_ROLES }).notNull(),
    /** SHA-256 of the token in the link; the token itself is only ever in the e-mail. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: uuid('invited_by').references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp('expires_at', { withTimezone: true, mode: 'date' }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true, mode: 'date' }),
    createdAt: createdAt(),
  },
  (t) => [index('invitations_team_idx').on(t.teamId)],
);

/** Every message the local SMTP fake received (local runs only; read by the Mailbox page). */
export const capturedMail = pgTable(
  'captured_mail',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    envelopeFrom: text('envelope_from').notNull(),
    envelopeTo: text('envelope_to').array().notNull(),
    subject: text('subject').notNull().default(''),
    textBody: text('text_body').notNull().default(''),
    htmlBody: text('html_body'),
    raw: text('raw').notNull(),
    receivedAt: timestamp('received_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('captured_mail_received_idx').on(t.receivedAt)],
);

export const MAIL_STATUSES = ['pending', 'sent', 'failed'] as const;

/** Every message the app sends, written before the send so nothing is lost when the mail server is down. */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body'),
    /** What the mail is about, e.g. 'sign-in-link', 'invitation', 'review-requested'. */
    kind: text('kind').notNull(),
    status: text('status', { enum: MAIL_STATUSES }).notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    createdAt: createdAt(),
    sentAt: timestamp('sent_at', { withTimezone: true, mode: 'date' }),
  },
  (t) => [index('mail_outbox_status_idx').on(t.status)],
);

/** Who did what, when; append-only. */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    /** An action name from lib/auth/permissions.ts, or an event such as 'auth.signIn'. */
    action: text('action').notNull(),
    subjectType: text('subject_type'),
    subjectId: text('subject_id'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default(sql`'{}'::jsonb`),
    createdAt: createdAt(),
  },
  (t) => [index('audit_events_team_idx').on(t.teamId, t.createdAt)],
);
