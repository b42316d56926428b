import type { Metadata } from 'next';
import Link from 'next/link';
import { DesignNameCell } from '@/components/designs/DesignNameCell';
import { buttonClass, DateTime, Notice, PageHeader, Panel, Tag } from '@/components/ui';
import { allows, pageMembership } from '@/app/_server/session';
import { ROLE_LABELS } from '@/lib/auth';
import { isRevisionState, STATE_LABELS } from '@/lib/workflow/states';
import { activityWords } from './activity-words';
import { recentActivity, teamDesigns, teamRevisionsIn } from './queries';

export const metadata: Metadata = { title: 'Desk' };
export const dynamic = 'force-dynamic';

function stateLabel(state: string | null): string {
  if (!state) return 'no revision yet';
  return isRevisionState(state) ? STATE_LABELS[state] : state;
}

export default async function DeskPage() {
  const { user, membership } = await pageMembership('/desk');
  if (!membership) {
    return (
      <div className="mx-auto max-w-2xl">
        <PageHeader title="Desk" />
        <Notice title="You are not in a team yet">
          Ask a team owner to invite {user.email}; the invitation arrives by e-mail.
        </Notice>
      </div>
    );
  }
  const { team, actor, role } = membership;
  const canCreate = allows(actor, 'design.create');
  // Shown to those who may approve a revision someone else wrote.
  const reviews = allows(actor, 'revision.approve', { authorId: `other-than-${user.id}` }) ? await teamRevisionsIn(team.id, 'in_review', user.id) : null;
  const released = allows(actor, 'fabRun.record') ? await teamRevisionsIn(team.id, 'released') : null;
  const [designList, activity] = await Promise.all([teamDesigns(team.id), recentActivity(team.id)]);

  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-6">
      <PageHeader
        title="Desk"
        lead={`${team.name} · you are ${ROLE_LABELS[role].toLowerCase()}`}
        actions={
          canCreate ? (
            <Link href="/desk/new" className={buttonClass('primary', 'no-underline')}>
              New design
            </Link>
          ) : null
        }
      />
      {reviews ? (
        <Panel title={`Waiting for your review (${reviews.length})`} id="waiting-for-review">
          <RevisionList rows={reviews} empty="Nothing is waiting for your review." />
        </Panel>
      ) : null}
      {released ? (
        <Panel title={`Released to fab (${released.length})`} id="released-to-fab">
          <RevisionList rows={released} empty="No revision is waiting for fabrication." />
        </Panel>
      ) : null}
      <Panel title={`Designs (${designList.length})`} id="designs">
        {designList.length === 0 ? (
          <p className="text-ink/70">
            No designs yet.{canCreate ? ' Start one with New design.' : ' Designers and owners start them.'}
          </p>
        ) : (
          <table className="w-full text-left text-sm">
            <thead className="text-xs text-ink/60">
              <tr className="border-b border-hairline">
                <th className="py-1 pr-4 font-medium">Design</th>
                <th className="py-1 pr-4 font-medium">Latest revision</th>
                <th className="py-1 font-medium">Last change</th>
              </tr>
            </thead>
            <tbody>
              {designList.map((d) => (
                <tr key={d.id} className="border-b border-hairline last:border-0">
                  <DesignNameCell design={d} />
                  <td className="py-2 pr-4">
                    {d.latestNumber ? <span className="numeric mr-2">r{d.latestNumber}</span> : null}
                    <Tag>{stateLabel(d.latestState)}</Tag>
                  </td>
                  <td className="py-2">
                    <DateTime value={d.updatedAt} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
      <Panel title="Recent activity" id="activity">
        {activity.length === 0 ? (
          <p className="text-ink/70">Nothing has happened in this team yet.</p>
        ) : (
          <ul className="flex flex-col gap-1">
            {activity.map((event) => (
              <li key={event.id} className="flex gap-3">
                <DateTime value={event.createdAt} />
                <span>
                  {event.actorName ?? 'Someone'} {activityWords(event.action, event.details)}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Panel>
    </div>
  );
}

function RevisionList({ rows, empty }: { rows: Awaited<ReturnType<typeof teamRevisionsIn>>; empty: string }) {
  if (rows.length === 0) return <p className="text-ink/70">{empty}</p>;
  return (
    <ul className="flex flex-col gap-2">
      {rows.map((r) => (
        <li key={r.id} className="flex items-baseline gap-3">
          <Link href={`/revisions/${r.id}`} className="font-medium">
            {r.designName} <span className="numeric">r{r.number}</span>
          </Link>
          <span className="text-ink/70">{r.message}</span>
          <span className="ml-auto text-xs text-ink/60">
            {r.authorName ?? 'unknown author'} · <DateTime value={r.createdAt} />
          </span>
        </li>
      ))}
    </ul>
  );
}
