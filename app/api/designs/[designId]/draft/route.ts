import { saveDraft } from '@/db/queries/designs';
import { ApiError, handle, json, parseBody } from '@/app/_server/http';
import { designAccess } from '@/app/api/designs/_lib/access';
import { saveDraftSchema } from '@/lib/schemas/designs';
import { staleMessage } from '@/app/api/designs/_lib/stale';

/** Saves the working script, unless the design changed since the page loaded (409, nothing overwritten). */
export const PUT = handle<{ designId: string }>(async (request, { params }) => {
  const { design, user } = await designAccess(params.designId, 'design.edit');
  const body = await parseBody(request, saveDraftSchema);
  const result = await saveDraft(design.id, user.id, body.script, body.baseVersion);
  if (!result.ok) throw new ApiError(409, staleMessage(result.current, 'working script'));
  return json({ version: result.version });
});
