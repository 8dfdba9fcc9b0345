// Builds the Quick find index once per entry set: every word, concept and code fragment is
// normalised here, so a keystroke only looks things up. Fuse gets pre-normalised documents and a
// prebuilt FuseIndex whose records are reused for whichever few candidates a query leaves.
import Fuse, { type FuseIndex, type IFuseOptions } from "fuse.js";
import { analyseWithPolarity, canonical, literal, tokenKey, type Token } from "./analyse";
import { hasDigit, porterStem, STOPWORDS, words } from "./normalise";
import { PostingTable } from "./postings";
import { ENTRY_KINDS, type Entry } from "./types";

export type { Postings } from "./postings";
export type FuseDoc = { title: string; keywords: string[]; subtitle: string };

export type QuickFindIndex = {
  entries: Entry[];
  kindOf: Uint8Array; // ENTRY_KINDS position per entry
  byId: Map<string, number>;
  words: PostingTable;
  wordList: string[]; // sorted, for prefix ranges
  concepts: PostingTable;
  codes: PostingTable; // inner fragments of VINs and registrations
  codeList: string[]; // sorted
  typoWords: Map<number, string[]>; // letters-only words of 4+ letters, by length
  phrases: string[][]; // canonical title and keyword phrases per entry
  literals: string[][]; // the same phrases word for word
  polarity: (FieldPolarity[] | null)[]; // symptoms only: each phrase's token keys and whether it is negative
  titleKeys: (ReadonlySet<string> | null)[]; // symptoms, causes and checks: the name's token keys
  dtcEntry: Map<string, number>; // trouble code (upper case) → the symptom entry that stands for it
  anyDtcEntry: number; // the generic "trouble code stored" symptom, or −1
  fuseDocs: FuseDoc[];
  fuseRecords: FuseIndex<FuseDoc>["records"];
  rerank: Fuse<FuseDoc>; // runs over a subset of fuseRecords per query
  rerankIndex: FuseIndex<FuseDoc>;
  scratch: { tok: Float32Array; total: Float32Array; cover: Uint8Array };
  builtMs: number;
};

// Where a word was found matters: the name is what the technician reads, synonyms and
// conditions back it up, the subtitle is context.
// A check's steps ("rock the wheel at 12 and 6 o'clock") find it too, below everything else.
export const FIELD_WEIGHT = { title: 1, keyword: 0.75, subtitle: 0.5, detail: 0.4 } as const;
const MIN_FRAGMENT = 3;

export const FUSE_KEYS = [
  { name: "title", weight: 3 },
  { name: "keywords", weight: 2 },
  { name: "subtitle", weight: 1 },
];
const FUSE_BASE: IFuseOptions<FuseDoc> = {
  keys: FUSE_KEYS,
  includeScore: true,
  ignoreLocation: true,
  threshold: 0.4,
};

/** Words, plus concepts, as one string for Fuse: "judder braking _vibration _brake". */
function fuseText(tokens: Token[]): string {
  const parts: string[] = [];
  for (const t of tokens) {
    parts.push(t.word ?? t.covered.join(" "));
    if (t.concept) parts.push(t.concept);
  }
  return parts.join(" ");
}

type FieldAnalysis = {
  words: string[];
  concepts: string[];
  fragments: string[];
  canonical: string;
  literal: string;
  fuse: string;
  polarity: FieldPolarity;
};
/** What one phrase of an entry says, for comparing its polarity (and word order) with a query's. */
export type FieldPolarity = { keys: ReadonlySet<string>; seq: readonly string[]; negated: boolean };

const fragmentMemo = new Map<string, string[]>();
/** Inner fragments of a code, from the second character on, at least MIN_FRAGMENT long. */
function fragmentsOf(code: string): string[] {
  let f = fragmentMemo.get(code);
  if (!f) {
    f = [];
    for (let k = 1; k <= code.length - MIN_FRAGMENT; k++) f.push(code.slice(k));
    if (fragmentMemo.size > 50_000) fragmentMemo.clear(); // a build-time helper, not a second cache
    fragmentMemo.set(code, f);
  }
  return f;
}

