import type { Metadata } from 'next';
import { Notice, PageHeader, Panel } from '@/components/ui';
import { allows, pageMembership } from '@/app/_server/session';
import { NewDesignForm } from './NewDesignForm';

export const metadata: Metadata = { title: 'New design' };
export const dynamic = 'force-dynamic';

export default async function NewDesignPage() {
  const { membership } = await pageMembership('/desk/new');
  if (!membership || !allows(membership.actor, 'design.create')) {
    return (
      <div className="mx-auto max-w-xl">
        <PageHeader title="New design" />
        <Notice tone="warning">Only owners and designers start designs. Ask an owner if you need that role.</Notice>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-xl">
      <PageHeader title="New design" lead={`In ${membership.team.name}. The process profile starts from the team defaults; change it in the workspace.`} />
      <Panel>
        <NewDesignForm teamId={membership.team.id} />
      </Panel>
    </div>
  );
}
