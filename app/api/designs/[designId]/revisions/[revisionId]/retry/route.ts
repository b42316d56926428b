import { requeueFailed } from '@/db/queries/revisions';
import { ApiError, handle, json } from '@/app/_server/http';
import { revisionAccess } from '@/app/api/designs/_lib/access';
import { enqueueExport } from '@/app/api/designs/_lib/enqueue';

/** Queues a failed revision's export again; the revision's script and number stay as they were. */
export const POST = handle<{ designId: string; revisionId: string }>(async (_request, { params }) => {
  const { revision, user } = await revisionAccess(params.revisionId, 'revision.save');
  if (revision.designId !== params.designId) throw new ApiError(404, 'No such revision.');
  if (!(await requeueFailed(revision.id, user.id))) {
    throw new ApiError(409, `Revision ${revision.number} is ${revision.buildStatus}; only a failed export can be retried.`);
  }
  await enqueueExport(revision.id);
  return json({ id: revision.id, buildStatus: 'queued' }, { status: 202 });
});
