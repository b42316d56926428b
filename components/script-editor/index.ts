export { ScriptEditor, ScriptDiffEditor } from './ScriptEditor';
export type { ScriptEditorProps, ScriptDiffEditorProps } from './types';
