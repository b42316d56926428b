/**
 * The one place that decides who may do what. Every route handler, server action and page asks `can`.
 * Pure: the caller looks up the actor's role in the resource's team (null when not a member).
 */
import type { TeamRole } from './roles';

export const ACTIONS = [
  'design.view',
  'design.create',
  'design.edit',
  'revision.view',
  'revision.download',
  'revision.save',
  'revision.requestReview',
  'revision.approve',
  'revision.requestChanges',
  'revision.release',
  'revision.markFabricated',
  'phaseMap.upload',
  'fabRun.record',
  'comment.view',
  'comment.create',
  'comment.edit',
  'comment.delete',
  'team.view',
  'team.invite',
  'team.changeRole',
  'mailbox.view',
] as const;

export type Action = (typeof ACTIONS)[number];

export interface Actor {
  userId: string;
  /** The actor's role in the resource's team; null when not a member. */
  role: TeamRole | null;
}

export interface Resource {
  /** Author of the revision or comment acted on; the author-dependent rules deny when it is not given. */
  authorId?: string | null;
  /** True when the app runs with the local mail fake (the Mailbox exists only then). */
  localRun?: boolean;
}

type Rule = (role: TeamRole, isAuthor: boolean) => boolean;

const roles =
  (...allowed: TeamRole[]): Rule =>
  (role) =>
    allowed.includes(role);

const everyMember: Rule = () => true;

// Actions inside a team. Reviewers may not approve their own work: a second pair of eyes is the point.
const TEAM_RULES: Record<Exclude<Action, 'mailbox.view'>, Rule> = {
  'design.view': everyMember,
  'revision.view': everyMember,
  'revision.download': everyMember,
  'comment.view': everyMember,
  'team.view': everyMember,
  'design.create': roles('owner', 'designer'),
  'design.edit': roles('owner', 'designer'),
  'revision.save': roles('owner', 'designer'),
  'phaseMap.upload': roles('owner', 'designer'),
  'revision.requestReview': roles('owner', 'designer'),
  'revision.approve': (role, isAuthor) => role === 'owner' || (role === 'reviewer' && !isAuthor),
  'revision.requestChanges': (role, isAuthor) => role === 'owner' || (role === 'reviewer' && !isAuthor),
  'revision.release': roles('owner', 'reviewer'),
  'revision.markFabricated': roles('owner', 'fab'),
  'fabRun.record': roles('owner', 'fab'),
  'comment.create': roles('owner', 'designer', 'reviewer', 'fab'),
  'comment.edit': (_role, isAuthor) => isAuthor,
  'comment.delete': (role, isAuthor) => isAuthor || role === 'owner',
  'team.invite': roles('owner'),
  'team.changeRole': roles('owner'),
};

/** Rules whose answer depends on who wrote the resource. */
const AUTHOR_DEPENDENT: ReadonlySet<Action> = new Set([
  'revision.approve',
  'revision.requestChanges',
  'comment.edit',
  'comment.delete',
]);

export function can(actor: Actor | null, action: Action, resource: Resource = {}): boolean {
  if (!actor || !actor.userId) return false;
  if (action === 'mailbox.view') return resource.localRun === true;
  if (actor.role === null) return false;
  const knowsAuthor = resource.authorId !== undefined && resource.authorId !== null;
  if (AUTHOR_DEPENDENT.has(action) && !knowsAuthor && actor.role !== 'owner') return false;
  return TEAM_RULES[action](actor.role, knowsAuthor && resource.authorId === actor.userId);
}
