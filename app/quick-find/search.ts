// Quick find's search: one or more indexes (say the knowledge base, cached per kbVersion, and the
// workshop's vehicles and cases, rebuilt when they change), one query, results grouped by kind in
// a fixed order so the palette never reshuffles its headings while the user types.
import type { QuickFindIndex } from "./build";
import { parseQuery } from "./query";
import { scoreIndex } from "./score";
import { ENTRY_KINDS, type EntryKind, type ResultGroup, type ScoredEntry, type SearchOptions } from "./types";

export const DEFAULT_LIMIT = 6;
/** Results weaker than this share of the best one are noise at that point of typing. */
export const RELATIVE_FLOOR = 0.45;
/**
 * A match covering a third of the query or less (mean per-word match quality ≤ 0.33, where the
 * word itself in the name is 1) is weak: on the benchmark's phrases such hits were nearly always
 * the wrong symptom. It is returned flagged, after the real results, never recorded by default.
 */
export const WEAK_QUALITY = 0.33;

export function search(
  index: QuickFindIndex | readonly QuickFindIndex[],
  query: string,
  opts: SearchOptions = {},
): ResultGroup[] {
  const indexes: readonly QuickFindIndex[] = Array.isArray(index) ? index : [index as QuickFindIndex];
  const limit = Math.max(1, opts.limit ?? DEFAULT_LIMIT);
  const recentIds = opts.recentIds ?? [];
  const parsed = parseQuery(query);
  let kinds = new Set<EntryKind>(opts.kinds ?? ENTRY_KINDS);
  if (parsed.caseNumber) kinds = new Set([...kinds].filter((k) => k === "case"));
  if (parsed.tokens.length === 0) return browse(indexes, kinds, recentIds, limit);

  const recent = new Set(recentIds);
  let scored: ScoredEntry[] = indexes.flatMap((ix) =>
    scoreIndex(ix, { query: parsed, kinds, recent, limit }),
  );
  for (const s of scored) s.weak = (s.quality ?? 1) <= WEAK_QUALITY;
  const best = scored.reduce((m, s) => Math.max(m, s.score), 0);
  scored = scored.filter((s) => s.score >= best * RELATIVE_FLOOR);
  if (parsed.codes.length && kinds.has("symptom")) scored = withCode(indexes, scored, parsed.codes[0], best);
  return group(scored, limit);
}

/**
 * A trouble code typed as a code lands on its own symptom, or else on the generic "trouble code
 * stored" symptom with the code kept, ahead of anything the words matched.
 */
function withCode(
  indexes: readonly QuickFindIndex[],
  scored: ScoredEntry[],
  code: string,
  best: number,
): ScoredEntry[] {
  let hit: { ix: QuickFindIndex; d: number } | null = null;
  for (const ix of indexes) {
    const d = ix.dtcEntry.get(code);
    if (d !== undefined) {
      hit = { ix, d };
      break;
    }
  }
  if (!hit) for (const ix of indexes) if (ix.anyDtcEntry >= 0 && !hit) hit = { ix, d: ix.anyDtcEntry };
  if (!hit) return scored;
  const entry = hit.ix.entries[hit.d];
  const rest = scored.filter((s) => s.entry !== entry);
  return [{ entry, score: Math.max(best, 1) + 1, quality: 1, weak: false, present: true, code }, ...rest];
}

function group(scored: ScoredEntry[], limit: number): ResultGroup[] {
  const groups: ResultGroup[] = [];
  for (const kind of ENTRY_KINDS) {
    // Real matches first; weak ones after them, flagged, so a weak hit is never the default pick.
    const items = scored
      .filter((s) => s.entry.kind === kind)
      .sort(
        (a, b) =>
          Number(a.weak === true) - Number(b.weak === true) ||
          b.score - a.score ||
          a.entry.title.localeCompare(b.entry.title),
      )
      .slice(0, limit);
    if (items.length) groups.push({ kind, items });
  }
  return groups;
}

/** Empty box: the user's recent items first, then the first few of each kind in the order given. */
function browse(
  indexes: readonly QuickFindIndex[],
  kinds: ReadonlySet<EntryKind>,
  recentIds: readonly string[],
  limit: number,
): ResultGroup[] {
  const recent: ScoredEntry[] = [];
  const shown = new Set<string>();
  for (const id of recentIds) {
    if (recent.length >= limit) break;
    for (const ix of indexes) {
      const i = ix.byId.get(id);
      if (i === undefined || shown.has(id) || !kinds.has(ix.entries[i].kind)) continue;
      shown.add(id);
      recent.push({ entry: ix.entries[i], score: 1 - recent.length / (limit + 1) });
    }
  }
  const groups: ResultGroup[] = recent.length ? [{ kind: "recent", items: recent }] : [];
  for (const kind of ENTRY_KINDS) {
    if (!kinds.has(kind)) continue;
    const items: ScoredEntry[] = [];
    for (const ix of indexes) {
      for (const entry of ix.entries) {
        if (items.length >= limit) break;
        if (entry.kind === kind && !shown.has(entry.id)) items.push({ entry, score: 0 });
      }
    }
    if (items.length) groups.push({ kind, items });
  }
  return groups;
}
