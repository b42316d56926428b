import type { Metadata } from 'next';
import { listFabQueue, listRuns } from '@/db/queries/fab';
import { allows, pageUser } from '@/app/_server/session';
import { FabQueue } from '@/components/fab/FabQueue';
import { PageHeader } from '@/components/ui';
import { isTeamRole } from '@/lib/auth';
import { DEFAULT_PROCESS_PROFILE, processProfileSchema } from '@/lib/schemas/designs';

export const metadata: Metadata = { title: 'Fab queue' };
export const dynamic = 'force-dynamic';

export default async function FabQueuePage() {
  const user = await pageUser('/fab');
  const items = (await listFabQueue(user.id)).filter((i) => allows({ userId: user.id, role: i.role }, 'revision.view'));
  const runs = await listRuns(items.map((i) => i.revisionId));
  const recordable = new Set(items.filter((i) => allows({ userId: user.id, role: i.role }, 'fabRun.record')).map((i) => i.role));
  return (
    <div className="mx-auto max-w-5xl">
      <PageHeader title="Fab queue" lead="Revisions released to fab: download the bundle, check its SHA-256, record what came out." />
      <FabQueue
        items={items.map((i) => {
          const profile = processProfileSchema.safeParse({ ...DEFAULT_PROCESS_PROFILE, ...i.processProfile });
          return {
            revisionId: i.revisionId,
            number: i.number,
            state: i.state,
            message: i.message,
            designName: i.designName,
            teamName: i.teamName,
            role: i.role,
            profile: profile.success ? profile.data : DEFAULT_PROCESS_PROFILE,
            layers: i.layers ?? [],
            bundleSha256: i.bundleSha256,
            bundleBytes: i.bundleBytes,
            zoneCount: i.zoneCount,
            narrowestFeature: i.narrowestFeature,
            createdAt: i.createdAt.toISOString(),
          };
        })}
        runs={runs.map(({ createdAt: _created, ...r }) => r)}
        recordableRoles={[...recordable].filter(isTeamRole)}
      />
    </div>
  );
}
