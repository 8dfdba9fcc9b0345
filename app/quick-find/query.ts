// A query as typed → the tokens to look up. The last word is treated as unfinished (a prefix)
// unless the user has typed a space after it.
import { analyseWords, canonical } from "./analyse";
import { words } from "./normalise";

export type QueryToken = { word: string | null; concept: string | null; prefix: boolean };
export type ParsedQuery = {
  tokens: QueryToken[];
  /** Canonical form, compared with each entry's phrases for a whole-phrase bonus. */
  canonical: string;
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
  return { tokens, canonical: canonical(analysed), caseNumber: /^\s*#\s*\d/.test(raw) };
}
