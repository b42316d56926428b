import { can, type Actor } from '../auth/permissions';
import { MOVE_RULES, movesFrom, type RevisionMove, type RevisionState } from './states';

/** The moves `actor` may make now on a revision in `state` written by `authorId`. */
export function allowedMoves(state: RevisionState, actor: Actor | null, authorId: string | null): RevisionMove[] {
  return movesFrom(state).filter((move) => can(actor, MOVE_RULES[move].permission, { authorId }));
}
