'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiFailure, callApi, sendJson } from './api';

export type DraftState =
  | { kind: 'saved'; at: Date | null }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'stale'; message: string }
  | { kind: 'error'; message: string };

const AUTOSAVE_MS = 1200;

/**
 * The working script: kept in the tab, saved to the design a moment after typing stops, and in
 * localStorage on every change so a closed tab or a lost connection loses nothing. A save from a
 * page older than the design is refused by the server; the text stays here and autosave stops.
 */
export function useDraft(designId: string, initialScript: string, initialVersion: number, canEdit: boolean) {
  const storageKey = `zw-draft:${designId}`;
  const [script, setScriptState] = useState(initialScript);
  const [state, setState] = useState<DraftState>({ kind: 'saved', at: null });
  const version = useRef(initialVersion);
  const latest = useRef(initialScript);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  // Once the server says the design moved on, nothing more is sent from this page.
  const stale = useRef(false);

  // Text typed earlier in this browser but never saved (e.g. the tab closed) comes back.
  useEffect(() => {
    const kept = window.localStorage.getItem(storageKey);
    if (!kept) return;
    try {
      const { text, baseVersion } = JSON.parse(kept) as { text: string; baseVersion: number };
      if (text !== initialScript && baseVersion === initialVersion) {
        latest.current = text;
        setScriptState(text);
        setState({ kind: 'pending' });
      } else {
        window.localStorage.removeItem(storageKey);
      }
    } catch {
      window.localStorage.removeItem(storageKey);
    }
  }, [storageKey, initialScript, initialVersion]);

  const flush = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const text = latest.current;
    setState({ kind: 'saving' });
    try {
      const result = await callApi<{ version: number }>(`/api/designs/${designId}/draft`, sendJson('PUT', { script: text, baseVersion: version.current }));
      version.current = result.version;
      if (latest.current === text) {
        window.localStorage.removeItem(storageKey);
        setState({ kind: 'saved', at: new Date() });
      } else {
        setState({ kind: 'pending' });
      }
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      if (error instanceof ApiFailure && error.status === 409) {
        stale.current = true;
        setState({ kind: 'stale', message });
      } else {
        setState({ kind: 'error', message });
      }
    }
  }, [designId, storageKey]);

  const setScript = useCallback(
    (text: string) => {
      latest.current = text;
      setScriptState(text);
      if (!canEdit) return;
      window.localStorage.setItem(storageKey, JSON.stringify({ text, baseVersion: version.current }));
      setState((s) => (s.kind === 'stale' ? s : { kind: 'pending' }));
      if (timer.current) clearTimeout(timer.current);
      if (stale.current) return;
      timer.current = setTimeout(() => void flush(), AUTOSAVE_MS);
    },
    [canEdit, flush, storageKey],
  );

  // Leaving with unsaved text asks first.
  useEffect(() => {
    const warn = (e: BeforeUnloadEvent) => {
      if (state.kind === 'pending' || state.kind === 'saving' || state.kind === 'stale') e.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [state.kind]);

  /** After a revision save that also stored the draft. */
  const adoptVersion = useCallback(
    (next: number, savedText: string) => {
      version.current = next;
      if (latest.current === savedText) {
        window.localStorage.removeItem(storageKey);
        setState({ kind: 'saved', at: new Date() });
      }
    },
    [storageKey],
  );

  return { script, setScript, state, version, flush, adoptVersion };
}
