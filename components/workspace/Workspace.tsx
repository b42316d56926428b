'use client';

import { useCallback, useState } from 'react';
import { ScriptEditor } from '@/components/script-editor';
import { Button, Notice, TextInput } from '@/components/ui';
import type { Diagnostic } from '@/lib/lang';
import { MAX_MESSAGE_CHARS } from '@/lib/schemas/designs';
import { ApiFailure, callApi, sendJson, type Problem } from './api';
import { BuildProgress } from './BuildProgress';
import { HistoryTable } from './HistoryTable';
import { MaskTab } from './MaskTab';
import { PhaseMapsPanel } from './PhaseMapsPanel';
import { ProcessProfileForm } from './ProcessProfileForm';
import { ReportTab } from './ReportTab';
import { FocusTab } from './FocusTab';
import { Tabs } from './Tabs';
import { useDraft, type DraftState } from './useDraft';
import { usePreview } from './usePreview';
import { usePhaseMapData } from './usePhaseMapData';
import type { PhaseMapRow, RevisionRow, WorkspaceDesign } from './types';

type TabId = 'mask' | 'focus' | 'report' | 'history';

export interface WorkspaceProps {
  design: WorkspaceDesign;
  revisions: RevisionRow[];
  phaseMaps: PhaseMapRow[];
  canEdit: boolean;
  canSave: boolean;
  canUpload: boolean;
}

function draftNote(state: DraftState): { text: string; tone: 'quiet' | 'warning' | 'error' } {
  switch (state.kind) {
    case 'saved':
      return { text: state.at ? `Draft saved ${state.at.toISOString().slice(11, 16)} UTC` : 'Draft up to date', tone: 'quiet' };
    case 'pending':
      return { text: 'Unsaved changes (kept in this browser)', tone: 'quiet' };
    case 'saving':
      return { text: 'Saving draft…', tone: 'quiet' };
    case 'stale':
      return { text: 'Draft not saved: the design changed elsewhere', tone: 'error' };
    case 'error':
      return { text: 'Draft not saved yet; will retry on the next change', tone: 'warning' };
  }
}