function analyseField(text: string): FieldAnalysis {
  const all = words(text);
  const { tokens, negated } = analyseWithPolarity(all);
  const seq = tokens.map(tokenKey);
  const polarity = { keys: new Set(seq), seq, negated };
  const out: FieldAnalysis = {
    words: [],
    concepts: [],
    fragments: [],
    canonical: canonical(tokens),
    literal: literal(tokens),
    fuse: fuseText(tokens),
    polarity,
  };
  for (const t of tokens) {
    if (t.word) {
      out.words.push(t.word);
      // The stem too, so "jerks" finds "jerking"; the word as written stays for prefixes.
      const stem = porterStem(t.word);
      if (stem !== t.word) out.words.push(stem);
    }
    if (t.concept) out.concepts.push(t.concept);
    out.words.push(...t.covered);
    // A VIN is typed in fragments, often from the middle: index its inner fragments.
    if (t.word && t.word.length >= 6 && hasDigit(t.word)) out.fragments.push(...fragmentsOf(t.word));
  }
  // "DEMO 101" is also typed "demo101": index the run-together form of short coded fields.
  const ws = all.filter((w) => !STOPWORDS.has(w));
  const compact = ws.join("");
  if (ws.length >= 2 && ws.length <= 4 && compact.length <= 10 && hasDigit(compact)) {
    out.words.push(compact);
    out.fragments.push(...fragmentsOf(compact));
  }
  return out;
}

export function buildIndex(entries: Entry[]): QuickFindIndex {
  const started = performance.now();
  const wordP = new PostingTable();
  const conceptP = new PostingTable();
  const codeP = new PostingTable();
  // Conditions, registrations and synonyms repeat across entries: analyse each text once.
  const analysed = new Map<string, FieldAnalysis>();
  const phrases: string[][] = [];
  const literals: string[][] = [];
  const polarity: (FieldPolarity[] | null)[] = [];
  const titleKeys: (ReadonlySet<string> | null)[] = [];
  const dtcEntry = new Map<string, number>();
  let anyDtcEntry = -1;
  const fuseDocs: FuseDoc[] = [];
  const byId = new Map<string, number>();
  const kindOf = new Uint8Array(entries.length);

  entries.forEach((e, i) => {
    if (!byId.has(e.id)) byId.set(e.id, i);
    kindOf[i] = ENTRY_KINDS.indexOf(e.kind);
    const own: string[] = [];
    const ownLiteral: string[] = [];
    const ownPolarity: FieldPolarity[] | null = e.kind === "symptom" ? [] : null;
    const field = (text: string, weight: number, phrase = true): string => {
      let a = analysed.get(text);
      if (!a) analysed.set(text, (a = analyseField(text)));
      for (const w of a.words) wordP.add(w, i, weight);
      for (const c of a.concepts) conceptP.add(c, i, weight);
      for (const f of a.fragments) codeP.add(f, i, weight);
      if (phrase && a.canonical) {
        own.push(a.canonical);
        ownLiteral.push(a.literal);
        ownPolarity?.push(a.polarity);
      }
      return a.fuse;
    };
    const title = field(e.title, FIELD_WEIGHT.title);
    titleKeys.push(
      e.kind === "symptom" || e.kind === "cause" || e.kind === "check"
        ? analysed.get(e.title)!.polarity.keys
        : null,
    );
    const keywords = e.keywords.map((k) => field(k, FIELD_WEIGHT.keyword));
    const subtitle = e.subtitle ? field(e.subtitle, FIELD_WEIGHT.subtitle) : "";
    for (const d of e.details ?? []) field(d, FIELD_WEIGHT.detail, false);
    if (e.dtc && !dtcEntry.has(e.dtc.toUpperCase())) dtcEntry.set(e.dtc.toUpperCase(), i);
    if (e.anyDtc && anyDtcEntry < 0) anyDtcEntry = i;
    phrases.push(own);
    literals.push(ownLiteral);
    polarity.push(ownPolarity);
    fuseDocs.push({ title, keywords, subtitle });
  });

  const wordsMap = wordP.finish();
  const codes = codeP.finish();
  const typoWords = new Map<number, string[]>();
  for (const w of wordsMap.terms()) {
    if (w.length < 4 || !/^[a-z]+$/.test(w)) continue;
    const list = typoWords.get(w.length) ?? [];
    list.push(w);
    typoWords.set(w.length, list);
  }

  const full = Fuse.createIndex(FUSE_KEYS, fuseDocs);
  const rerankIndex = Fuse.parseIndex<FuseDoc>({ keys: full.keys, records: [] });
  const rerank = new Fuse(
    fuseDocs,
    { ...FUSE_BASE, useExtendedSearch: true, shouldSort: false },
    rerankIndex,
  );

  return {
    entries,
    kindOf,
    byId,
    words: wordsMap,
    wordList: [...wordsMap.terms()].sort(),
    concepts: conceptP.finish(),
    codes,
    codeList: [...codes.terms()].sort(),
    typoWords,
    phrases,
    literals,
    polarity,
    titleKeys,
    dtcEntry,
    anyDtcEntry,
    fuseDocs,
    fuseRecords: full.records,
    rerank,
    rerankIndex,
    scratch: {
      tok: new Float32Array(entries.length),
      total: new Float32Array(entries.length),
      cover: new Uint8Array(entries.length),
    },
    builtMs: performance.now() - started,
  };
}
