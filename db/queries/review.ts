/**
 * Review moves on revisions: the one path by which a revision's state changes. A move runs in one
 * transaction with its audit event; its e-mails go out after the commit (sendMail writes them to
 * the outbox first, so a mail server that is down loses nothing and never undoes a move).
 */
import { and, eq } from 'drizzle-orm';
import type { NodePgQueryResultHKT } from 'drizzle-orm/node-postgres';
import type { PgDatabase } from 'drizzle-orm/pg-core';
import { db } from '..';
import * as schema from '../schema';
import { auditEvents, designs, memberships, revisions, teams, users } from '../schema';
import { can } from '../../lib/auth/permissions';
import type { TeamRole } from '../../lib/auth/roles';
import { sendMail } from '../../lib/mail';
import { releasedToFabEmail, reviewOutcomeEmail, reviewRequestedEmail, type RenderedEmail, type RevisionMailContext } from '../../lib/mail/templates';
import { allowedMoves } from '../../lib/workflow/allowed-moves';
import { moveNotification, type MemberContact, type NotificationKind } from '../../lib/workflow/notifications';
import { MOVE_RULES, STATE_LABELS, isRevisionState, planMove, type RevisionMove, type RevisionState } from '../../lib/workflow/states';

/** The database or an open transaction. */
export type Executor = PgDatabase<NodePgQueryResultHKT, typeof schema>;

/** Why a request was refused, with the HTTP status the route answers with. */
export interface Refusal {
  ok: false;
  status: 400 | 403 | 404 | 409 | 413 | 415;
  message: string;
}
export type Outcome<T> = ({ ok: true } & T) | Refusal;

export function refuse(status: Refusal['status'], message: string): Refusal {
  return { ok: false, status, message };
}

export const REVISION_NOT_FOUND = 'No such revision, or it belongs to a team you are not in.';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids come from URLs; anything that is not a UUID names nothing (and must not reach PostgreSQL as one). */
export function isId(value: string): boolean {
  return UUID.test(value);
}

export interface RevisionAccess {
  revision: {
    id: string;
    number: number;
    state: RevisionState;
    authorId: string | null;
    source: string;
    buildStatus: string;
    bundleSha256: string | null;
    message: string;
  };
  design: { id: string; name: string; teamId: string };
  teamName: string;
  /** the user's role in the design's team; null when not a member */
  role: TeamRole | null;
}

/** A revision with its design, team and the user's role there; `lock` takes the revision row FOR UPDATE. */
export async function loadRevisionAccess(
  executor: Executor,
  revisionId: string,
  userId: string,
  options: { lock?: boolean } = {},
): Promise<RevisionAccess | null> {
  if (!isId(revisionId)) return null;
  const query = executor
    .select({
      id: revisions.id,
      number: revisions.number,
      state: revisions.state,
      authorId: revisions.authorId,
      source: revisions.source,
      buildStatus: revisions.buildStatus,
      bundleSha256: revisions.bundleSha256,
      message: revisions.message,
      designId: designs.id,
      designName: designs.name,
      teamId: designs.teamId,
      teamName: teams.name,
      role: memberships.role,
    })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .innerJoin(teams, eq(teams.id, designs.teamId))
    .leftJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .where(eq(revisions.id, revisionId));
  const [row] = await (options.lock ? query.for('update', { of: revisions }) : query);
  if (!row) return null;
  if (!isRevisionState(row.state)) throw new Error(`revision ${row.id} has unknown state "${row.state}"`);
  return {
    revision: {
      id: row.id,
      number: row.number,
      state: row.state,
      authorId: row.authorId,
      source: row.source,
      buildStatus: row.buildStatus,
      bundleSha256: row.bundleSha256,
      message: row.message,
    },
    design: { id: row.designId, name: row.designName, teamId: row.teamId },
    teamName: row.teamName,
    role: row.role ?? null,
  };
}

/** Every member of a team with the contact details and e-mail switches notifications need. */
export async function teamContacts(executor: Executor, teamId: string): Promise<MemberContact[]> {
  return executor
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      role: memberships.role,
      notifyReviewRequested: users.notifyReviewRequested,
      notifyReviewOutcome: users.notifyReviewOutcome,
      notifyReleased: users.notifyReleased,
      notifyMention: users.notifyMention,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId));
}

export function displayName(person: { name: string; email: string }): string {
  return person.name.trim() || person.email;
}

export interface MoveInput {
  revisionId: string;
  actorId: string;
  move: RevisionMove;
  /** the state the user saw; a different current state means the page is stale */
  expectedState: RevisionState;
  note?: string;
  /** the app's public address, for the links in e-mails */
  appUrl: string;
}

export interface MoveResult {
  revisionId: string;
  from: RevisionState;
  to: RevisionState;
}

export interface SentNotification {
  kind: NotificationKind;
  to: string;
  sent: boolean;
}

/** A move made inside a caller's transaction; call `notify` after that transaction commits. */
export type PendingMove = Outcome<MoveResult & { notify: () => Promise<SentNotification[]> }>;

function renderMoveEmail(kind: NotificationKind, ctx: RevisionMailContext, access: RevisionAccess, note?: string): RenderedEmail {
  switch (kind) {
    case 'review-requested':
      return reviewRequestedEmail({ ...ctx, message: note || access.revision.message });
    case 'approved':
      return reviewOutcomeEmail({ ...ctx, outcome: 'approved', note });
    case 'changes-requested':
      return reviewOutcomeEmail({ ...ctx, outcome: 'changes_requested', note });
    case 'released-to-fab':
      return releasedToFabEmail({ ...ctx, bundleSha256: access.revision.bundleSha256 });
    case 'mention':
      throw new Error('mentions are not sent by moves');
  }
}

