import type { Diagnostic } from '@/lib/lang';

export interface ScriptEditorProps {
  value: string;
  onChange: (value: string) => void;
  /** called with every fresh check result (debounced, computed off the typing path) */
  onDiagnostics?: (diagnostics: Diagnostic[]) => void;
  readOnly?: boolean;
  /** pixels, or any CSS height */
  height?: number | string;
}

export interface ScriptDiffEditorProps {
  original: string;
  modified: string;
  height?: number | string;
}
