// The core editor without Monaco's bundled languages; same API as the package root.
declare module 'monaco-editor/esm/vs/editor/edcore.main' {
  export * from 'monaco-editor';
}
