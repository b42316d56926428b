import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkScript, compileScript } from '@/lib/lang';

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? sources(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('safety of evaluation', () => {
  it('never turns text into code: no eval or Function constructor anywhere in the language', () => {
    for (const file of sources(path.resolve(__dirname, '../../../lib/lang'))) {
      const text = readFileSync(file, 'utf8');
      expect(text, file).not.toMatch(/\beval\s*\(|new\s+Function\b|\bFunction\s*\(/);
    }
  });

  it('refuses nesting deeper than its limit with a message, not a stack overflow', () => {
    const deep = 'wavelength 405 nm\nprofile ' + 'sin('.repeat(200) + 'x / 1 um' + ')'.repeat(200) + '\n';
    expect(checkScript(deep).some((d) => /nested more than 120 levels/.test(d.message))).toBe(true);
  });

  it('keeps text that looks like code inert', () => {
    const result = compileScript('wavelength 405 nm\naperture circle(radius: 100 um)\nprofile lens(focal: 1 mm)\nquantize binary()\nlabel text("process.exit(1); require(\'fs\')", at: (0 um, 0 um))\n');
    expect(result.ok && result.design.labels[0].text).toBe("process.exit(1); require('fs')");
  });
});
