// The per-keystroke path for one index: the inverted index narrows 10,000 entries to the few that
// contain every query word (or its concept, prefix, code fragment or near-miss spelling), and Fuse
// then re-scores only those few. Nothing here allocates per entry.
import type { QuickFindIndex } from "./build";
import { conceptOf } from "./analyse";
import { hasDigit } from "./normalise";
import type { PostingTable } from "./postings";
import type { ParsedQuery } from "./query";
import { nearWords } from "./typo";
import { ENTRY_KINDS, type EntryKind, type ScoredEntry } from "./types";

// How much each kind of match is worth, relative to the word itself found in the same field.
// The stem is nearly the word itself: "jerks" for "jerking".
export const MATCH = {
  exact: 1,
  stem: 0.95,
  concept: 0.7,
  prefix: 0.8,
  prefixConcept: 0.6,
  code: 0.7,
  typo: 0.6,
  typoConcept: 0.5,
} as const;
// The whole query is one of the entry's phrases: word for word ("pulls left"), through the
// synonym table ("shudder braking" for "judder when braking"), or the start of one while typing.
export const PHRASE_BONUS = { literal: 0.25, canonical: 0.15, typing: 0.1 } as const;
export const RECENT_BONUS = 0.05; // a nudge, never enough to beat a better match
// Of a knowledge-base entry's name, the share the query covers (a name said in full beats one of
// its synonyms naming more), and two query words side by side in one of a symptom's phrases
// ("battery light" in "battery light on", not "lights … battery").
export const TITLE_COVER_BONUS = 0.15;
export const ADJACENT_BONUS = 0.1;
export const FUSE_BONUS = 0.3; // × (1 − Fuse score) for the re-scored candidates
const PREFIX_TERMS_MAX = 4000; // bounds a one-letter prefix at very large vocabularies
const RERANK_PER_KIND = 3; // × limit candidates per kind go to Fuse

function lowerBound(list: string[], key: string): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (list[mid] < key) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function* withPrefix(list: string[], prefix: string): Generator<string> {
  for (let i = lowerBound(list, prefix), n = 0; i < list.length && n < PREFIX_TERMS_MAX; i++, n++) {
    if (!list[i].startsWith(prefix)) return;
    yield list[i];
  }
}

export type ScoreInput = {
  query: ParsedQuery;
  kinds: ReadonlySet<EntryKind>;
  recent: ReadonlySet<string>;
  limit: number;
};

