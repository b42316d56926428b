import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { run } from '@/scripts/zw/check';

let lines: string[];
beforeEach(() => {
  lines = [];
  vi.spyOn(console, 'log').mockImplementation((...a: unknown[]) => void lines.push(a.join(' ')));
  vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => void lines.push(a.join(' ')));
});
afterEach(() => vi.restoreAllMocks());

function file(text: string): string {
  const p = path.join(mkdtempSync(path.join(os.tmpdir(), 'zw-check-')), 'design.zw');
  writeFileSync(p, text);
  return p;
}

describe('zw check', () => {
  it('passes every example with a one-line summary and exit 0', async () => {
    const dir = path.resolve(__dirname, '../../../examples');
    const code = await run(['single-focus-405.zw', 'two-focus-offaxis.zw'].map((f) => path.join(dir, f)));
    expect(code).toBe(0);
    expect(lines[0]).toMatch(/single-focus-405\.zw: ok: λ 405 nm · aperture circle Ø 460 µm · 1 focus \(0, 0, 1000\) µm · binary amplitude, duty 0\.5, positive tone$/);
    expect(lines[1]).toMatch(/two-focus-offaxis\.zw: ok: .*2 foci/);
  });

  it('reports a broken line and a length/angle mix-up as file:line:col and exits 1', async () => {
    const p = file('wavelength 405 nm\naperture circle(diameter: 460 um\nk = 3 um + 2 deg\nprofile lens(focal: 1 mm)\nquantize binary()\n');
    expect(await run([p])).toBe(1);
    expect(lines).toContain(`${p}:2:16: error: this "(" is never closed`);
    expect(lines).toContain(`${p}:3:5: error: cannot add angle or phase (rad) to length (µm)`);
  });

  it('says so for a missing file and prints usage without arguments', async () => {
    expect(await run(['/nonexistent/x.zw'])).toBe(1);
    expect(lines[0]).toBe('/nonexistent/x.zw: error: cannot read the file (no such file)');
    expect(await run([])).toBe(2);
  });
});
