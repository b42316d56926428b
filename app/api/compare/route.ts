import { compareRevisionGeometry } from './compare-geometry';
import { apiError, handle, json, parseQuery } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { compareQuerySchema } from '@/lib/schemas/review';

/** GET /api/compare?a=&b= : the per-layer geometry difference (XOR) of two revisions' stored bundles. */
export const GET = handle(async (request) => {
  const user = await requireUser();
  const { a, b } = parseQuery(request, compareQuerySchema);
  const outcome = await compareRevisionGeometry(a, b, user.id);
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json(outcome.difference);
});
