'use client';

import { useEffect, useId, useState } from 'react';
import { Button, Notice } from '@/components/ui';
import type { CommentAnchor } from '@/lib/schemas/comments';
import { MAX_COMMENT_LENGTH } from '@/lib/schemas/comments';

export interface CommentDraft {
  body: string;
  anchor: CommentAnchor | null;
  files: File[];
}

type AnchorKind = 'none' | 'line' | 'point';

const inputClass =
  'h-8 rounded border border-hairline bg-white px-2 text-sm font-mono focus:outline-none focus:ring-2 focus:ring-accent';

export interface CommentComposerProps {
  /** true for a reply: no anchor, a shorter box */
  reply?: boolean;
  /** an anchor chosen elsewhere on the page (a picked mask point or script line) */
  anchorDraft?: CommentAnchor | null;
  pending: boolean;
  error?: string | null;
  onSubmit: (draft: CommentDraft) => Promise<boolean>;
  onCancel?: () => void;
}

function readAnchor(kind: AnchorKind, line: string, x: string, y: string): CommentAnchor | null | string {
  if (kind === 'none') return null;
  if (kind === 'line') {
    const n = Number(line);
    return Number.isInteger(n) && n >= 1 ? { line: n } : 'Give the script line as a whole number from 1.';
  }
  const xv = Number(x);
  const yv = Number(y);
  return x.trim() !== '' && y.trim() !== '' && Number.isFinite(xv) && Number.isFinite(yv) ? { x_um: xv, y_um: yv } : 'Give the mask point as two numbers in µm.';
}

/** The box where a comment or reply is written, with its anchor and images. The text is kept until the server has it. */
export function CommentComposer({ reply = false, anchorDraft, pending, error, onSubmit, onCancel }: CommentComposerProps) {
  const id = useId();
  const [body, setBody] = useState('');
  const [kind, setKind] = useState<AnchorKind>('none');
  const [line, setLine] = useState('');
  const [x, setX] = useState('');
  const [y, setY] = useState('');
  const [files, setFiles] = useState<File[]>([]);
  const [problem, setProblem] = useState<string | null>(null);
  const [fileInputKey, setFileInputKey] = useState(0);

  useEffect(() => {
    if (!anchorDraft) return;
    if ('line' in anchorDraft) {
      setKind('line');
      setLine(String(anchorDraft.line));
    } else {
      setKind('point');
      setX(String(Number(anchorDraft.x_um.toPrecision(7))));
      setY(String(Number(anchorDraft.y_um.toPrecision(7))));
    }
  }, [anchorDraft]);

  async function submit() {
    const anchor = readAnchor(kind, line, x, y);
    if (typeof anchor === 'string') return setProblem(anchor);
    if (!body.trim()) return setProblem('Write something first.');
    setProblem(null);
    const saved = await onSubmit({ body, anchor, files });
    if (saved) {
      setBody('');
      setKind('none');
      setFiles([]);
      setFileInputKey((k) => k + 1);
    }
  }

  return (
    <form
      className="flex flex-col gap-2"
      aria-label={reply ? 'Reply' : 'New comment'}
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
    >
      <label htmlFor={`${id}-body`} className="sr-only">
        {reply ? 'Reply' : 'Comment'}
      </label>
      <textarea
        id={`${id}-body`}
        name="body"
        value={body}
        rows={reply ? 2 : 3}
        maxLength={MAX_COMMENT_LENGTH}
        placeholder={reply ? 'Reply…' : 'Comment on this revision. Mention a teammate with @ and the first part of their e-mail address.'}
        onChange={(event) => setBody(event.target.value)}
        onKeyDown={(event) => {
          if (event.key === 'Enter' && (event.metaKey || event.ctrlKey)) void submit();
        }}
        className="rounded border border-hairline bg-white p-2 text-sm focus:outline-none focus:ring-2 focus:ring-accent"
      />
      {!reply ? (
        <fieldset className="flex flex-wrap items-center gap-3 text-sm">
          <legend className="sr-only">Anchor</legend>
          <span className="text-ink/70">Anchor</span>
          {(['none', 'line', 'point'] as const).map((k) => (
            <label key={k} className="inline-flex items-center gap-1">
              <input type="radio" name={`${id}-anchor`} value={k} checked={kind === k} onChange={() => setKind(k)} className="accent-accent" />
              {k === 'none' ? 'none' : k === 'line' ? 'script line' : 'mask point'}
            </label>
          ))}
          {kind === 'line' ? (
            <input aria-label="Line number" inputMode="numeric" value={line} onChange={(e) => setLine(e.target.value)} className={`${inputClass} w-20`} />
          ) : null}
          {kind === 'point' ? (
            <span className="inline-flex items-center gap-1">
              <input aria-label="x (µm)" value={x} onChange={(e) => setX(e.target.value)} className={`${inputClass} w-24`} placeholder="x" />
              <input aria-label="y (µm)" value={y} onChange={(e) => setY(e.target.value)} className={`${inputClass} w-24`} placeholder="y" />
              <span className="text-ink/70">µm</span>
            </span>
          ) : null}
        </fieldset>
      ) : null}
      <div className="flex flex-wrap items-center gap-2">
        <label className="text-sm text-ink/70">
          <span className="sr-only">Attach images</span>
          <input
            key={fileInputKey}
            type="file"
            accept="image/png,image/jpeg"
            multiple
            aria-label="Attach images (PNG or JPEG, up to 10 MB each)"
            onChange={(event) => setFiles(Array.from(event.target.files ?? []))}
            className="text-xs file:mr-2 file:h-7 file:rounded file:border file:border-hairline file:bg-white file:px-2 file:text-xs file:text-ink"
          />
        </label>
        <span className="text-xs text-ink/60">PNG or JPEG, up to 10 MB each</span>
        <span className="flex-1" />
        {onCancel ? (
          <Button tone="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
        <Button type="submit" tone="secondary" disabled={pending}>
          {pending ? 'Posting…' : reply ? 'Reply' : 'Post comment'}
        </Button>
      </div>
      {problem || error ? <Notice tone="error">{problem ?? error}</Notice> : null}
    </form>
  );
}
