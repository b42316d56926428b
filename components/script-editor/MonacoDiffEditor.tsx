'use client';

import { DiffEditor } from '@monaco-editor/react';
import { LANGUAGE_ID, THEME_ID, setUpMonaco } from './monaco-setup';
import { EditorPlaceholder } from './MonacoScriptEditor';
import { EDITOR_OPTIONS } from './options';
import type { ScriptDiffEditorProps } from './types';

setUpMonaco();

export default function MonacoDiffEditor({ original, modified, height = 420 }: ScriptDiffEditorProps) {
  return (
    <div className="overflow-hidden rounded border border-hairline" data-testid="script-diff-editor">
      <DiffEditor
        height={height}
        language={LANGUAGE_ID}
        theme={THEME_ID}
        original={original}
        modified={modified}
        options={{ ...EDITOR_OPTIONS, readOnly: true, renderSideBySide: true, originalEditable: false }}
        loading={<EditorPlaceholder />}
      />
    </div>
  );
}
