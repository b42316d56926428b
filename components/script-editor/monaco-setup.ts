import { loader } from '@monaco-editor/react';
import * as monaco from 'monaco-editor/esm/vs/editor/edcore.main';
import { BUILTINS, DECLARATIONS, UNITS } from '@/lib/lang';
import type { CompletionEntry } from '@/lib/lang/assist';
import { completionsAt, hoverAt } from '@/lib/lang/assist';
import type { TypeNote } from '@/lib/lang';

export const LANGUAGE_ID = 'zonewright';
export const THEME_ID = 'zonewright-paper';

/** The latest expression types of each model, for hovers (keyed by model URI). */
export const typesByModel = new Map<string, TypeNote[]>();

const COMPLETION_KINDS: Record<CompletionEntry['kind'], monaco.languages.CompletionItemKind> = {
  function: monaco.languages.CompletionItemKind.Function,
  constant: monaco.languages.CompletionItemKind.Constant,
  keyword: monaco.languages.CompletionItemKind.Keyword,
  unit: monaco.languages.CompletionItemKind.Unit,
  variable: monaco.languages.CompletionItemKind.Variable,
  parameter: monaco.languages.CompletionItemKind.Property,
  option: monaco.languages.CompletionItemKind.EnumMember,
};

let ready = false;

/** Registers the language, its colours and its helpers once, and points the loader at this bundled Monaco (no CDN). */
export function setUpMonaco(): typeof monaco {
  if (ready) return monaco;
  ready = true;
  (self as unknown as { MonacoEnvironment: monaco.Environment }).MonacoEnvironment = {
    getWorker: () => new Worker(new URL('monaco-editor/esm/vs/editor/editor.worker', import.meta.url), { type: 'module' }),
  };
  loader.config({ monaco });

  monaco.languages.register({ id: LANGUAGE_ID, extensions: ['.zw'] });
  monaco.languages.setLanguageConfiguration(LANGUAGE_ID, {
    comments: { lineComment: '#' },
    brackets: [['(', ')']],
    autoClosingPairs: [
      { open: '(', close: ')' },
      { open: '"', close: '"' },
    ],
  });
  monaco.languages.setMonarchTokensProvider(LANGUAGE_ID, {
    declarations: DECLARATIONS.map((d) => d.keyword),
    keywords: ['if', 'then', 'else', 'and', 'or', 'not'],
    builtins: BUILTINS.filter((b) => b.category !== 'coordinate').map((b) => b.name),
    coordinates: BUILTINS.filter((b) => b.category === 'coordinate').map((b) => b.name),
    units: UNITS.map((u) => u.name),
    tokenizer: {
      root: [
        [/#.*$/, 'comment'],
        [/"([^"\\]|\\.)*"?/, 'string'],
        [/(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/, 'number'],
        [/[A-Za-z_µμ][\wµμ]*/, { cases: { '@declarations': 'keyword.declaration', '@keywords': 'keyword', '@builtins': 'predefined', '@coordinates': 'variable.predefined', '@units': 'type.unit', '@default': 'identifier' } }],
        [/[-+*/^<>=!]+/, 'operator'],
        [/[(),:]/, 'delimiter'],
      ],
    },
  } as monaco.languages.IMonarchLanguage);

  monaco.editor.defineTheme(THEME_ID, {
    base: 'vs',
    inherit: true,
    rules: [
      { token: 'comment', foreground: '6f6e66', fontStyle: 'italic' },
      { token: 'keyword.declaration', foreground: '14213d', fontStyle: 'bold' },
      { token: 'keyword', foreground: '14213d', fontStyle: 'bold' },
      { token: 'predefined', foreground: '2f4b8a' },
      { token: 'variable.predefined', foreground: '7a4b00' },
      { token: 'number', foreground: '0f6b53' },
      { token: 'type.unit', foreground: '0f6b53', fontStyle: 'italic' },
      { token: 'string', foreground: '6b4f1d' },
    ],
    colors: {
      'editor.background': '#f7f7f2',
      'editor.foreground': '#14213d',
      'editorLineNumber.foreground': '#9b998f',
      'editor.lineHighlightBackground': '#efede4',
      'editorCursor.foreground': '#14213d',
      focusBorder: '#5b3fd1',
      'editorSuggestWidget.background': '#ffffff',
      'editorSuggestWidget.border': '#d9d6cc',
      'editorSuggestWidget.selectedBackground': '#e4e1f6',
      'editorSuggestWidget.selectedForeground': '#14213d',
      'editorSuggestWidget.highlightForeground': '#5b3fd1',
      'editorHoverWidget.background': '#ffffff',
      'editorHoverWidget.border': '#d9d6cc',
      'list.activeSelectionBackground': '#e4e1f6',
      'list.activeSelectionForeground': '#14213d',
      'editorError.foreground': '#b3261e',
      'editorWarning.foreground': '#d95f02',
      'diffEditor.insertedTextBackground': '#1b9e7733',
      'diffEditor.removedTextBackground': '#d95f0233',
      'diffEditor.insertedLineBackground': '#1b9e7718',
      'diffEditor.removedLineBackground': '#d95f0218',
    },
  });

  monaco.languages.registerCompletionItemProvider(LANGUAGE_ID, {
    triggerCharacters: ['(', ','],
    provideCompletionItems(model, position) {
      const word = model.getWordUntilPosition(position);
      const range = new monaco.Range(position.lineNumber, word.startColumn, position.lineNumber, word.endColumn);
      const suggestions = completionsAt(model.getValue(), position.lineNumber, position.column).map((e, i) => ({
        label: e.label,
        kind: COMPLETION_KINDS[e.kind],
        detail: e.detail,
        documentation: e.documentation ? { value: e.documentation } : undefined,
        insertText: e.insertText,
        insertTextRules: e.snippet ? monaco.languages.CompletionItemInsertTextRule.InsertAsSnippet : undefined,
        sortText: String(i).padStart(4, '0'),
        range,
      }));
      return { suggestions };
    },
  });

  monaco.languages.registerHoverProvider(LANGUAGE_ID, {
    provideHover(model, position) {
      const info = hoverAt(model.getValue(), typesByModel.get(model.uri.toString()) ?? [], position.lineNumber, position.column);
      if (!info) return null;
      return {
        range: new monaco.Range(info.span.start.line, info.span.start.column, info.span.end.line, info.span.end.column),
        contents: info.contents.map((value) => ({ value })),
      };
    },
  });
  return monaco;
}
