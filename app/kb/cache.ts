// One cache for everything built from a workshop's knowledge base: the loaded rows, Quick find's
// entries, compiled models. Keyed by workshop and knowledge-base version, plus what else the value
// depends on. Versions never change once made, so an entry is never stale; cases ranked under an
// older version keep theirs warm beside the newest. Bounded per cache; the least recently used
// entry goes first. Per process: app servers share nothing.

export type KbCache<T> = {
  get(workshopId: string, kbVersion: number, part: string, build: () => Promise<T> | T): Promise<T>;
  clear(): void;
  readonly size: number;
};

export function kbCache<T>(name: string, maxEntries = 200): KbCache<T> {
  // A Map iterates in insertion order: re-inserting on a hit makes the first key the least recent.
  const entries = new Map<string, Promise<T>>();
  return {
    async get(workshopId, kbVersion, part, build) {
      const key = `${name}|${workshopId}|${kbVersion}|${part}`;
      const hit = entries.get(key);
      if (hit) {
        entries.delete(key);
        entries.set(key, hit);
        return hit;
      }
      // The promise is cached, so requests arriving together build once; a failed build is forgotten.
      const value = Promise.resolve().then(build);
      value.catch(() => entries.delete(key));
      if (entries.size >= maxEntries) entries.delete(entries.keys().next().value!);
      entries.set(key, value);
      return value;
    },
    clear() {
      entries.clear();
    },
    get size() {
      return entries.size;
    },
  };
}
