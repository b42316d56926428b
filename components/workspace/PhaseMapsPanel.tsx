'use client';

import { useRef, useState } from 'react';
import { Button, Field, Notice, Select, TextInput } from '@/components/ui';
import { formatLength } from '@/components/mask-view/viewport';
import { MAX_PHASE_MAP_BYTES } from '@/lib/schemas/designs';
import { ApiFailure, callApi } from './api';
import { formatBytes } from './history';
import type { PhaseMapRow } from './types';

/** The design's uploaded phase maps, and the upload form (16-bit grayscale PNG or CSV grid). */
export function PhaseMapsPanel({
  designId,
  maps,
  canUpload,
  onUploaded,
}: {
  designId: string;
  maps: PhaseMapRow[];
  canUpload: boolean;
  onUploaded: (maps: PhaseMapRow[]) => void;
}) {
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; details: string[] } | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const form = useRef<HTMLFormElement>(null);

  const upload = async (data: FormData) => {
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      const result = await callApi<{ maps: PhaseMapRow[]; name: string }>(`/api/designs/${designId}/phase-maps`, { method: 'POST', body: data });
      onUploaded(result.maps);
      setDone(`Phase map “${result.name}” stored; use it in the script by that name.`);
      form.current?.reset();
    } catch (e) {
      setError(e instanceof ApiFailure ? { message: e.message, details: e.problems.map((p) => p.message) } : { message: String(e), details: [] });
    } finally {
      setBusy(false);
    }
  };

  return (
    <section className="rounded border border-hairline bg-white" data-testid="phase-maps">
      <header className="flex items-center justify-between border-b border-hairline px-3 py-2">
        <h2 className="text-sm font-semibold">Phase maps ({maps.length})</h2>
        {canUpload ? (
          <Button tone="quiet" onClick={() => setOpen((o) => !o)} aria-expanded={open}>
            {open ? 'Close' : 'Upload a phase map'}
          </Button>
        ) : null}
      </header>
      <div className="flex flex-col gap-3 p-3">
        {maps.length === 0 ? (
          <p className="text-xs text-ink/60">None. A phase map computed elsewhere (an iterative hologram, a measured wavefront) can be uploaded and sampled by name from the script.</p>
        ) : (
          <table className="w-full text-left text-xs">
            <thead className="text-ink/60">
              <tr>
                <th className="font-medium">Name</th>
                <th className="font-medium">Format</th>
                <th className="text-right font-medium">Samples</th>
                <th className="text-right font-medium">Pitch</th>
                <th className="text-right font-medium">Phase scale</th>
                <th className="text-right font-medium">File</th>
              </tr>
            </thead>
            <tbody>
              {maps.map((m) => (
                <tr key={m.id} className="border-t border-hairline">
                  <td className="font-mono">{m.name}</td>
                  <td>{m.format === 'png16' ? '16-bit PNG' : 'CSV'}</td>
                  <td className="numeric text-right">
                    {m.columns} × {m.rows}
                  </td>
                  <td className="numeric text-right">{formatLength(m.pitch)}</td>
                  <td className="numeric text-right">{m.phaseScale} rad</td>
                  <td className="numeric text-right">{formatBytes(m.bytes)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {done ? <Notice tone="success">{done}</Notice> : null}
        {error ? (
          <Notice tone="error" title="The phase map was not stored">
            <p>{error.message}</p>
            {error.details.length > 0 ? (
              <ul className="list-disc pl-5">
                {error.details.map((d, i) => (
                  <li key={i}>{d}</li>
                ))}
              </ul>
            ) : null}
          </Notice>
        ) : null}
        {open && canUpload ? (
          <form
            ref={form}
            className="grid grid-cols-2 gap-3"
            onSubmit={(e) => {
              e.preventDefault();
              void upload(new FormData(e.currentTarget));
            }}
          >
            <Field label="Name in the script" hint={'Letters, digits, _ and -; used as phase_map("name")'}>
              {(p) => <TextInput {...p} name="name" required pattern="[A-Za-z_][A-Za-z0-9_\-]{0,63}" />}
            </Field>
            <Field label="Format">
              {(p) => (
                <Select {...p} name="format" defaultValue="png16">
                  <option value="png16">16-bit grayscale PNG</option>
                  <option value="csv">CSV grid of numbers</option>
                </Select>
              )}
            </Field>
            <Field label="Pitch (µm)" hint="Spacing of the samples">
              {(p) => <TextInput {...p} name="pitch" inputMode="decimal" required defaultValue="1" />}
            </Field>
            <Field label="Phase scale (rad)" hint="PNG: phase at the full 16-bit value; CSV: radians per unit">
              {(p) => <TextInput {...p} name="phaseScale" inputMode="decimal" required defaultValue="6.283185307179586" />}
            </Field>
            <div className="col-span-2">
              <Field label="File" hint={`At most ${formatBytes(MAX_PHASE_MAP_BYTES)}`}>
                {(p) => <input {...p} type="file" name="file" required accept=".png,.csv,image/png,text/csv" className="text-sm" />}
              </Field>
            </div>
            <div className="col-span-2">
              <Button type="submit" disabled={busy}>
                {busy ? 'Checking…' : 'Upload'}
              </Button>
            </div>
          </form>
        ) : null}
      </div>
    </section>
  );
}
