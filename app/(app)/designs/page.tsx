import type { Metadata } from 'next';
import Link from 'next/link';
import { DesignNameCell } from '@/components/designs/DesignNameCell';
import { listDesignsForUser, teamsWithRole } from '@/db/queries/designs';
import { pageUser } from '@/app/_server/session';
import { ExampleStarter } from '@/components/designs/ExampleStarter';
import { listExamples } from '@/components/designs/examples';
import { DateTime, PageHeader, Panel, buttonClass } from '@/components/ui';
import { ROLE_LABELS, TEAM_ROLES, can } from '@/lib/auth';

export const metadata: Metadata = { title: 'Designs' };
export const dynamic = 'force-dynamic';

export default async function DesignsPage() {
  const user = await pageUser('/designs');
  const creatorRoles = TEAM_ROLES.filter((role) => can({ userId: user.id, role }, 'design.create'));
  const [designs, teams, examples] = await Promise.all([listDesignsForUser(user.id), teamsWithRole(user.id, creatorRoles), listExamples()]);
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-6">
      <PageHeader
        title="Designs"
        lead="Every design in your teams."
        actions={
          teams.length > 0 ? (
            <Link href="/desk/new" className={buttonClass('primary', 'no-underline')}>
              New design
            </Link>
          ) : null
        }
      />
      <Panel title={`Designs (${designs.length})`}>
        {designs.length === 0 ? (
          <p className="text-ink/70">No designs yet.</p>
        ) : (
          <table className="w-full text-left text-sm">
            <thead className="text-xs text-ink/60">
              <tr className="border-b border-hairline">
                <th className="py-1 pr-4 font-medium">Design</th>
                <th className="py-1 pr-4 font-medium">Team</th>
                <th className="py-1 pr-4 text-right font-medium">Revisions</th>
                <th className="py-1 font-medium">Last change</th>
              </tr>
            </thead>
            <tbody>
              {designs.map((d) => (
                <tr key={d.id} className="border-b border-hairline last:border-0">
                  <DesignNameCell design={d} />
                  <td className="py-2 pr-4">
                    {d.teamName} <span className="text-xs text-ink/60">({ROLE_LABELS[d.role].toLowerCase()})</span>
                  </td>
                  <td className="numeric py-2 pr-4 text-right">{d.revisionCount}</td>
                  <td className="py-2 text-xs">
                    <DateTime value={d.updatedAt} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
      {teams.length > 0 ? (
        <Panel title="Start from an example">
          <ExampleStarter examples={examples} teams={teams} />
        </Panel>
      ) : null}
    </div>
  );
}
