/**
 * Who is e-mailed about what. Pure: takes the team's members with their e-mail preferences and
 * returns the recipients; sending is the caller's job. Nobody is e-mailed about their own action.
 */
import type { TeamRole } from '../auth/roles';
import type { RevisionMove } from './states';

export type NotificationKind = 'review-requested' | 'approved' | 'changes-requested' | 'released-to-fab' | 'mention';

/** The per-user switches stored by the Settings page (users table). */
export interface EmailPreferences {
  notifyReviewRequested: boolean;
  notifyReviewOutcome: boolean;
  notifyReleased: boolean;
  notifyMention: boolean;
}

export const PREFERENCE_FOR: Readonly<Record<NotificationKind, keyof EmailPreferences>> = {
  'review-requested': 'notifyReviewRequested',
  approved: 'notifyReviewOutcome',
  'changes-requested': 'notifyReviewOutcome',
  'released-to-fab': 'notifyReleased',
  mention: 'notifyMention',
};

export interface MemberContact extends EmailPreferences {
  userId: string;
  email: string;
  name: string;
  role: TeamRole;
}

export interface Notification<M extends MemberContact = MemberContact> {
  kind: NotificationKind;
  recipients: M[];
}

export const MOVE_NOTIFICATION: Readonly<Partial<Record<RevisionMove, NotificationKind>>> = {
  requestReview: 'review-requested',
  approve: 'approved',
  requestChanges: 'changes-requested',
  release: 'released-to-fab',
};

/** Keeps the members who want this kind of e-mail and are not the one who acted. */
export function wantsEmail<M extends MemberContact>(kind: NotificationKind, members: readonly M[], actorId: string): M[] {
  const preference = PREFERENCE_FOR[kind];
  return members.filter((m) => m.userId !== actorId && m[preference]);
}

/**
 * Recipients of the e-mail a move sends: review requested → the team's reviewers (its owners when
 * it has no reviewer, so the request reaches someone who may approve); approved or changes
 * requested → the revision's author; released to fab → fab staff. Other moves send nothing.
 */
export function moveNotification<M extends MemberContact>(
  move: RevisionMove,
  input: { actorId: string; authorId: string | null; members: readonly M[] },
): Notification<M> | null {
  const kind = MOVE_NOTIFICATION[move];
  if (!kind) return null;
  const withRole = (role: TeamRole) => input.members.filter((m) => m.role === role);
  let audience: M[];
  if (kind === 'review-requested') {
    const reviewers = withRole('reviewer');
    audience = reviewers.length > 0 ? reviewers : withRole('owner');
  } else if (kind === 'released-to-fab') {
    audience = withRole('fab');
  } else {
    audience = input.members.filter((m) => m.userId === input.authorId);
  }
  return { kind, recipients: wantsEmail(kind, audience, input.actorId) };
}
