// Turns text into the tokens the index stores and the query looks up: each word keeps its own
// form and, where the synonym table knows it, its concept. A phrase from the table ("drinks fuel",
// "when I brake") becomes a single concept token, matched longest first.
import { STOPWORDS, words } from "./normalise";
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
};

type Phrase = { words: string[]; concept: string };
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
      const list = phrasesByFirst.get(ws[0]) ?? [];
      list.push({ words: ws, concept: key });
      phrasesByFirst.set(ws[0], list);
    }
  }
  for (const list of phrasesByFirst.values()) list.sort((a, b) => b.words.length - a.words.length);
  return { wordConcept, phrasesByFirst };
}

export const THESAURUS = compileThesaurus(SYNONYM_GROUPS);

function phraseAt(ws: string[], i: number, th: Thesaurus): Phrase | null {
  for (const p of th.phrasesByFirst.get(ws[i]) ?? []) {
    if (i + p.words.length > ws.length) continue;
    let ok = true;
    for (let k = 1; k < p.words.length && ok; k++) ok = ws[i + k] === p.words[k];
    if (ok) return p;
  }
  return null;
}

/** Tokens of already-split words; stopwords dropped after phrases had their chance. */
export function analyseWords(ws: string[], th: Thesaurus = THESAURUS): Token[] {
  const out: Token[] = [];
  for (let i = 0; i < ws.length; ) {
    const p = phraseAt(ws, i, th);
    if (p) {
      out.push({ word: null, concept: p.concept, covered: ws.slice(i, i + p.words.length).filter((w) => !STOPWORDS.has(w)) });
      i += p.words.length;
      continue;
    }
    const w = ws[i++];
    const concept = th.wordConcept.get(w) ?? null;
    if (STOPWORDS.has(w) && !concept) continue;
    out.push({ word: w, concept, covered: [] });
  }
  return out;
}

export const analyse = (text: string, th: Thesaurus = THESAURUS) => analyseWords(words(text), th);

/** One string per token sequence, concept in place of its words: "judder when braking" → "_vibration _brake". */
export const canonical = (tokens: Token[]) => tokens.map((t) => t.concept ?? t.word).join(" ");

/** The same tokens as the words themselves, stopwords dropped: "judder when braking" → "judder braking". */
export const literal = (tokens: Token[]) => tokens.map((t) => t.word ?? t.covered.join(" ")).join(" ");
