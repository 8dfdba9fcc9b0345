// The index cache: built once per workshop and knowledge-base version, replaced when the version moves.
import { afterEach, describe, expect, it } from "vitest";
import { cachedKeys, clearQuickFindCache, getIndex, quickFindKey, search } from "~/quick-find";
import { kbEntries } from "./fixtures";

afterEach(() => clearQuickFindCache());

describe("getIndex", () => {
  it("builds once per key and reuses the index", () => {
    let builds = 0;
    const build = () => (builds++, kbEntries);
    const a = getIndex(quickFindKey("ws-1", 3), build);
    const b = getIndex(quickFindKey("ws-1", 3), build);
    expect(b).toBe(a);
    expect(builds).toBe(1);
    expect(search(a, "judder when braking")[0].items[0].entry.id).toBe("vibration_braking");
  });

  it("drops the old version of the same workshop, keeps other workshops", () => {
    getIndex(quickFindKey("ws-1", 3), () => kbEntries);
    getIndex(quickFindKey("ws-2", 1), () => kbEntries);
    const edited = kbEntries.map((e) =>
      e.id === "vibration_braking" ? { ...e, keywords: [...e.keywords, "tramp"] } : e,
    );
    const next = getIndex(quickFindKey("ws-1", 4), () => edited);
    expect(cachedKeys()).toEqual(["kb:ws-2#1", "kb:ws-1#4"]);
    expect(search(next, "tramp")[0].items[0].entry.id).toBe("vibration_braking");
  });

  it("keeps the knowledge-base and fleet parts of one workshop apart", () => {
    getIndex(quickFindKey("ws-1", 3), () => kbEntries);
    getIndex(quickFindKey("ws-1", "2024-05-01T10:00", "fleet"), () => []);
    expect(cachedKeys()).toHaveLength(2);
  });

  it("holds a bounded number of keys, dropping the least recently used", () => {
    for (let i = 0; i < 20; i++) getIndex(quickFindKey(`ws-${i}`, 1), () => []);
    expect(cachedKeys()).toHaveLength(16);
    expect(cachedKeys()[0]).toBe("kb:ws-4#1");
  });
});
