/**
 * The revision review state machine. Pure: it knows which move leads from which state to which,
 * and which permission (lib/auth/permissions) a move needs; who holds that permission is decided
 * by `can`, never here.
 */

export const REVISION_STATES = [
  'draft',
  'in_review',
  'changes_requested',
  'approved',
  'released',
  'fabricated',
] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const REVISION_MOVES = [
  'requestReview',
  'approve',
  'requestChanges',
  'release',
  'markFabricated',
] as const;
export type RevisionMove = (typeof REVISION_MOVES)[number];

/** The permission each move needs, as named in the authorization table. */
export type MovePermission =
  | 'revision.requestReview'
  | 'revision.approve'
  | 'revision.requestChanges'
  | 'revision.release'
  | 'revision.markFabricated';

export interface MoveRule {
  from: readonly RevisionState[];
  to: RevisionState;
  permission: MovePermission;
  /** the button text users see */
  label: string;
}

export const MOVE_RULES: Readonly<Record<RevisionMove, MoveRule>> = {
  requestReview: {
    from: ['draft', 'changes_requested'],
    to: 'in_review',
    permission: 'revision.requestReview',
    label: 'Request review',
  },
  approve: { from: ['in_review'], to: 'approved', permission: 'revision.approve', label: 'Approve' },
  requestChanges: {
    from: ['in_review'],
    to: 'changes_requested',
    permission: 'revision.requestChanges',
    label: 'Request changes',
  },
  release: { from: ['approved'], to: 'released', permission: 'revision.release', label: 'Release to fab' },
  markFabricated: {
    from: ['released'],
    to: 'fabricated',
    permission: 'revision.markFabricated',
    label: 'Mark fabricated',
  },
};

/** How each state is shown to users. */
export const STATE_LABELS: Readonly<Record<RevisionState, string>> = {
  draft: 'draft',
  in_review: 'in review',
  changes_requested: 'changes requested',
  approved: 'approved',
  released: 'released to fab',
  fabricated: 'fabricated',
};

export function isRevisionState(value: unknown): value is RevisionState {
  return typeof value === 'string' && (REVISION_STATES as readonly string[]).includes(value);
}

export type MovePlan =
  | { ok: true; from: RevisionState; to: RevisionState; permission: MovePermission }
  | { ok: false; message: string };

function listStates(states: readonly RevisionState[]): string {
  const words = states.map((s) => `"${STATE_LABELS[s]}"`);
  return words.length === 1 ? words[0] : `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;
}

/** Whether `move` applies to a revision in state `current`, and where it leads. */
export function planMove(current: RevisionState, move: RevisionMove): MovePlan {
  const rule = MOVE_RULES[move];
  if (!rule.from.includes(current)) {
    return {
      ok: false,
      message: `"${rule.label}" is not possible: the revision is ${STATE_LABELS[current]}, and this move applies only to a revision that is ${listStates(rule.from)}.`,
    };
  }
  return { ok: true, from: current, to: rule.to, permission: rule.permission };
}

/** The moves whose starting state is `current`, in the table's order. */
export function movesFrom(current: RevisionState): RevisionMove[] {
  return REVISION_MOVES.filter((move) => MOVE_RULES[move].from.includes(current));
}
