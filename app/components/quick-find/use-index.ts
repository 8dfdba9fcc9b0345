// Entries → index for the palette, built only once the palette is first opened (the build is the
// one costly step) and, with a cache key, shared by every mount in the page's lifetime.
import { useEffect, useMemo, useState } from "react";
import { buildIndex, getIndex, type Entry, type QuickFindIndex } from "~/quick-find";

export type EntrySource = readonly Entry[] | (() => Promise<readonly Entry[]>);

export function useQuickFindIndex(source: EntrySource, cacheKey: string | undefined, wanted: boolean) {
  const [loaded, setLoaded] = useState<{ from: EntrySource; entries: readonly Entry[] } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const entries = typeof source === "function" ? (loaded?.from === source ? loaded.entries : null) : source;

  useEffect(() => {
    if (!wanted || typeof source !== "function" || loaded?.from === source) return;
    let live = true;
    setError(null);
    source().then(
      (list) => live && setLoaded({ from: source, entries: list }),
      () => live && setError("Quick find could not load its list. Close it and try again."),
    );
    return () => {
      live = false;
    };
  }, [wanted, source, loaded]);

  const index = useMemo<QuickFindIndex | null>(() => {
    if (!wanted || !entries) return null;
    const build = () => [...entries];
    return cacheKey ? getIndex(cacheKey, build) : buildIndex(build());
  }, [wanted, entries, cacheKey]);

  return { index, loading: wanted && !index && !error, error };
}
