import { describe, expect, it, vi } from "vitest";
import { kbCache } from "~/kb/cache";

describe("the knowledge-base cache", () => {
  it("builds once per workshop, version and part, also for callers arriving together", async () => {
    const cache = kbCache<number>("t");
    const build = vi.fn(async () => 42);
    const [a, b] = await Promise.all([cache.get("w1", 3, "", build), cache.get("w1", 3, "", build)]);
    expect([a, b]).toEqual([42, 42]);
    expect(build).toHaveBeenCalledTimes(1);
    await cache.get("w1", 3, "other", build);
    await cache.get("w2", 3, "", build);
    expect(build).toHaveBeenCalledTimes(3);
  });

  it("keeps older versions beside newer ones, for cases still ranked under them", async () => {
    const cache = kbCache<string>("t");
    await cache.get("w1", 1, "", () => "v1");
    await cache.get("w1", 2, "", () => "v2");
    expect(cache.size).toBe(2);
    expect(await cache.get("w1", 1, "", () => "rebuilt")).toBe("v1");
  });

  it("forgets the least recently used entry first", async () => {
    const cache = kbCache<string>("t", 2);
    await cache.get("w", 1, "", () => "one");
    await cache.get("w", 2, "", () => "two");
    await cache.get("w", 1, "", () => "again"); // version 1 is now the most recent
    await cache.get("w", 3, "", () => "three"); // so version 2 goes
    expect(await cache.get("w", 1, "", () => "rebuilt")).toBe("one");
    expect(await cache.get("w", 2, "", () => "rebuilt")).toBe("rebuilt");
  });

  it("forgets a failed build and stays within its bound", async () => {
    const cache = kbCache<number>("t", 3);
    await expect(cache.get("w", 1, "x", () => Promise.reject(new Error("db down")))).rejects.toThrow(
      "db down",
    );
    await new Promise((r) => setTimeout(r, 0));
    expect(await cache.get("w", 1, "x", () => 7)).toBe(7);
    for (let i = 0; i < 5; i++) await cache.get("w", 1, `p${i}`, () => i);
    expect(cache.size).toBe(3);
  });
});
