import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { getRevisionForUser, listRevisions } from '@/db/queries/revisions';
import { allows, pageUser } from '@/app/_server/session';
import { ChangeTable } from '@/components/compare/ChangeTable';
import { GeometryPanel } from '@/components/compare/GeometryPanel';
import { ReportTable } from '@/components/compare/ReportTable';
import { RevisionPicker } from '@/components/compare/RevisionPicker';
import { ScriptDiff } from '@/components/compare/ScriptDiff';
import { Notice, PageHeader, Panel, Tag } from '@/components/ui';
import { compareQuerySchema } from '@/lib/schemas/review';
import { diffParameters } from '@/lib/workflow/parameter-diff';
import { STATE_LABELS, isRevisionState } from '@/lib/workflow/states';

export const metadata: Metadata = { title: 'Compare' };
export const dynamic = 'force-dynamic';

type Search = Record<string, string | string[] | undefined>;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

function stateText(state: string): string {
  return isRevisionState(state) ? STATE_LABELS[state] : state;
}

export default async function ComparePage({ searchParams }: { searchParams: Promise<Search> }) {
  const search = await searchParams;
  const query = { a: first(search.a) ?? '', b: first(search.b) ?? '' };
  const user = await pageUser(`/compare?a=${encodeURIComponent(query.a)}&b=${encodeURIComponent(query.b)}`);
  // "/compare?b=<revision>" compares a revision with the one saved before it
  if (!query.a && UUID.test(query.b)) {
    const found = await getRevisionForUser(query.b, user.id);
    if (found?.role) {
      const previous = (await listRevisions(found.revision.designId)).find((r) => r.number < found.revision.number);
      if (previous) redirect(`/compare?a=${previous.id}&b=${found.revision.id}`);
      return (
        <div className="mx-auto max-w-3xl">
          <PageHeader title="Compare" />
          <Notice tone="info">Revision {found.revision.number} of {found.designName} is its first revision; there is nothing earlier to compare it with.</Notice>
        </div>
      );
    }
  }
  const parsed = compareQuerySchema.safeParse(query);
  if (!parsed.success) {
    return (
      <div className="mx-auto max-w-3xl">
        <PageHeader title="Compare" lead="Two revisions side by side: script, parameters, geometry and manufacturability." />
        <Notice tone="info" title="Choose two revisions">
          Open Compare from a design&apos;s History or a revision page, or give two revision ids as <code>/compare?a=…&amp;b=…</code>.{' '}
          {parsed.error.issues.map((i) => i.message).join(' ')}
        </Notice>
      </div>
    );
  }
  const [foundA, foundB] = await Promise.all([getRevisionForUser(parsed.data.a, user.id), getRevisionForUser(parsed.data.b, user.id)]);
  const visible = (f: typeof foundA) => f && f.role && allows({ userId: user.id, role: f.role }, 'revision.view');
  if (!visible(foundA) || !visible(foundB) || !foundA || !foundB) {
    return (
      <div className="mx-auto max-w-3xl">
        <PageHeader title="Compare" />
        <Notice tone="error">One of these revisions does not exist, or belongs to a team you are not in.</Notice>
      </div>
    );
  }
  const a = foundA.revision;
  const b = foundB.revision;
  const sameDesign = a.designId === b.designId;
  const labelA = `A · revision ${a.number}`;
  const labelB = `B · revision ${b.number}`;
  const siblings = await listRevisions(b.designId);
  const pickable = sameDesign ? siblings : [...siblings, a];
  const parameterRows = diffParameters(
    { ...(a.parameters ?? {}), process: a.processProfile },
    { ...(b.parameters ?? {}), process: b.processProfile },
  );

  return (
    <div className="mx-auto flex max-w-7xl flex-col gap-4" data-testid="compare-page">
      <PageHeader
        title="Compare"
        lead={
          sameDesign
            ? `${foundB.designName}: revision ${a.number} and revision ${b.number}`
            : `${foundA.designName} revision ${a.number} and ${foundB.designName} revision ${b.number}`
        }
      />
      <RevisionPicker revisions={pickable.map((r) => ({ id: r.id, number: r.number, message: r.message, state: r.state }))} a={a.id} b={b.id} />
      <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
        {[
          { label: labelA, r: a, design: foundA.designName },
          { label: labelB, r: b, design: foundB.designName },
        ].map(({ label, r, design }) => (
          <div key={label} className="rounded border border-hairline bg-white px-4 py-2 text-sm">
            <p className="font-medium">
              {label} <Tag>{stateText(r.state)}</Tag>
            </p>
            <p className="text-ink/70">
              {design} · {r.message || 'no message'} · {r.authorName ?? 'unknown author'} ·{' '}
              <Link href={`/revisions/${r.id}`}>open revision</Link>
            </p>
          </div>
        ))}
      </div>
      <Panel title="Script">
        <ScriptDiff original={a.source} modified={b.source} />
      </Panel>
      <Panel title="Parameters">
        <ChangeTable rows={parameterRows} labelA={labelA} labelB={labelB} empty="Neither revision has recorded parameters yet (their exports have not finished)." />
      </Panel>
      <Panel title="Geometry difference (XOR per layer)">
        <GeometryPanel a={a.id} b={b.id} />
      </Panel>
      <Panel title="Manufacturability">
        <ReportTable
          a={{ zoneCount: a.zoneCount, narrowestFeature: a.narrowestFeature, bundleBytes: a.bundleBytes, report: a.report }}
          b={{ zoneCount: b.zoneCount, narrowestFeature: b.narrowestFeature, bundleBytes: b.bundleBytes, report: b.report }}
          labelA={labelA}
          labelB={labelB}
        />
      </Panel>
    </div>
  );
}
