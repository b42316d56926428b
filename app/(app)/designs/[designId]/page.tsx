import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getDesignForUser, listPhaseMaps } from '@/db/queries/designs';
import { listRevisions } from '@/db/queries/revisions';
import { allows, pageUser } from '@/app/_server/session';
import { Workspace } from '@/components/workspace/Workspace';
import { toRevisionRow } from '@/components/workspace/types';
import { DEFAULT_PROCESS_PROFILE, processProfileSchema } from '@/lib/schemas/designs';

export const metadata: Metadata = { title: 'Design workspace' };
export const dynamic = 'force-dynamic';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function DesignWorkspacePage({ params }: { params: Promise<{ designId: string }> }) {
  const { designId } = await params;
  const user = await pageUser(`/designs/${designId}`);
  const found = UUID.test(designId) ? await getDesignForUser(designId, user.id) : null;
  if (!found || !found.role) notFound();
  const actor = { userId: user.id, role: found.role };
  if (!allows(actor, 'design.view')) notFound();
  const [revisions, phaseMaps] = await Promise.all([listRevisions(designId), listPhaseMaps(designId)]);
  // A profile written before the current schema (or by hand) falls back to the defaults field by field.
  const stored = processProfileSchema.safeParse({ ...DEFAULT_PROCESS_PROFILE, ...found.design.processProfile });
  const { design } = found;
  return (
    <Workspace
      design={{
        id: design.id,
        name: design.name,
        description: design.description,
        teamName: found.teamName,
        version: design.version,
        workingScript: design.workingScript,
        processProfile: stored.success ? stored.data : DEFAULT_PROCESS_PROFILE,
      }}
      revisions={revisions.map(toRevisionRow)}
      phaseMaps={phaseMaps.map(({ createdAt: _created, ...m }) => m)}
      canEdit={allows(actor, 'design.edit')}
      canSave={allows(actor, 'revision.save')}
      canUpload={allows(actor, 'phaseMap.upload')}
    />
  );
}
