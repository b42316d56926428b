import { TEAM_ROLES, type TeamRole } from './roles';

/** The invented demo team and its one account per role (demo data; see scripts/seed.ts). */
export const DEMO_PASSWORD = 'zonewright-demo';
export const DEMO_ROLES: readonly TeamRole[] = TEAM_ROLES;

export function demoEmail(role: TeamRole): string {
  return `${role}@example.com`;
}
