/** Levenshtein distance, for "did you mean" hints. */
function distance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return row[b.length];
}

/** The closest candidate within a small edit distance, or undefined. */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestDistance = Math.max(1, Math.min(3, Math.floor(word.length / 2)));
  for (const c of candidates) {
    // a candidate that merely continues the word (wavelen → wavelength) is the likelier intent
    const d = distance(word.toLowerCase(), c.toLowerCase()) - (c.toLowerCase().startsWith(word.toLowerCase()) ? 1 : 0);
    if (d < bestDistance || (d === bestDistance && best === undefined)) {
      best = c;
      bestDistance = d;
    }
  }
  return best;
}
