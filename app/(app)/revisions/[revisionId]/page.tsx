import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getRevisionForUser } from '@/db/queries/revisions';
import { allows, pageUser } from '@/app/_server/session';
import { RevisionView } from '@/components/workspace/RevisionView';
import { toRevisionRow } from '@/components/workspace/types';
import { DEFAULT_PROCESS_PROFILE, processProfileSchema } from '@/lib/schemas/designs';
import { reportWarnings } from '@/lib/jobs/report-figures';

export const metadata: Metadata = { title: 'Revision' };
export const dynamic = 'force-dynamic';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function RevisionPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const { revisionId } = await params;
  const user = await pageUser(`/revisions/${revisionId}`);
  const found = UUID.test(revisionId) ? await getRevisionForUser(revisionId, user.id) : null;
  if (!found || !found.role) notFound();
  const actor = { userId: user.id, role: found.role };
  if (!allows(actor, 'revision.view')) notFound();
  const { revision } = found;
  const profile = processProfileSchema.safeParse({ ...DEFAULT_PROCESS_PROFILE, ...revision.processProfile });
  return (
    <RevisionView
      revision={{ ...toRevisionRow(revision), source: revision.source, processProfile: profile.success ? profile.data : DEFAULT_PROCESS_PROFILE }}
      designId={revision.designId}
      designName={found.designName}
      teamName={found.teamName}
      canRetry={allows(actor, 'revision.save')}
      warnings={reportWarnings(revision.report)}
    />
  );
}
