/** Payloads of the Team screen and invitations, shared by the forms and the route handlers. */
import { z } from 'zod';
import { TEAM_ROLES } from './roles';

export const MIN_PASSWORD_LENGTH = 10;

const role = z.enum(TEAM_ROLES, { error: `The role is one of ${TEAM_ROLES.join(', ')}.` });
const teamId = z.uuid('teamId must be a team id.');

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter an e-mail address such as name@example.com.').max(254, 'E-mail addresses are at most 254 characters.'));

export const passwordSchema = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Passwords are at least ${MIN_PASSWORD_LENGTH} characters.`)
  .max(200, 'Passwords are at most 200 characters.');

export const personNameSchema = z.string().trim().min(1, 'Say what to call you.').max(120, 'Names are at most 120 characters.');

/** PATCH /api/team/members/{userId} */
export const changeRoleSchema = z.object({ teamId, role });

/** POST /api/team/invitations */
export const inviteSchema = z.object({ teamId, email: emailSchema, role });

/** POST /api/team/invitations/accept: name and password only when the invitation makes a new account. */
export const acceptInvitationSchema = z.object({
  token: z.string().min(20, 'The invitation link is incomplete.').max(200, 'The invitation link is not valid.'),
  name: personNameSchema.optional(),
  password: passwordSchema.optional(),
});
