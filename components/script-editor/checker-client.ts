import type { Diagnostic, TypeNote } from '@/lib/lang';
import { analyzeScript } from '@/lib/lang';

export interface Analysis {
  diagnostics: Diagnostic[];
  types: TypeNote[];
}

/**
 * Checks scripts in a web worker, answering only the latest request of each caller; where
 * workers are unavailable it checks in an idle callback instead, still off the keystroke.
 */
export class CheckerClient {
  private worker: Worker | null = null;
  private latest = 0;
  private timer: ReturnType<typeof setTimeout> | null = null;

  constructor(private readonly onResult: (analysis: Analysis) => void) {
    try {
      this.worker = new Worker(new URL('./check.worker.ts', import.meta.url), { type: 'module' });
      this.worker.onmessage = (event: MessageEvent<Analysis & { id: number }>) => {
        if (event.data.id === this.latest) this.onResult(event.data);
      };
      this.worker.onerror = () => {
        this.worker = null;
      };
    } catch {
      this.worker = null;
    }
  }

  /** Schedules a check after `delay` ms without further calls. */
  check(source: string, delay = 250): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => this.run(source), delay);
  }

  private run(source: string): void {
    const id = ++this.latest;
    if (this.worker) {
      this.worker.postMessage({ id, source });
      return;
    }
    const idle = (globalThis as { requestIdleCallback?: (f: () => void) => void }).requestIdleCallback ?? ((f: () => void) => setTimeout(f, 0));
    idle(() => {
      if (id === this.latest) this.onResult(analyzeScript(source));
    });
  }

  dispose(): void {
    if (this.timer) clearTimeout(this.timer);
    this.worker?.terminate();
    this.worker = null;
  }
}
