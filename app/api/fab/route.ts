import { listFabQueue, listRuns } from '@/db/queries/fab';
import { handle, json } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { can } from '@/lib/auth';

/** The fab queue: released and fabricated revisions of the caller's teams, with their runs. */
export const GET = handle(async (_request, { requestId }) => {
  const user = await requireUser();
  const items = (await listFabQueue(user.id)).filter((item) => can({ userId: user.id, role: item.role }, 'revision.view'));
  const runs = await listRuns(items.map((i) => i.revisionId));
  return json({ items, runs }, { requestId });
});
