import { describe, expect, it } from 'vitest';
import { diffParameters, flattenParameters } from '@/lib/workflow/parameter-diff';

describe('flattenParameters', () => {
  it('gives every leaf a dotted path with array indices', () => {
    const flat = flattenParameters({ wavelength: 0.405, foci: [{ z: 5000 }, { z: 8000 }], layer: { tone: 'positive' } });
    expect([...flat.entries()]).toEqual([
      ['wavelength', 0.405],
      ['foci[0].z', 5000],
      ['foci[1].z', 8000],
      ['layer.tone', 'positive'],
    ]);
  });
});

describe('diffParameters', () => {
  // A 405 nm source and focal lengths of a few mm: common practice, no source.
  const before = { wavelength: 0.405, foci: [{ z: 5000, weight: 1 }], tone: 'positive', files: [{ sha256: 'aa' }] };
  const after = { wavelength: 0.405, foci: [{ z: 6000, weight: 1 }, { z: 9000, weight: 1 }], files: [{ sha256: 'bb' }] };

  it('marks changed, added, removed and unchanged values and gives numeric deltas', () => {
    const rows = diffParameters(before, after, { ignore: ['files'] });
    expect(rows).toEqual([
      { path: 'wavelength', before: 0.405, after: 0.405, change: 'unchanged', delta: 0 },
      { path: 'foci[0].z', before: 5000, after: 6000, change: 'changed', delta: 1000 },
      { path: 'foci[0].weight', before: 1, after: 1, change: 'unchanged', delta: 0 },
      { path: 'tone', before: 'positive', after: undefined, change: 'removed' },
      { path: 'foci[1].z', before: undefined, after: 9000, change: 'added' },
      { path: 'foci[1].weight', before: undefined, after: 1, change: 'added' },
    ]);
  });

  it('treats floating-point noise as equal but a real change as changed', () => {
    // 0.1 + 0.2 differs from 0.3 by one unit in the last place (IEEE 754 double, from memory)
    expect(diffParameters({ a: 0.1 + 0.2 }, { a: 0.3 })[0].change).toBe('unchanged');
    expect(diffParameters({ a: 0.3 }, { a: 0.3000001 })[0].change).toBe('changed');
  });

  it('ignores a prefix only at a path boundary', () => {
    const rows = diffParameters({ files: 1, filesize: 2 }, { files: 3, filesize: 2 }, { ignore: ['files'] });
    expect(rows.map((r) => r.path)).toEqual(['filesize']);
  });
});
