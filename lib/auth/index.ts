export { ACTIONS, can, type Action, type Actor, type Resource } from './permissions';
export { TEAM_ROLES, ROLE_LABELS, ROLE_DESCRIPTIONS, isTeamRole, type TeamRole } from './roles';
export { ACTION_LABELS } from './action-labels';
export { changeRoleSchema, inviteSchema, acceptInvitationSchema, emailSchema, passwordSchema, personNameSchema, MIN_PASSWORD_LENGTH } from './team-schemas';
export { newLinkToken, hashLinkToken } from './tokens';
