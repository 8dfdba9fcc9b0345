// Text → comparable words, applied identically to entries (once, at build) and to queries (per
// keystroke), so both sides always agree on what a "word" is.

/** Words that carry no meaning in a complaint ("the wheel shakes when I brake"). */
export const STOPWORDS: ReadonlySet<string> = new Set([
  "a", "an", "the", "and", "or", "of", "to", "in", "on", "at", "by", "for", "with", "from", "into",
  "is", "it", "its", "be", "been", "was", "are", "i", "my", "me", "we", "our", "you", "your",
  "when", "while", "whenever", "under", "over", "as", "that", "this", "then", "there", "just",
  "very", "bit", "some", "gets", "get", "car", "vehicle", "s",
]);

const APOSTROPHES = /['’‘`]/g;
const COMBINING = /[\u0300-\u036f]/g;
const NON_WORD = /[^a-z0-9]+/g;
const NON_ASCII = /[^\x00-\x7f]/;
const LETTERS_ONLY = /^[a-z]+$/;

/** Lower case, no accents, apostrophes dropped ("won't" → "wont"), other punctuation → space. */
export function normaliseText(text: string): string {
  // Unicode decomposition is the slow step; most text in a workshop is plain ASCII.
  const plain = NON_ASCII.test(text) ? text.normalize("NFKD").replace(COMBINING, "") : text;
  return plain
    .toLowerCase()
    .replace(APOSTROPHES, "")
    .replace(NON_WORD, " ")
    .trim();
}

/**
 * A light plural stemmer for letters-only words, so "bumps" meets "bump" and "batteries" meets
 * "battery". Codes (VINs, registrations) are never touched: a VIN may well end in S.
 */
export function stem(word: string): string {
  if (word.length <= 3 || word.charCodeAt(word.length - 1) !== 115 /* s */ || !LETTERS_ONLY.test(word)) return word;
  if (word.endsWith("ies") && word.length > 4) return `${word.slice(0, -3)}y`;
  if (/(?:sh|ch|x|ss)es$/.test(word)) return word.slice(0, -2);
  if (word.endsWith("s") && !/(?:ss|us|is)$/.test(word)) return word.slice(0, -1);
  return word;
}

/** Normalised, stemmed words in order (stopwords kept: phrases such as "at speed" need them). */
export function words(text: string): string[] {
  const n = normaliseText(text);
  return n ? n.split(" ").map(stem) : [];
}

export const hasDigit = (w: string) => /[0-9]/.test(w);
