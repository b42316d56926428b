import { z } from 'zod';
import { REVISION_MOVES, REVISION_STATES } from '../workflow/states';

/** POST /api/revisions/{id}/moves: the move, and the state the page showed when it was loaded. */
export const moveRequestSchema = z.object({
  move: z.enum(REVISION_MOVES, { error: `move must be one of: ${REVISION_MOVES.join(', ')}` }),
  expectedState: z.enum(REVISION_STATES, { error: `expectedState must be one of: ${REVISION_STATES.join(', ')}` }),
  /** optional words for the author (e.g. what to change), quoted in the e-mail and kept in the audit log */
  note: z.string().trim().max(2000, 'A note is at most 2000 characters.').optional(),
});
export type MoveRequest = z.infer<typeof moveRequestSchema>;

/** /compare?a=<revisionId>&b=<revisionId> and GET /api/compare?a=&b= */
export const compareQuerySchema = z
  .object({
    a: z.uuid('a must be a revision id'),
    b: z.uuid('b must be a revision id'),
  })
  .refine((q) => q.a !== q.b, { message: 'Pick two different revisions to compare.', path: ['b'] });
export type CompareQuery = z.infer<typeof compareQuerySchema>;
