// A query as typed → the tokens to look up. The last word is treated as unfinished (a prefix)
// unless the user has typed a space after it. Also read off the query: whether it is negative
// ("no grinding"), the conditions it names, and any trouble codes typed as codes.
import type { Condition } from "../reasoning/conditions";
import { parseDtc } from "../measure/dtc";
import { analyseWithPolarity, canonical, literal, tokenKey } from "./analyse";
import { conditionsOf } from "./conditions";
import { normaliseText, porterStem, words } from "./normalise";

export type QueryToken = {
  word: string | null;
  concept: string | null;
  prefix: boolean;
  stem: string | null;
  /** 1 in the first clause (the complaint), LATER_CLAUSE_WEIGHT after it ("… after I filled up"). */
  weight: number;
};

/** Words after the first clause describe circumstances: they count, at half weight. */
export const LATER_CLAUSE_WEIGHT = 0.5;
export type ParsedQuery = {
  tokens: QueryToken[];
  /** Canonical form ("_vibration _brake") and literal form ("judder braking"), compared with each entry's phrases. */
  canonical: string;
  literal: string;
  /** Token keys (concept or stem), for comparing with an entry's phrases. */
  keys: string[];
  /** The last word is still being typed. */
  typing: boolean;
  /** "#1041": the user means a case number. */
  caseNumber: boolean;
  /** The query says a symptom is not there: "no grinding", "doesn't pull". */
  negated: boolean;
  /** The query says something works: "no problem opening it", "fine under braking". Every symptom is offered as absent. */
  allWell: boolean;
  /** Conditions the query names ("when braking" → braking). */
  conditions: Condition[];
  /** Valid SAE J2012 trouble codes typed in the query, upper case, in order. */
  codes: string[];
};

const CODE_SHAPE = /^[pcbu][0-9a-f]{4}$/;

export function parseQuery(raw: string): ParsedQuery {
  const ws = words(raw);
  const { tokens: analysed, negated, allWell } = analyseWithPolarity(ws);
  const typing = ws.length > 0 && !/\s$/.test(raw);
  const lastWord = ws[ws.length - 1];
  const tokens = analysed.map((t, i): QueryToken => ({
    word: t.word,
    concept: t.concept,
    prefix: typing && i === analysed.length - 1 && t.word === lastWord,
    stem: t.word ? porterStem(t.word) : null,
    weight: t.later ? LATER_CLAUSE_WEIGHT : 1,
  }));
  const stillTyping = tokens.length > 0 && tokens[tokens.length - 1].prefix;
  // Codes from the raw words (the plural stemmer never touches a word with digits).
  const codes: string[] = [];
  const raws = normaliseText(raw).split(" ");
  for (let i = 0; i < raws.length; i++) {
    // "P 0420" is the same code typed with a space.
    const w =
      /^[pcbu]$/.test(raws[i]) && /^[0-9a-f]{4}$/.test(raws[i + 1] ?? "") ? raws[i] + raws[++i] : raws[i];
    if (!CODE_SHAPE.test(w)) continue;
    const dtc = parseDtc(w);
    if (dtc.valid && !codes.includes(dtc.code)) codes.push(dtc.code);
  }
  return {
    tokens,
    canonical: canonical(analysed),
    literal: literal(analysed),
    keys: analysed.map(tokenKey),
    typing: stillTyping,
    caseNumber: /^\s*#\s*\d/.test(raw),
    negated,
    allWell,
    conditions: conditionsOf(analysed),
    codes,
  };
}
