// Building the index costs tens of milliseconds at 10,000 entries; typing must not pay that. The
// index is therefore built once per key and reused. A key names a scope and a version,
// "kb:<workshop id>#<kbVersion>": a new version for the same scope replaces the old one, so a
// curated knowledge base never serves stale synonyms and memory never grows with edits.
import { buildIndex, type QuickFindIndex } from "./build";
import type { Entry } from "./types";

const MAX_KEYS = 16; // a server process serves many workshops; keep the most recently used
const cache = new Map<string, QuickFindIndex>();

/** The cache key for a workshop's knowledge-base index (or another part, e.g. "fleet"). */
export function quickFindKey(workshopId: string, version: number | string, part = "kb"): string {
  return `${part}:${workshopId}#${version}`;
}

const scopeOf = (key: string) => {
  const hash = key.lastIndexOf("#");
  return hash < 0 ? key : key.slice(0, hash);
};

export function getIndex(cacheKey: string, build: () => Entry[]): QuickFindIndex {
  const hit = cache.get(cacheKey);
  if (hit) {
    // Re-insert so Map order doubles as least-recently-used order.
    cache.delete(cacheKey);
    cache.set(cacheKey, hit);
    return hit;
  }
  const scope = scopeOf(cacheKey);
  for (const key of [...cache.keys()]) if (scopeOf(key) === scope) cache.delete(key);
  const index = buildIndex(build());
  cache.set(cacheKey, index);
  while (cache.size > MAX_KEYS) cache.delete(cache.keys().next().value as string);
  return index;
}

/** Keys currently held, oldest first (for tests and diagnostics). */
export const cachedKeys = () => [...cache.keys()];

export function clearQuickFindCache() {
  cache.clear();
}