export function Workspace({ design, revisions: initialRevisions, phaseMaps: initialMaps, canEdit, canSave, canUpload }: WorkspaceProps) {
  const draft = useDraft(design.id, design.workingScript, design.version, canEdit);
  const [diagnostics, setDiagnostics] = useState<Diagnostic[]>([]);
  const [revisions, setRevisions] = useState(initialRevisions);
  const [phaseMaps, setPhaseMaps] = useState(initialMaps);
  const [profile, setProfile] = useState(design.processProfile);
  const [tab, setTab] = useState<TabId>('mask');
  const [message, setMessage] = useState('');
  const [saving, setSaving] = useState(false);
  const [saveError, setSaveError] = useState<{ message: string; problems: Problem[] } | null>(null);
  const [tracking, setTracking] = useState<string | null>(
    () => initialRevisions.find((r) => r.buildStatus === 'queued' || r.buildStatus === 'running')?.id ?? null,
  );
  const mapData = usePhaseMapData(design.id, phaseMaps);
  const preview = usePreview(
    { script: draft.script, databaseUnit: profile.databaseUnit, minimumFeature: profile.minimumFeature, chordTolerance: profile.chordTolerance },
    mapData,
  );

  const problems = diagnostics.filter((d) => d.severity === 'error');
  const warnings = diagnostics.filter((d) => d.severity === 'warning');
  const note = draftNote(draft.state);

  const refreshRevisions = useCallback(async () => {
    const { revisions: rows } = await callApi<{ revisions: RevisionRow[] }>(`/api/designs/${design.id}/revisions`);
    setRevisions(rows.map((r) => ({ ...r, createdAt: String(r.createdAt) })));
  }, [design.id]);

  const save = async () => {
    setSaving(true);
    setSaveError(null);
    const text = draft.script;
    try {
      const created = await callApi<{ id: string; number: number; designVersion: number | null }>(
        `/api/designs/${design.id}/revisions`,
        sendJson('POST', { script: text, message, baseVersion: draft.version.current }),
      );
      if (created.designVersion !== null) draft.adoptVersion(created.designVersion, text);
      setMessage('');
      setTracking(created.id);
      await refreshRevisions();
    } catch (error) {
      setSaveError(
        error instanceof ApiFailure ? { message: error.message, problems: error.problems } : { message: String(error), problems: [] },
      );
    } finally {
      setSaving(false);
    }
  };

  const retry = async (revisionId: string) => {
    try {
      await callApi(`/api/designs/${design.id}/revisions/${revisionId}/retry`, { method: 'POST' });
      setTracking(revisionId);
      await refreshRevisions();
    } catch (error) {
      setSaveError({ message: error instanceof Error ? error.message : String(error), problems: [] });
    }
  };

  const checkStatus = problems.length === 0 ? 'clean' : `${problems.length} ${problems.length === 1 ? 'problem' : 'problems'}`;

  return (
    <div className="flex flex-col gap-4" data-testid="workspace">
      <div className="flex flex-wrap items-center gap-3 border-b border-hairline pb-3">
        <div className="mr-auto min-w-0 max-w-xl">
          <h1 className="truncate text-lg font-semibold">{design.name}</h1>
          <p className="truncate text-xs text-ink/60" title={design.description}>
            {design.teamName}
            {design.description ? ` · ${design.description}` : ''}
          </p>
        </div>
        <span
          data-testid="check-status"
          className={`rounded border px-2 py-1 text-xs ${problems.length === 0 ? 'border-hairline text-ink' : 'border-error/60 text-error'}`}
          title={warnings.length ? `${warnings.length} warning(s)` : undefined}
        >
          {checkStatus}
          {warnings.length > 0 ? ` · ${warnings.length} warning${warnings.length === 1 ? '' : 's'}` : ''}
        </span>
        <span data-testid="draft-status" className={`text-xs ${note.tone === 'error' ? 'text-error' : note.tone === 'warning' ? 'text-warning' : 'text-ink/60'}`}>
          {note.text}
        </span>
        {canSave ? (
          <form
            className="flex items-center gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              void save();
            }}
          >
            <TextInput
              aria-label="Revision message"
              placeholder="What does this revision change?"
              value={message}
              maxLength={MAX_MESSAGE_CHARS}
              onChange={(e) => setMessage(e.target.value)}
              className="w-72"
            />
            <Button
              tone="primary"
              type="submit"
              className="whitespace-nowrap"
              disabled={saving || problems.length > 0 || message.trim() === ''}
              title={problems.length > 0 ? 'Fix the script problems first' : message.trim() === '' ? 'Write a message first' : undefined}
            >
              {saving ? 'Saving…' : 'Save revision'}
            </Button>
          </form>
        ) : null}
      </div>

      {draft.state.kind === 'stale' ? (
        <Notice tone="error" title="Someone changed this design after you opened it">
          {draft.state.message}
        </Notice>
      ) : null}
      {saveError ? (
        <Notice tone="error" title="The revision was not saved">
          <p>{saveError.message}</p>
          {saveError.problems.length > 0 ? (
            <ul className="mt-1 list-disc pl-5">
              {saveError.problems.map((p, i) => (
                <li key={i}>
                  <span className="numeric">{p.path.replace(/^script:/, 'line ')}</span> {p.message}
                </li>
              ))}
            </ul>
          ) : null}
        </Notice>
      ) : null}
      {tracking ? (
        <BuildProgress
          key={tracking}
          revisionId={tracking}
          onRetry={retry}
          onSettled={() => {
            void refreshRevisions();
          }}
        />
      ) : null}

      <div className="grid min-h-[640px] grid-cols-1 gap-4 xl:grid-cols-2">
        <div className="flex min-w-0 flex-col gap-3">
          <ScriptEditor value={draft.script} onChange={draft.setScript} onDiagnostics={setDiagnostics} readOnly={!canEdit} height={560} />
          <PhaseMapsPanel designId={design.id} maps={phaseMaps} canUpload={canUpload} onUploaded={setPhaseMaps} />
        </div>
        <div className="min-w-0">
          <Tabs<TabId>
            label="Design views"
            active={tab}
            onChange={setTab}
            tabs={[
              { id: 'mask', label: 'Mask' },
              { id: 'focus', label: 'Focus check' },
              { id: 'report', label: 'Report', badge: preview.figures && preview.figures.warnings.length > 0 ? <WarningBadge n={preview.figures.warnings.length} /> : undefined },
              { id: 'history', label: 'History', badge: <span className="numeric text-xs text-ink/60">{revisions.length}</span> },
            ]}
            panels={{
              mask: <MaskTab preview={preview} profile={profile} />,
              focus: <FocusTab revisions={revisions} />,
              report: (
                <div className="flex flex-col gap-6">
                  <ReportTab preview={preview} profile={profile} />
                  <ProcessProfileForm designId={design.id} design={design} draftVersion={draft.version} profile={profile} onSaved={setProfile} canEdit={canEdit} />
                </div>
              ),
              history: <HistoryTable rows={revisions} onRetry={canSave ? retry : undefined} />,
            }}
          />
        </div>
      </div>
    </div>
  );
}

function WarningBadge({ n }: { n: number }) {
  return (
    <span className="numeric rounded border border-warning/60 px-1 text-xs text-warning" title={`${n} manufacturability warning(s)`}>
      {n}
    </span>
  );
}
