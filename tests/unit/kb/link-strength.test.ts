// Link strengths in words (app/domain/link-strength.ts): each word stands for one stated
// probability, a figure reads back as its nearest word, and what a senior types is read or refused.
// The scale is ours (docs/knowledge-format.md), not a published one: these checks hold it to itself.
import { describe, expect, it } from "vitest";
import { describeStrength, readStrength, STRENGTHS, strengthOf, wordFor } from "~/domain/link-strength";

describe("link strengths in words", () => {
  it("runs from almost always to rarely, strictly falling, inside (0, 1)", () => {
    const ps = STRENGTHS.map((s) => s.p);
    expect(ps).toEqual([...ps].sort((a, b) => b - a));
    expect(new Set(ps).size).toBe(ps.length);
    for (const p of ps) expect(p > 0 && p < 1).toBe(true);
  });

  it("reads every word back to its own figure, exactly", () => {
    for (const s of STRENGTHS) {
      expect(strengthOf(s.word)).toBe(s.p);
      expect(wordFor(s.p)).toEqual({ word: s.word, exact: true });
    }
    expect(strengthOf("  Usually ")).toBe(0.8);
    expect(strengthOf("mostly")).toBeNull();
  });

  it("names a figure between the words by the nearest one, marked about", () => {
    expect(describeStrength(0.8)).toBe("usually (80%)");
    expect(describeStrength(0.57)).toBe("about often (57%)");
    expect(describeStrength(0.02)).toBe("about rarely (2%)");
  });

  it("reads a word, a percentage or a probability, and refuses the rest with a message", () => {
    expect(readStrength("often")).toEqual({ p: 0.6 });
    expect(readStrength("40%")).toEqual({ p: 0.4 });
    expect(readStrength("0.4")).toEqual({ p: 0.4 });
    expect(readStrength("40")).toEqual({ p: 0.4 });
    expect(readStrength("100%")).toHaveProperty("error");
    expect(readStrength("0")).toHaveProperty("error");
    expect(readStrength("very")).toEqual({
      error: expect.stringMatching(/one of the words \(almost always, usually/),
    });
  });
});
