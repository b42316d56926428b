import { handle, json } from '@/app/_server/http';
import { revisionAccess } from '@/app/api/designs/_lib/access';

/** One revision without its bundle bytes: build status and progress, report, manifest, checksum. */
export const GET = handle<{ revisionId: string }>(async (_request, { params }) => {
  const { revision, designName, teamName } = await revisionAccess(params.revisionId, 'revision.view');
  return json({ revision, designName, teamName });
});
