// Text → comparable words, applied identically to entries (once, at build) and to queries (per
// keystroke), so both sides always agree on what a "word" is.
import { stemmer } from "stemmer";

/** Words that carry no meaning in a complaint ("the wheel shakes when I brake"). */
export const STOPWORDS: ReadonlySet<string> = new Set([
  "a",
  "an",
  "the",
  "and",
  "or",
  "of",
  "to",
  "in",
  "on",
  "at",
  "by",
  "for",
  "with",
  "from",
  "into",
  "is",
  "it",
  "its",
  "be",
  "been",
  "was",
  "are",
  "i",
  "my",
  "me",
  "we",
  "our",
  "you",
  "your",
  "when",
  "while",
  "whenever",
  "under",
  "over",
  "as",
  "that",
  "this",
  "then",
  "there",
  "just",
  "very",
  "bit",
  "some",
  "gets",
  "get",
  "car",
  "vehicle",
  "s",
  // Auxiliaries carry no symptom ("does not hold", "will not open"); the negation beside them is
  // kept as the phrase's polarity (NEGATIONS below).
  "do",
  "does",
  "did",
  "will",
  "would",
  "can",
  "could",
  "has",
  "have",
  "had",
  // Fillers of an owner's sentence: how often and how much, not what.
  "every",
  "few",
  "than",
  "ever",
  "really",
  "quite",
  "lot",
  "sometimes",
  "always",
  "now",
  "again",
  "still",
  "also",
  "too",
  "even",
  "time",
  "times",
  // Verbs of motion and feeling that only carry the sentence ("it goes cold", "it feels loose").
  "go",
  "goes",
  "going",
  "gone",
  "went",
  "come",
  "comes",
  "came",
  "coming",
  "keep",
  "keeps",
  "kept",
  "got",
  "feel",
  "feels",
  "felt",
  "seem",
  "seems",
  "try",
  "tried",
]);

/**
 * Words that turn a statement round: "no grinding", "doesn't pull", "do not work". They are not
 * looked up as words; a phrase holding one is negative, and Quick find compares that polarity with
 * the entry's own wording ("door will not open" is itself negative). Apostrophes are dropped before
 * this, so "don't" arrives as "dont". "nothing" is left out: "click or nothing" is still a symptom.
 */
export const NEGATIONS: ReadonlySet<string> = new Set([
  "no",
  "not",
  "never",
  "none",
  "cannot",
  "dont",
  "doesnt",
  "didnt",
  "isnt",
  "arent",
  "wasnt",
  "werent",
  "wont",
  "cant",
  "couldnt",
  "wouldnt",
  "hasnt",
  "havent",
  "hadnt",
  "aint",
]);

const APOSTROPHES = /['’‘`]/g;
const COMBINING = /[\u0300-\u036f]/g;
const NON_WORD = /[^a-z0-9]+/g;
// eslint-disable-next-line no-control-regex -- \x00–\x7f is the ASCII range on purpose, NUL included
const NON_ASCII = /[^\x00-\x7f]/;
const LETTERS_ONLY = /^[a-z]+$/;

/** Lower case, no accents, apostrophes dropped ("won't" → "wont"), other punctuation → space. */
export function normaliseText(text: string): string {
  // Unicode decomposition is the slow step; most text in a workshop is plain ASCII.
  const plain = NON_ASCII.test(text) ? text.normalize("NFKD").replace(COMBINING, "") : text;
  return plain.toLowerCase().replace(APOSTROPHES, "").replace(NON_WORD, " ").trim();
}

/**
 * A light plural stemmer for letters-only words, so "bumps" meets "bump" and "batteries" meets
 * "battery". Codes (VINs, registrations) are never touched: a VIN may well end in S.
 */
export function stem(word: string): string {
  if (word.length <= 3 || word.charCodeAt(word.length - 1) !== 115 /* s */ || !LETTERS_ONLY.test(word))
    return word;
  if (word.endsWith("ies") && word.length > 4) return `${word.slice(0, -3)}y`;
  if (/(?:sh|ch|x|ss)es$/.test(word)) return word.slice(0, -2);
  if (word.endsWith("s") && !/(?:ss|us|is)$/.test(word)) return word.slice(0, -1);
  return word;
}

const porterMemo = new Map<string, string>();
/**
 * The Porter stem of a letters-only word (M. F. Porter, "An algorithm for suffix stripping",
 * Program 14(3), 1980), through the `stemmer` package: "jerking" and "jerks" both become "jerk",
 * "braking" and "brakes" "brake". Used beside the word itself, never instead of it, so a word still
 * being typed ("vibrati") keeps matching as a prefix of the words as written.
 */
export function porterStem(word: string): string {
  let s = porterMemo.get(word);
  if (s === undefined) {
    s = word.length > 3 && LETTERS_ONLY.test(word) ? stemmer(word) : word;
    if (porterMemo.size > 100_000) porterMemo.clear(); // bounded: vocabularies are a few thousand words
    porterMemo.set(word, s);
  }
  return s;
}

/** Normalised, stemmed words in order (stopwords kept: phrases such as "at speed" need them). */
export function words(text: string): string[] {
  const n = normaliseText(text);
  return n ? n.split(" ").map(stem) : [];
}

export const hasDigit = (w: string) => /[0-9]/.test(w);
