import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { lineChangeCounts } from '@/lib/workflow/line-diff';

// Reference: the longest common subsequence by the textbook dynamic programme (Cormen et al.,
// Introduction to Algorithms, "Longest common subsequence", from memory); added = m − LCS, removed = n − LCS.
function lcsLength(a: string[], b: string[]): number {
  const row = new Array(b.length + 1).fill(0);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = 0;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j];
      row[j] = a[i - 1] === b[j - 1] ? diagonal + 1 : Math.max(row[j], row[j - 1]);
      diagonal = above;
    }
  }
  return row[b.length];
}

describe('lineChangeCounts', () => {
  it('counts a changed focal length as one line removed and one added', () => {
    const before = 'wavelength 405 nm\nfocus 0 0 5 mm\naperture 460 um';
    const after = 'wavelength 405 nm\nfocus 0 0 6 mm\naperture 460 um';
    expect(lineChangeCounts(before, after)).toEqual({ added: 1, removed: 1 });
    expect(lineChangeCounts(before, before)).toEqual({ added: 0, removed: 0 });
  });

  it('agrees with the dynamic-programming LCS on random line lists', () => {
    const lines = fc.array(fc.constantFrom('a', 'b', 'c', 'd'), { maxLength: 30 });
    fc.assert(
      fc.property(lines, lines, (a, b) => {
        const counts = lineChangeCounts(a.join('\n'), b.join('\n'));
        // an empty list still splits into one empty line
        const n = a.length === 0 ? 1 : a.length;
        const m = b.length === 0 ? 1 : b.length;
        const l = lcsLength(a.length ? a : [''], b.length ? b : ['']);
        expect(counts).toEqual({ added: m - l, removed: n - l });
      }),
    );
  });
});
