'use client';

import { useState } from 'react';
import { Button, Field, Notice, Select, TextInput, controlClass } from '@/components/ui';
import { ApiFailure, callApi } from '@/components/workspace/api';
import { DOSE_UNITS, MAX_PHOTOS_PER_RUN, fabRunSchema } from '@/lib/schemas/fab';

/** The run record: date, tool, dose, focus, resist and thickness, notes, inspection photos. */
export function RunForm({ revisionId, onRecorded, onCancel }: { revisionId: string; onRecorded: () => void; onCancel: () => void }) {
  const [busy, setBusy] = useState(false);
  const [problems, setProblems] = useState<{ title: string; items: string[] } | null>(null);
  const today = new Date().toISOString().slice(0, 10);

  const submit = async (form: HTMLFormElement) => {
    const data = new FormData(form);
    const fields = Object.fromEntries([...data.entries()].filter(([, v]) => typeof v === 'string'));
    const checked = fabRunSchema.safeParse(fields);
    const photos = data.getAll('photo').filter((f): f is File => typeof f !== 'string' && f.size > 0);
    const local = [
      ...(checked.success ? [] : checked.error.issues.map((i) => i.message)),
      ...(photos.length > MAX_PHOTOS_PER_RUN ? [`At most ${MAX_PHOTOS_PER_RUN} photos per run.`] : []),
    ];
    if (local.length > 0) {
      setProblems({ title: 'The run has problems', items: local });
      return;
    }
    data.set('revisionId', revisionId);
    setBusy(true);
    setProblems(null);
    try {
      await callApi(`/api/fab/runs`, { method: 'POST', body: data });
      onRecorded();
    } catch (e) {
      setProblems(e instanceof ApiFailure ? { title: e.message, items: e.problems.map((p) => p.message) } : { title: String(e), items: [] });
    } finally {
      setBusy(false);
    }
  };

  return (
    <form
      aria-label="Record a run"
      className="grid grid-cols-2 gap-3 rounded border border-hairline p-3 md:grid-cols-4"
      onSubmit={(e) => {
        e.preventDefault();
        void submit(e.currentTarget);
      }}
    >
      <Field label="Run date">{(p) => <TextInput {...p} name="runDate" type="date" defaultValue={today} required />}</Field>
      <Field label="Tool">{(p) => <TextInput {...p} name="tool" placeholder="e.g. mask aligner 2" required />}</Field>
      <Field label="Dose">{(p) => <TextInput {...p} name="dose" inputMode="decimal" required />}</Field>
      <Field label="Dose unit">
        {(p) => (
          <Select {...p} name="doseUnit" defaultValue={DOSE_UNITS[0]}>
            {DOSE_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Focus offset (µm)">{(p) => <TextInput {...p} name="focus" inputMode="decimal" defaultValue="0" required />}</Field>
      <Field label="Resist">{(p) => <TextInput {...p} name="resist" required />}</Field>
      <Field label="Resist thickness (µm)">{(p) => <TextInput {...p} name="resistThickness" inputMode="decimal" required />}</Field>
      <Field label="Inspection photos" hint={`PNG or JPEG, up to 10 MB each, at most ${MAX_PHOTOS_PER_RUN}`}>
        {(p) => <input {...p} name="photo" type="file" multiple accept="image/png,image/jpeg" className="text-sm" />}
      </Field>
      <div className="col-span-2 md:col-span-4">
        <Field label="Notes">{(p) => <textarea {...p} name="notes" rows={3} className={`${controlClass} h-auto py-1`} />}</Field>
      </div>
      {problems ? (
        <div className="col-span-2 md:col-span-4">
          <Notice tone="error" title={problems.title}>
            {problems.items.length > 0 ? (
              <ul className="list-disc pl-5">
                {problems.items.map((m, i) => (
                  <li key={i}>{m}</li>
                ))}
              </ul>
            ) : null}
          </Notice>
        </div>
      ) : null}
      <div className="col-span-2 flex gap-2 md:col-span-4">
        <Button tone="primary" type="submit" disabled={busy}>
          {busy ? 'Recording…' : 'Record run'}
        </Button>
        <Button onClick={onCancel} disabled={busy}>
          Cancel
        </Button>
      </div>
      <p className="col-span-2 text-xs text-ink/60 md:col-span-4">Recording the first run marks the revision fabricated.</p>
    </form>
  );
}
