'use client';

import Editor, { type OnMount } from '@monaco-editor/react';
import { useEffect, useRef } from 'react';
import type { Diagnostic } from '@/lib/lang';
import { CheckerClient } from './checker-client';
import { LANGUAGE_ID, THEME_ID, setUpMonaco, typesByModel } from './monaco-setup';
import type { ScriptEditorProps } from './types';
import { EDITOR_OPTIONS } from './options';

const monaco = setUpMonaco();

function toMarker(d: Diagnostic): import('monaco-editor').editor.IMarkerData {
  const sameSpot = d.start.line === d.end.line && d.start.column === d.end.column;
  return {
    severity: d.severity === 'error' ? monaco.MarkerSeverity.Error : monaco.MarkerSeverity.Warning,
    message: d.hint ? `${d.message}\nhint: ${d.hint}` : d.message,
    startLineNumber: d.start.line,
    startColumn: d.start.column,
    endLineNumber: d.end.line,
    // a zero-width problem (e.g. a missing declaration) still gets a visible squiggle
    endColumn: sameSpot ? d.end.column + 1 : d.end.column,
    source: 'zw check',
  };
}

export default function MonacoScriptEditor({ value, onChange, onDiagnostics, readOnly = false, height = 480 }: ScriptEditorProps) {
  const editorRef = useRef<Parameters<OnMount>[0] | null>(null);
  const checker = useRef<CheckerClient | null>(null);
  const onDiagnosticsRef = useRef(onDiagnostics);
  onDiagnosticsRef.current = onDiagnostics;

  useEffect(() => {
    checker.current = new CheckerClient(({ diagnostics, types }) => {
      const model = editorRef.current?.getModel();
      if (!model) return;
      typesByModel.set(model.uri.toString(), types);
      monaco.editor.setModelMarkers(model, LANGUAGE_ID, diagnostics.map(toMarker));
      onDiagnosticsRef.current?.(diagnostics);
    });
    return () => {
      checker.current?.dispose();
      checker.current = null;
    };
  }, []);

  useEffect(() => {
    checker.current?.check(value);
  }, [value]);

  const handleMount: OnMount = (editor) => {
    editorRef.current = editor;
    checker.current?.check(editor.getValue(), 0);
    editor.onDidDispose(() => {
      const uri = editor.getModel()?.uri.toString();
      if (uri) typesByModel.delete(uri);
    });
  };

  return (
    <div className="overflow-hidden rounded border border-hairline" data-testid="script-editor">
      <Editor
        height={height}
        language={LANGUAGE_ID}
        theme={THEME_ID}
        value={value}
        onChange={(v) => onChange(v ?? '')}
        onMount={handleMount}
        options={{ ...EDITOR_OPTIONS, readOnly }}
        loading={<EditorPlaceholder />}
      />
    </div>
  );
}

export function EditorPlaceholder() {
  return <div className="p-3 font-mono text-sm text-ink/60">Loading the editor…</div>;
}
