import { markBuildFailed } from '@/db/queries/revisions';
import { databaseUrl } from '@/db/url';
import { getBoss, sendExportJob } from '@/lib/jobs/boss';

/** Queues a revision's export; when the queue cannot be reached the revision is marked failed, so it can be retried. */
export async function enqueueExport(revisionId: string): Promise<void> {
  try {
    const boss = await getBoss(databaseUrl(), { worker: false });
    await sendExportJob(boss, { revisionId });
  } catch (error) {
    console.error('[jobs] could not queue export of revision', revisionId, error);
    await markBuildFailed(revisionId, 'The export could not be queued (the job queue did not answer). The revision is saved; retry it.');
  }
}
