/// <reference lib="webworker" />
// Runs the checker off the typing path: the editor posts the script, the worker answers with
// diagnostics and expression types for the same request id.
import { analyzeScript } from '@/lib/lang';

export interface CheckRequest {
  id: number;
  source: string;
}

self.onmessage = (event: MessageEvent<CheckRequest>) => {
  const { id, source } = event.data;
  self.postMessage({ id, ...analyzeScript(source) });
};
