// Turns text into the tokens the index stores and the query looks up: each word keeps its own
// form and, where the synonym table knows it (as written or by its Porter stem), its concept. A
// phrase from the table ("drinks fuel", "when I brake") becomes a single concept token, matched
// longest first. Negation words ("no", "doesn't") are not tokens: they set the text's polarity.
import { NEGATIONS, porterStem, STOPWORDS, words } from "./normalise";
import { SYNONYM_GROUPS, type SynonymGroup } from "./synonyms";

/** Concept keys are prefixed so they can never collide with a word a user types. */
export const conceptKey = (concept: string) => `_${concept}`;

export type Token = {
  /** The word itself, or null when the token stands for a whole phrase. */
  word: string | null;
  /** The concept key ("_vibration") or null. */
  concept: string | null;
  /** The words a phrase token covered (indexed too, so a half-typed phrase still matches). */
  covered: string[];
  /** Set on a token after the first clause ("… when I filled up"): circumstance, not the complaint. */
  later?: true;
};

type Phrase = { words: string[]; stems: string[]; concept: string };
export type Thesaurus = { wordConcept: Map<string, string>; phrasesByFirst: Map<string, Phrase[]> };

export function compileThesaurus(groups: SynonymGroup[]): Thesaurus {
  const wordConcept = new Map<string, string>();
  const phrasesByFirst = new Map<string, Phrase[]>();
  for (const g of groups) {
    const key = conceptKey(g.concept);
    for (const m of g.members) {
      const ws = words(m);
      if (ws.length === 0) continue;
      if (ws.length === 1) {
        if (!wordConcept.has(ws[0])) wordConcept.set(ws[0], key);
        continue;
      }
      // Keyed by the first word's stem, so "pulled away" finds "pull away".
      const stems = ws.map(porterStem);
      const list = phrasesByFirst.get(stems[0]) ?? [];
      list.push({ words: ws, stems, concept: key });
      phrasesByFirst.set(stems[0], list);
    }
  }
  // A stem reaches the concept of any member word it stems from ("jerked" → "jerk"), unless a word
  // of another group already is that stem.
  for (const [w, c] of [...wordConcept]) {
    const s = porterStem(w);
    if (!wordConcept.has(s)) wordConcept.set(s, c);
  }
  for (const list of phrasesByFirst.values()) list.sort((a, b) => b.words.length - a.words.length);
  return { wordConcept, phrasesByFirst };
}

export const THESAURUS = compileThesaurus(SYNONYM_GROUPS);

/** The concept of one word, as written or by its stem. */
export const conceptOf = (w: string, th: Thesaurus = THESAURUS): string | null =>
  th.wordConcept.get(w) ?? th.wordConcept.get(porterStem(w)) ?? null;

function matchAt(ws: string[], i: number, th: Thesaurus): Phrase | null {
  for (const p of th.phrasesByFirst.get(porterStem(ws[i])) ?? []) {
    if (i + p.words.length > ws.length) continue;
    let ok = true;
    for (let k = 1; k < p.words.length && ok; k++)
      ok = ws[i + k] === p.words[k] || porterStem(ws[i + k]) === p.stems[k];
    if (ok) return p;
  }
  return null;
}

function phraseAt(ws: string[], i: number, th: Thesaurus): Phrase | null {
  const p = matchAt(ws, i, th);
  // A phrase that starts with a negation ("no power") yields to a longer phrase that starts on its
  // second word ("power steering"): "no power steering light" is the lamp, absent.
  if (p && NEGATIONS.has(ws[i]) && i + 1 < ws.length) {
    const next = matchAt(ws, i + 1, th);
    if (next && i + 1 + next.words.length > i + p.words.length) return null;
  }
  return p;
}

/**
 * Words that say a thing works, not that it is faulty: "no problem opening it from the outside",
 * "fine under braking", and a negated fault word ("the other windows aren't dead"). A complaint
 * saying so offers every symptom as absent.
 */
const ALL_WELL: ReadonlySet<string> = new Set(["fine", "ok", "okay", "normal", "normally"]);
/** After a negation these say "it works": fillers ("no problem") are dropped, fault words ("isn't dead") kept for matching. */
const NO_FAULT_FILLERS: ReadonlySet<string> = new Set([
  "problem",
  "problems",
  "trouble",
  "issue",
  "issues",
  "bother",
]);
const FAULT_WORDS: ReadonlySet<string> = new Set(["dead", "broken"]);

export type Analysis = { tokens: Token[]; negated: boolean; allWell: boolean };

/**
 * Words that start a new clause. A negation counts only in the first clause, the complaint
 * itself: "keeps losing coolant but there's no leak" and "cuts out when warm and won't restart"
 * are still positive complaints.
 */
const CLAUSE_BREAKS: ReadonlySet<string> = new Set([
  "but",
  "and",
  "though",
  "although",
  "till",
  "until",
  "unless",
  "because",
  "so",
  "then",
  "once",
  "after",
  "before",
  "except",
  "since",
]);

/**
 * Tokens of already-split words; stopwords dropped after phrases had their chance, and so are
 * negation words, which make the text negative instead ("won't start" is a phrase first, so it
 * stays a positive complaint).
 */
export function analyseWithPolarity(ws: string[], th: Thesaurus = THESAURUS): Analysis {
  const tokens: Token[] = [];
  let negated = false;
  let allWell = false;
  let firstClause = true;
  for (let i = 0; i < ws.length;) {
    const p = phraseAt(ws, i, th);
    if (p) {
      const t: Token = {
        word: null,
        concept: p.concept,
        covered: ws.slice(i, i + p.words.length).filter((w) => !STOPWORDS.has(w) && !NEGATIONS.has(w)),
      };
      if (!firstClause) t.later = true;
      tokens.push(t);
      i += p.words.length;
      continue;
    }
    const w = ws[i++];
    if (NEGATIONS.has(w)) {
      if (firstClause) negated = true;
      // "no problem …", "isn't dead": the thing works
      const next = ws[i] ?? "";
      if (firstClause && (NO_FAULT_FILLERS.has(next) || FAULT_WORDS.has(next))) allWell = true;
      if (NO_FAULT_FILLERS.has(next)) i++;
      continue;
    }
    if (ALL_WELL.has(w)) {
      if (firstClause) allWell = true;
      continue;
    }
    // A break only after some content: "and no squeal" still starts with its complaint.
    if (CLAUSE_BREAKS.has(w) && tokens.length > 0) firstClause = false;
    const concept = conceptOf(w, th);
    if (STOPWORDS.has(w) && !concept) continue;
    const t: Token = { word: w, concept, covered: [] };
    if (!firstClause) t.later = true;
    tokens.push(t);
  }
  return { tokens, negated, allWell };
}

export const analyseWords = (ws: string[], th: Thesaurus = THESAURUS): Token[] =>
  analyseWithPolarity(ws, th).tokens;

export const analyse = (text: string, th: Thesaurus = THESAURUS) => analyseWords(words(text), th);

/** One string per token sequence, concept in place of its words: "judder when braking" → "_vibration _brake". */
export const canonical = (tokens: Token[]) => tokens.map((t) => t.concept ?? t.word).join(" ");

/** The same tokens as the words themselves, stopwords dropped: "judder when braking" → "judder braking". */
export const literal = (tokens: Token[]) => tokens.map((t) => t.word ?? t.covered.join(" ")).join(" ");

/** What a token stands for when comparing two phrases: its concept, else its word's stem. */
export const tokenKey = (t: Token): string => t.concept ?? porterStem(t.word!);
