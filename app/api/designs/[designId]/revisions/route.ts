/**
 * GET  /api/designs/{id}/revisions   the design's revisions, newest first (no bundle bytes)
 * POST /api/designs/{id}/revisions   check the script, number and store a revision, queue its export
 */
import { createRevision, listRevisions } from '@/db/queries/revisions';
import { ApiError, handle, json, parseBody } from '@/app/_server/http';
import { designAccess } from '@/app/api/designs/_lib/access';
import { enqueueExport } from '@/app/api/designs/_lib/enqueue';
import { checkScript } from '@/lib/lang';
import { saveRevisionSchema } from '@/lib/schemas/designs';

export const GET = handle<{ designId: string }>(async (_request, { params, requestId }) => {
  const { design } = await designAccess(params.designId, 'revision.view');
  return json({ revisions: await listRevisions(design.id) }, { requestId });
});

export const POST = handle<{ designId: string }>(async (request, { params, requestId }) => {
  const { design, user } = await designAccess(params.designId, 'revision.save');
  const body = await parseBody(request, saveRevisionSchema);
  const errors = checkScript(body.script).filter((d) => d.severity === 'error');
  if (errors.length > 0) {
    throw new ApiError(
      422,
      `The script has ${errors.length === 1 ? '1 problem' : `${errors.length} problems`}; fix ${errors.length === 1 ? 'it' : 'them'} before saving a revision. Your text is kept as the working script.`,
      errors.map((d) => ({ path: `script:${d.start.line}:${d.start.column}`, message: d.message })),
    );
  }
  const created = await createRevision({
    designId: design.id,
    authorId: user.id,
    source: body.script,
    message: body.message,
    baseVersion: body.baseVersion,
  });
  await enqueueExport(created.id);
  return json(created, { status: 201, requestId });
});
