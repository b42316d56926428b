/** GET /api/mailbox?to=…&limit=…  mail captured by the local SMTP fake (signed-in users, local runs only). */
import { z } from 'zod';
import { emailSchema } from '@/lib/auth';
import { handle, json, parseQuery } from '@/app/_server/http';
import { listCapturedMail } from '@/app/_server/mailbox';
import { authorize, requireUser } from '@/app/_server/session';

const query = z.object({
  to: emailSchema.optional(),
  limit: z.coerce.number().int('limit is a whole number.').min(1, 'limit is at least 1.').max(500, 'limit is at most 500.').optional(),
});

export const GET = handle(async (request, { requestId }) => {
  const user = await requireUser();
  authorize({ userId: user.id, role: null }, 'mailbox.view');
  const { to, limit } = parseQuery(request, query);
  return json({ messages: await listCapturedMail({ to, limit }) }, { requestId });
});
