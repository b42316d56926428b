'use client';

import dynamic from 'next/dynamic';
import type { ScriptDiffEditorProps, ScriptEditorProps } from './types';

// Monaco touches the DOM when it loads, so it is only ever loaded in the browser.
const placeholder = () => <div className="rounded border border-hairline p-3 font-mono text-sm text-ink/60">Loading the editor…</div>;

const MonacoScriptEditor = dynamic(() => import('./MonacoScriptEditor'), { ssr: false, loading: placeholder });
const MonacoDiffEditor = dynamic(() => import('./MonacoDiffEditor'), { ssr: false, loading: placeholder });

/** The script editor: highlighting, live diagnostics as markers, completion and hover for the phase-profile language. */
export function ScriptEditor(props: ScriptEditorProps) {
  return <MonacoScriptEditor {...props} />;
}

/** Side-by-side, read-only comparison of two scripts (for the Compare page). */
export function ScriptDiffEditor(props: ScriptDiffEditorProps) {
  return <MonacoDiffEditor {...props} />;
}
