// Typo tolerance at the level of words, not entries: the vocabulary is a few thousand words even
// when the index holds tens of thousands of entries, so comparing a mistyped word against it is
// cheap, and every entry containing the corrected word is then found through the inverted index.

/** Restricted Damerau–Levenshtein distance (a swap of neighbours counts as one), or max+1 once over max. */
export function editDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  const n = b.length;
  let prev2 = new Array<number>(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  let cur = new Array<number>(n + 1).fill(0);
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    let rowMin = i;
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, prev2[j - 2] + 1);
      cur[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > max) return max + 1;
    [prev2, prev, cur] = [prev, cur, prev2];
  }
  return prev[n];
}

/** How many mistakes a word of this length may carry: none below 4 letters (too many near misses). */
export const allowedTypos = (len: number) => (len < 4 ? 0 : len < 8 ? 1 : 2);

/**
 * Words of the vocabulary within the allowed distance of `word`. With `asPrefix`, the word is still
 * being typed, so it is compared with the start of each longer word as well ("vibrat" ~ "vibraton").
 */
export function nearWords(word: string, byLength: Map<number, string[]>, asPrefix: boolean): string[] {
  const max = allowedTypos(word.length);
  if (max === 0) return [];
  const out: string[] = [];
  for (const [len, list] of byLength) {
    const whole = Math.abs(len - word.length) <= max;
    const head = asPrefix && len > word.length;
    if (!whole && !head) continue;
    for (const w of list) {
      if (whole && editDistance(word, w, max) <= max) out.push(w);
      else if (head && editDistance(word, w.slice(0, word.length), 1) <= 1) out.push(w);
    }
  }
  return out;
}
