/**
 * How many lines one script adds and removes relative to another, from the length of the shortest
 * edit script (E. W. Myers, "An O(ND) Difference Algorithm and Its Variations", 1986): with D
 * the number of inserted plus deleted lines, added − removed = m − n gives both counts.
 */
export function lineChangeCounts(before: string, after: string): { added: number; removed: number } {
  const a = before.split('\n');
  const b = after.split('\n');
  const n = a.length;
  const m = b.length;
  const max = n + m;
  // v[k + max] is the furthest x reached on diagonal k = x − y
  const v = new Int32Array(2 * max + 2);
  for (let d = 0; d <= max; d++) {
    for (let k = -d; k <= d; k += 2) {
      let x = k === -d || (k !== d && v[k - 1 + max] < v[k + 1 + max]) ? v[k + 1 + max] : v[k - 1 + max] + 1;
      let y = x - k;
      while (x < n && y < m && a[x] === b[y]) {
        x++;
        y++;
      }
      v[k + max] = x;
      if (x >= n && y >= m) return { added: (d + m - n) / 2, removed: (d - m + n) / 2 };
    }
  }
  return { added: m, removed: n };
}
