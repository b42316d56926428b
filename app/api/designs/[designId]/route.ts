/**
 * GET   /api/designs/{id}   the design with its working script, version and process profile
 * PATCH /api/designs/{id}   name, description and process profile (409 when the page is stale)
 */
import { updateDesignSettings } from '@/db/queries/designs';
import { recordAudit } from '@/app/_server/audit';
import { ApiError, handle, json, parseBody } from '@/app/_server/http';
import { designAccess } from '@/app/api/designs/_lib/access';
import { staleMessage } from '@/app/api/designs/_lib/stale';
import { updateDesignSchema } from '@/lib/schemas/designs';

export const GET = handle<{ designId: string }>(async (_request, { params, requestId }) => {
  const { design, teamName, role } = await designAccess(params.designId, 'design.view');
  return json({ design, teamName, role }, { requestId });
});

export const PATCH = handle<{ designId: string }>(async (request, { params, requestId }) => {
  const { design, user } = await designAccess(params.designId, 'design.edit');
  const body = await parseBody(request, updateDesignSchema);
  const result = await updateDesignSettings(design.id, user.id, body);
  if (!result.ok) throw new ApiError(409, staleMessage(result.current, 'change to the settings'));
  await recordAudit({ teamId: design.teamId, actorId: user.id, action: 'design.edit', subjectType: 'design', subjectId: design.id, details: { fields: ['name', 'description', 'processProfile'] } });
  return json({ version: result.version }, { requestId });
});