export function scoreIndex(
  index: QuickFindIndex,
  { query, kinds, recent, limit }: ScoreInput,
): ScoredEntry[] {
  const { tok, total, cover } = index.scratch;
  const all: number[] = [];
  const span = new Int32Array(2);
  // Each word counts by where it stands (the complaint or a later circumstance) and by how rare it
  // is: a word most entries hold ("front", "noise") tells less than "ABS". The rarity weight is
  // 0.5 + 0.5 · log(1 + N / (1 + df)) / log(1 + N), an inverse document frequency kept within
  // [0.5, 1] so common words still count (Manning, Raghavan & Schütze, Introduction to Information
  // Retrieval, ch. 6). A word nothing matches counts in full, as a miss.
  const N = index.entries.length;
  const logN = Math.log(1 + N);
  let weightSum = 0;
  for (const qt of query.tokens) {
    const touched: number[] = [];
    const add = (table: PostingTable, term: string, factor: number): boolean => {
      if (!table.span(term, span)) return false;
      const { docs, weights } = table;
      for (let k = span[0]; k < span[1]; k++) {
        const d = docs[k];
        const s = weights[k] * factor;
        if (s > tok[d]) {
          if (tok[d] === 0) touched.push(d);
          tok[d] = s;
        }
      }
      return true;
    };
    const w = qt.word;
    let found = false;
    if (w) found = add(index.words, w, MATCH.exact);
    if (w && qt.stem && qt.stem !== w) found = add(index.words, qt.stem, MATCH.stem) || found;
    if (qt.concept) found = add(index.concepts, qt.concept, w ? MATCH.concept : MATCH.exact) || found;
    // A number beside other words ("DEMO 101") is a whole plate part, not the start of a case
    // number: "101" must not reach #1019 and #1012. Alone, or after "#", it may still be unfinished.
    const wholeNumber = w !== null && /^\d+$/.test(w) && query.tokens.length > 1 && !query.caseNumber;
    if (w && qt.prefix) {
      const seen = new Set<string>();
      for (const term of withPrefix(index.wordList, w)) {
        if (term === w || (wholeNumber && /^\d+$/.test(term))) continue;
        found = true;
        add(index.words, term, MATCH.prefix * (0.6 + (0.4 * w.length) / term.length));
        const c = w.length >= 3 ? conceptOf(term) : null;
        if (c && c !== qt.concept) seen.add(c);
      }
      for (const c of seen) add(index.concepts, c, MATCH.prefixConcept);
    }
    if (w && w.length >= 3 && hasDigit(w)) {
      for (const term of withPrefix(index.codeList, w)) add(index.codes, term, MATCH.code);
    }
    if (w && !found) {
      for (const near of nearWords(w, index.typoWords, qt.prefix)) {
        add(index.words, near, MATCH.typo);
        const c = conceptOf(near);
        if (c) add(index.concepts, c, MATCH.typoConcept);
      }
    }
    // Run-together words ("vibrationbraking"): split where both halves are known words.
    if (w && touched.length === 0) splitMatch(index, w, qt.prefix, tok, touched);
    const rarity = touched.length === 0 ? 1 : 0.5 + (0.5 * Math.log(1 + N / (1 + touched.length))) / logN;
    const weight = qt.weight * rarity;
    weightSum += weight;
    for (const d of touched) {
      if (cover[d] === 0) all.push(d);
      total[d] += weight * tok[d];
      cover[d]++;
      tok[d] = 0;
    }
  }

  // Every word should count; with three or more words one may miss (an owner's extra word).
  const n = query.tokens.length;
  let maxCover = 0;
  for (const d of all)
    if (kinds.has(ENTRY_KINDS[index.kindOf[d]]) && cover[d] > maxCover) maxCover = cover[d];
  const required = Math.max(1, maxCover - (n >= 3 ? 1 : 0));
  const byKind = new Map<number, Picked[]>();
  for (const d of all) {
    const k = index.kindOf[d];
    if (cover[d] >= required && kinds.has(ENTRY_KINDS[k])) {
      const q = weightSum > 0 ? total[d] / weightSum : 0;
      let s = q + phraseBonus(index, d, query) + nameBonus(index, d, query);
      if (recent.has(index.entries[d].id)) s += RECENT_BONUS;
      const list = byKind.get(k) ?? [];
      list.push({ d, s, q });
      byKind.set(k, list);
    }
    total[d] = 0;
    cover[d] = 0;
  }

  const picked: Picked[] = [];
  for (const list of byKind.values())
    picked.push(...list.sort((a, b) => b.s - a.s).slice(0, limit * RERANK_PER_KIND));
  return rerank(index, query, picked);
}

function phraseBonus(index: QuickFindIndex, d: number, q: ParsedQuery): number {
  if (!q.canonical) return 0;
  if (index.literals[d].includes(q.literal)) return PHRASE_BONUS.literal;
  if (index.phrases[d].includes(q.canonical)) return PHRASE_BONUS.canonical;
  if (q.typing && q.literal.length >= 3 && index.literals[d].some((p) => p.startsWith(q.literal)))
    return PHRASE_BONUS.typing;
  return 0;
}

type Picked = { d: number; s: number; q: number };

