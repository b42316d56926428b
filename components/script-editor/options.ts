/** Monaco options shared by the script and diff editors. */
export const EDITOR_OPTIONS = {
  fontFamily: 'var(--font-mono), ui-monospace, monospace',
  fontSize: 13,
  lineHeight: 20,
  minimap: { enabled: false },
  scrollBeyondLastLine: false,
  renderLineHighlight: 'line',
  tabSize: 2,
  wordBasedSuggestions: 'off',
  quickSuggestions: { other: true, comments: false, strings: false },
  automaticLayout: true,
  fixedOverflowWidgets: true,
  hover: { delay: 250 },
} as const;
