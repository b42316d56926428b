'use client';

import { useState, type MutableRefObject } from 'react';
import { Button, Field, Notice, Select, TextInput, controlClass } from '@/components/ui';
import { LAYER_PURPOSES, processProfileSchema, type ProcessProfile } from '@/lib/schemas/designs';
import { ApiFailure, callApi, sendJson } from './api';
import type { WorkspaceDesign } from './types';

type Draft = Record<'minimumFeature' | 'databaseUnit' | 'chordTolerance', string> & Omit<ProcessProfile, 'minimumFeature' | 'databaseUnit' | 'chordTolerance'>;

function toDraft(p: ProcessProfile): Draft {
  return { ...p, minimumFeature: String(p.minimumFeature), databaseUnit: String(p.databaseUnit), chordTolerance: String(p.chordTolerance) };
}

/** The design's process profile: grid, tolerances, layer map, resist tone and notes for the fab. */
export function ProcessProfileForm({
  designId,
  design,
  draftVersion,
  profile,
  onSaved,
  canEdit,
}: {
  designId: string;
  design: WorkspaceDesign;
  /** the design version this page holds; shared with the draft autosave */
  draftVersion: MutableRefObject<number>;
  profile: ProcessProfile;
  onSaved: (p: ProcessProfile) => void;
  canEdit: boolean;
}) {
  const [draft, setDraft] = useState<Draft>(() => toDraft(profile));
  const [problems, setProblems] = useState<string[]>([]);
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    setStatus(null);
    const parsed = processProfileSchema.safeParse({
      ...draft,
      minimumFeature: Number(draft.minimumFeature),
      databaseUnit: Number(draft.databaseUnit),
      chordTolerance: Number(draft.chordTolerance),
    });
    if (!parsed.success) {
      setProblems(parsed.error.issues.map((i) => i.message));
      return;
    }
    setProblems([]);
    setBusy(true);
    try {
      const result = await callApi<{ version: number }>(
        `/api/designs/${designId}`,
        sendJson('PATCH', { baseVersion: draftVersion.current, name: design.name, description: design.description, processProfile: parsed.data }),
      );
      draftVersion.current = result.version;
      onSaved(parsed.data);
      setStatus('Process profile saved. New revisions use it.');
    } catch (e) {
      setProblems([e instanceof ApiFailure ? e.message : String(e), ...(e instanceof ApiFailure ? e.problems.map((p) => p.message) : [])]);
    } finally {
      setBusy(false);
    }
  };

  const setLayer = (index: number, patch: Partial<ProcessProfile['layerMap'][number]>) =>
    setDraft((d) => ({ ...d, layerMap: d.layerMap.map((l, i) => (i === index ? { ...l, ...patch } : l)) }));

  return (
    <section className="flex flex-col gap-3" data-testid="process-profile">
      <h2 className="text-sm font-semibold">Process profile</h2>
      <fieldset disabled={!canEdit || busy} className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Field label="Minimum feature (µm)">{(p) => <TextInput {...p} inputMode="decimal" value={draft.minimumFeature} onChange={(e) => setDraft({ ...draft, minimumFeature: e.target.value })} />}</Field>
        <Field label="Database unit (µm)">{(p) => <TextInput {...p} inputMode="decimal" value={draft.databaseUnit} onChange={(e) => setDraft({ ...draft, databaseUnit: e.target.value })} />}</Field>
        <Field label="Chord tolerance (µm)">{(p) => <TextInput {...p} inputMode="decimal" value={draft.chordTolerance} onChange={(e) => setDraft({ ...draft, chordTolerance: e.target.value })} />}</Field>
        <Field label="Resist tone">
          {(p) => (
            <Select {...p} value={draft.tone} onChange={(e) => setDraft({ ...draft, tone: e.target.value as ProcessProfile['tone'] })}>
              <option value="positive">positive</option>
              <option value="negative">negative</option>
            </Select>
          )}
        </Field>
      </fieldset>
      <fieldset disabled={!canEdit || busy}>
        <legend className="mb-1 text-sm font-medium">Layer map</legend>
        <p className="mb-1 text-xs text-ink/60">The layers this process expects. Each bundle’s manifest lists the layers as written, which the fab queue shows.</p>
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-ink/60">
            <tr>
              <th className="font-medium">Purpose</th>
              <th className="font-medium">Name</th>
              <th className="font-medium">Layer</th>
              <th className="font-medium">Datatype</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {draft.layerMap.map((l, i) => (
              <tr key={i}>
                <td className="pr-2">
                  <select aria-label={`Purpose of row ${i + 1}`} className={controlClass} value={l.purpose} onChange={(e) => setLayer(i, { purpose: e.target.value as (typeof LAYER_PURPOSES)[number] })}>
                    {LAYER_PURPOSES.map((p) => (
                      <option key={p} value={p}>
                        {p}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="pr-2">
                  <input aria-label={`Name of row ${i + 1}`} className={controlClass} value={l.name} onChange={(e) => setLayer(i, { name: e.target.value })} />
                </td>
                <td className="pr-2">
                  <input aria-label={`Layer of row ${i + 1}`} className={`${controlClass} numeric`} inputMode="numeric" value={l.layer} onChange={(e) => setLayer(i, { layer: Number(e.target.value) })} />
                </td>
                <td className="pr-2">
                  <input aria-label={`Datatype of row ${i + 1}`} className={`${controlClass} numeric`} inputMode="numeric" value={l.datatype} onChange={(e) => setLayer(i, { datatype: Number(e.target.value) })} />
                </td>
                <td>
                  <Button tone="quiet" aria-label={`Remove row ${i + 1}`} onClick={() => setDraft({ ...draft, layerMap: draft.layerMap.filter((_, j) => j !== i) })}>
                    ×
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <Button tone="quiet" className="mt-1" onClick={() => setDraft({ ...draft, layerMap: [...draft.layerMap, { purpose: 'marker', name: 'marker', layer: 63, datatype: 0 }] })}>
          Add a layer
        </Button>
      </fieldset>
      <Field label="Process notes for the fab" hint="Shown in the fab queue beside the bundle">
        {(p) => (
          <textarea
            {...p}
            disabled={!canEdit || busy}
            rows={3}
            className={`${controlClass} h-auto py-1`}
            value={draft.processNotes}
            onChange={(e) => setDraft({ ...draft, processNotes: e.target.value })}
          />
        )}
      </Field>
      {problems.length > 0 ? (
        <Notice tone="error" title="The profile was not saved">
          <ul className="list-disc pl-5">
            {problems.map((m, i) => (
              <li key={i}>{m}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      {status ? <Notice tone="success">{status}</Notice> : null}
      {canEdit ? (
        <div>
          <Button onClick={() => void submit()} disabled={busy}>
            Save process profile
          </Button>
        </div>
      ) : null}
    </section>
  );
}