function nameBonus(index: QuickFindIndex, d: number, q: ParsedQuery): number {
  let bonus = 0;
  const title = index.titleKeys[d];
  if (title && title.size > 0) {
    let hit = 0;
    for (const k of title) if (q.keys.includes(k)) hit++;
    bonus += (TITLE_COVER_BONUS * hit) / title.size;
  }
  const fields = index.polarity[d];
  if (fields && q.keys.length >= 2) {
    outer: for (const f of fields) {
      // Side by side, or one word apart on either side ("ABS warning lamp" for "ABS light",
      // "sweet sickly smell" for "sweet smell").
      for (let i = 0; i + 1 < f.seq.length; i++) {
        for (let j = 0; j + 1 < q.keys.length; j++) {
          if (f.seq[i] !== q.keys[j]) continue;
          const next = q.keys[j + 1];
          const skip = q.keys[j + 2];
          if (
            f.seq[i + 1] === next ||
            f.seq[i + 2] === next ||
            (skip !== undefined && f.seq[i + 1] === skip)
          ) {
            bonus += ADJACENT_BONUS;
            break outer;
          }
        }
      }
    }
  }
  return bonus;
}

/**
 * Whether a symptom is offered as present. A negative query ("no grinding", "doesn't pull") offers
 * a symptom as absent unless the entry phrase it is closest to (by token keys in common, the
 * name first on a tie) is negative too: "door won't open" against "Door will not open …" is
 * present. A positive query is always present: "horn stopped working" means "Horn does not sound".
 */
export function presentFor(index: QuickFindIndex, d: number, query: ParsedQuery): boolean | undefined {
  const fields = index.polarity[d];
  if (!fields) return undefined;
  if (query.allWell) return false;
  if (!query.negated) return true;
  if (fields.length === 0) return false;
  // Closest by Jaccard similarity of token keys, so a short synonym said in full ("handbrake won't
  // release") beats a long name that shares as many words.
  let best = fields[0];
  let bestScore = -1;
  const q = new Set(query.keys);
  for (const f of fields) {
    let overlap = 0;
    for (const k of q) if (f.keys.has(k)) overlap++;
    const score = overlap / (q.size + f.keys.size - overlap || 1);
    if (score > bestScore) [best, bestScore] = [f, score];
  }
  return best.negated;
}

function rerank(index: QuickFindIndex, query: ParsedQuery, picked: Picked[]): ScoredEntry[] {
  if (picked.length === 0) return [];
  const score = new Map(picked.map((p) => [p.d, p.s]));
  // Concepts stand in for their words (an entry's Fuse text carries both), so "judder" meets "vibration".
  const fuseQuery = query.tokens.map((t) => t.concept ?? t.word).join(" ");
  index.rerankIndex.setIndexRecords(picked.map((p) => index.fuseRecords[p.d]));
  index.rerank.setCollection(index.fuseDocs, index.rerankIndex);
  for (const r of index.rerank.search(fuseQuery)) {
    score.set(r.refIndex, (score.get(r.refIndex) ?? 0) + FUSE_BONUS * (1 - (r.score ?? 1)));
  }
  return picked.map((p) => {
    const out: ScoredEntry = { entry: index.entries[p.d], score: score.get(p.d) ?? p.s, quality: p.q };
    const present = presentFor(index, p.d, query);
    if (present !== undefined) out.present = present;
    return out;
  });
}

/** Scores entries holding both halves of a word typed without its space, at the typo rate. */
function splitMatch(index: QuickFindIndex, w: string, prefix: boolean, tok: Float32Array, touched: number[]) {
  for (let i = 3; i <= w.length - 3; i++) {
    const left = index.words.get(w.slice(0, i));
    if (!left) continue;
    const rightWord = w.slice(i);
    const right =
      index.words.get(rightWord) ??
      (prefix ? index.words.get(withPrefix(index.wordList, rightWord).next().value ?? "") : undefined);
    if (!right) continue;
    const fromLeft = new Map<number, number>();
    for (let k = 0; k < left.docs.length; k++) fromLeft.set(left.docs[k], left.weights[k]);
    for (let k = 0; k < right.docs.length; k++) {
      const a = fromLeft.get(right.docs[k]);
      if (a === undefined) continue;
      const d = right.docs[k];
      if (tok[d] === 0) touched.push(d);
      tok[d] = Math.max(tok[d], (MATCH.typo * (a + right.weights[k])) / 2);
    }
    if (touched.length) return;
  }
}
