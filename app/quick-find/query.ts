// A query as typed → the tokens to look up. The last word is treated as unfinished (a prefix)
// unless the user has typed a space after it.
import { analyseWords, canonical, literal } from "./analyse";
import { words } from "./normalise";

export type QueryToken = { word: string | null; concept: string | null; prefix: boolean };
export type ParsedQuery = {
  tokens: QueryToken[];
  /** Canonical form ("_vibration _brake") and literal form ("judder braking"), compared with each entry's phrases. */
  canonical: string;
  literal: string;
  /** The last word is still being typed. */
  typing: boolean;
  /** "#1041": the user means a case number. */
  caseNumber: boolean;
};

export function parseQuery(raw: string): ParsedQuery {
  const ws = words(raw);
  const analysed = analyseWords(ws);
  const typing = ws.length > 0 && !/\s$/.test(raw);
  const lastWord = ws[ws.length - 1];
  const tokens = analysed.map((t, i): QueryToken => ({
    word: t.word,
    concept: t.concept,
    prefix: typing && i === analysed.length - 1 && t.word === lastWord,
  }));
  const stillTyping = tokens.length > 0 && tokens[tokens.length - 1].prefix;
  return { tokens, canonical: canonical(analysed), literal: literal(analysed), typing: stillTyping, caseNumber: /^\s*#\s*\d/.test(raw) };
}
