export { ACTIONS, can, type Action, type Actor, type Resource } from './permissions';
export { TEAM_ROLES, ROLE_LABELS, isTeamRole, type TeamRole } from './roles';
export { ACTION_LABELS } from './action-labels';