/** Applies a move within `tx` (which the caller commits), writing the audit event. */
export async function applyMoveInTransaction(tx: Executor, input: MoveInput): Promise<PendingMove> {
  const access = await loadRevisionAccess(tx, input.revisionId, input.actorId, { lock: true });
  if (!access || access.role === null) return refuse(404, REVISION_NOT_FOUND);
  const rule = MOVE_RULES[input.move];
  const actor = { userId: input.actorId, role: access.role };
  if (!can(actor, rule.permission, { authorId: access.revision.authorId })) {
    const own = access.role === 'reviewer' && access.revision.authorId === input.actorId && (input.move === 'approve' || input.move === 'requestChanges');
    return refuse(
      403,
      own
        ? 'You wrote this revision, so another reviewer (or an owner) must review it.'
        : `Your role (${access.role}) may not "${rule.label}".`,
    );
  }
  const current = access.revision.state;
  if (current !== input.expectedState) {
    return refuse(
      409,
      `This revision changed since the page was loaded: it is now ${STATE_LABELS[current]}, not ${STATE_LABELS[input.expectedState]}. Reload the page to see its current state; nothing was changed.`,
    );
  }
  const plan = planMove(current, input.move);
  if (!plan.ok) return refuse(409, `${plan.message} Nothing was changed.`);
  if (input.move === 'requestReview' && access.revision.buildStatus !== 'ready') {
    return refuse(409, `The bundle of this revision is not ready (its export is ${access.revision.buildStatus}); review can be requested once the export has finished.`);
  }

  const updated = await tx
    .update(revisions)
    .set({ state: plan.to })
    .where(and(eq(revisions.id, input.revisionId), eq(revisions.state, current)))
    .returning({ id: revisions.id });
  if (updated.length !== 1) return refuse(409, 'This revision changed while the move was being made. Reload the page; nothing was changed.');

  await tx.insert(auditEvents).values({
    teamId: access.design.teamId,
    actorId: input.actorId,
    action: plan.permission,
    subjectType: 'revision',
    subjectId: input.revisionId,
    details: {
      move: input.move,
      from: current,
      to: plan.to,
      designId: access.design.id,
      revisionNumber: access.revision.number,
      ...(input.note ? { note: input.note } : {}),
    },
  });

  const notify = async (): Promise<SentNotification[]> => {
    const members = await teamContacts(db, access.design.teamId);
    const notification = moveNotification(input.move, { actorId: input.actorId, authorId: access.revision.authorId, members });
    if (!notification) return [];
    const actorMember = members.find((m) => m.userId === input.actorId);
    const ctx: RevisionMailContext = {
      appUrl: input.appUrl,
      teamName: access.teamName,
      designName: access.design.name,
      revisionId: access.revision.id,
      revisionNumber: access.revision.number,
      actorName: actorMember ? displayName(actorMember) : 'A team member',
    };
    const mail = renderMoveEmail(notification.kind, ctx, access, input.note);
    const sent: SentNotification[] = [];
    for (const recipient of notification.recipients) {
      const result = await sendMail({ to: recipient.email, kind: notification.kind, ...mail });
      sent.push({ kind: notification.kind, to: recipient.email, sent: result.sent });
    }
    return sent;
  };

  return { ok: true, revisionId: input.revisionId, from: current, to: plan.to, notify };
}

/**
 * Applies a move in its own transaction, then sends its e-mails. Refused moves (unknown revision,
 * missing permission, stale page, move not allowed from the current state) change nothing.
 */
export async function applyMove(input: MoveInput): Promise<Outcome<MoveResult & { notifications: SentNotification[] }>> {
  // every refusal happens before the first write, so committing after one leaves nothing behind
  const pending = await db.transaction((tx) => applyMoveInTransaction(tx, input));
  if (!pending.ok) return pending;
  const { notify, ...result } = pending;
  return { ...result, notifications: await notify() };
}

export interface MoveChoices {
  state: RevisionState;
  /** the moves the user may make now, with their button labels */
  moves: { move: RevisionMove; label: string }[];
  /** why a reviewer sees no approval buttons on this revision, when that is the reason */
  ownRevision: boolean;
  /** review could be requested but the export has not finished */
  bundlePending: boolean;
}

/** What the signed-in user may do with a revision now (for the move buttons). */
export async function moveChoices(revisionId: string, userId: string): Promise<Outcome<MoveChoices>> {
  const access = await loadRevisionAccess(db, revisionId, userId);
  if (!access || access.role === null) return refuse(404, REVISION_NOT_FOUND);
  const actor = { userId, role: access.role };
  const ready = access.revision.buildStatus === 'ready';
  const allowed = allowedMoves(access.revision.state, actor, access.revision.authorId);
  const moves = allowed.filter((move) => ready || move !== 'requestReview').map((move) => ({ move, label: MOVE_RULES[move].label }));
  const ownRevision = access.role === 'reviewer' && access.revision.authorId === userId && access.revision.state === 'in_review';
  return { ok: true, state: access.revision.state, moves, ownRevision, bundlePending: !ready && allowed.includes('requestReview') };
}
