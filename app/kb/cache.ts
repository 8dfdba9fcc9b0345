// One cache for everything built from a workshop's knowledge base: the loaded rows, Quick find's
// entries, compiled models. Keyed by workshop and knowledge-base version (bumped on every change
// to the base), plus what else the value depends on; a newer version drops the workshop's older
// entries at once. Bounded per cache; the oldest entry goes first. Per process: app servers share
// nothing, and a stale version is never read because the version is part of the key.

export type KbCache<T> = {
  get(workshopId: string, kbVersion: number, part: string, build: () => Promise<T> | T): Promise<T>;
  clear(): void;
  readonly size: number;
};

export function kbCache<T>(name: string, maxEntries = 200): KbCache<T> {
  const entries = new Map<string, Promise<T>>();
  const latest = new Map<string, number>(); // the newest version seen per workshop
  return {
    async get(workshopId, kbVersion, part, build) {
      const key = `${name}|${workshopId}|${kbVersion}|${part}`;
      const hit = entries.get(key);
      if (hit) return hit;
      if ((latest.get(workshopId) ?? -Infinity) < kbVersion) {
        latest.set(workshopId, kbVersion);
        const stale = `${name}|${workshopId}|`;
        for (const k of entries.keys())
          if (k.startsWith(stale) && !k.startsWith(`${stale}${kbVersion}|`)) entries.delete(k);
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
      latest.clear();
    },
    get size() {
      return entries.size;
    },
  };
}
