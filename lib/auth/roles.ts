/** The five roles a member can hold in a team, from most to least capable. */
export const TEAM_ROLES = ['owner', 'designer', 'reviewer', 'fab', 'viewer'] as const;

export type TeamRole = (typeof TEAM_ROLES)[number];

/** How each role is shown to people. */
export const ROLE_LABELS: Record<TeamRole, string> = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
  fab: 'Fab',
  viewer: 'Viewer',
};

export function isTeamRole(value: unknown): value is TeamRole {
  return typeof value === 'string' && (TEAM_ROLES as readonly string[]).includes(value);
}

/** What each role is for, in a line (the Team page). The rules themselves are in permissions.ts. */
export const ROLE_DESCRIPTIONS: Record<TeamRole, string> = {
  owner: 'everything, including invitations and roles',
  designer: 'creates designs, saves revisions, asks for review',
  reviewer: 'approves or requests changes on others’ revisions, releases to fab',
  fab: 'downloads released bundles, records fab runs, marks revisions fabricated',
  viewer: 'reads everything, changes nothing',
};
