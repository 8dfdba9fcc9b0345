// The text side of Quick find: normalising, the synonym table, phrases and typo distance.
import { describe, expect, it } from "vitest";
import { analyse, canonical } from "~/quick-find/analyse";
import { normaliseText, stem, words } from "~/quick-find/normalise";
import { parseQuery } from "~/quick-find/query";
import { SYNONYM_GROUPS } from "~/quick-find/synonyms";
import { editDistance, nearWords } from "~/quick-find/typo";

describe("normalising", () => {
  it("lower-cases, drops accents and apostrophes, turns punctuation into spaces", () => {
    expect(normaliseText("Won't START — Café/Check-engine!")).toBe("wont start cafe check engine");
  });

  it("stems plurals of words but never touches codes", () => {
    expect(["bumps", "batteries", "switches", "brakes", "glass", "bus"].map(stem)).toEqual([
      "bump",
      "battery",
      "switch",
      "brake",
      "glass",
      "bus",
    ]);
    expect(stem("9rl0r1br4n41002s")).toBe("9rl0r1br4n41002s");
  });
});

describe("synonym table", () => {
  it("puts no word or phrase in two groups (a word must mean one thing)", () => {
    const owner = new Map<string, string>();
    const clashes: string[] = [];
    for (const g of SYNONYM_GROUPS) {
      for (const m of g.members) {
        const key = words(m).join(" ");
        const had = owner.get(key);
        if (had && had !== g.concept) clashes.push(`${key}: ${had} / ${g.concept}`);
        owner.set(key, g.concept);
      }
    }
    expect(clashes).toEqual([]);
  });

  it("maps trade words of one group to one concept", () => {
    const c = (w: string) => analyse(w)[0]?.concept;
    expect(new Set(["judder", "shudder", "shake", "vibration"].map(c)).size).toBe(1);
    expect(c("knock")).toBe(c("clunk"));
    expect(c("squeal")).toBe(c("squeak"));
    expect(c("grind")).toBe(c("grinding"));
    expect(c("pulls")).toBe(c("drifts"));
    expect(c("drifts")).toBe(c("wanders"));
    expect(c("judder")).not.toBe(c("knock"));
  });

  it("turns owner phrases into the condition they describe, longest phrase first", () => {
    expect(canonical(analyse("judder when I brake"))).toBe(canonical(analyse("vibration under braking")));
    expect(canonical(analyse("drinks fuel"))).toBe(canonical(analyse("high fuel consumption")));
    expect(canonical(analyse("won't start"))).toBe(canonical(analyse("no crank")));
    expect(canonical(analyse("put my foot down"))).toBe("_accelerating");
    // "ticking over" is idling, not a tick
    expect(canonical(analyse("ticking over"))).toBe("_idle");
  });

  it("keeps a phrase's own words so a half-typed phrase still finds it", () => {
    const [t] = analyse("drinks fuel");
    expect(t).toMatchObject({ word: null, concept: "_consumption", covered: ["drink", "fuel"] });
  });
});

describe("queries", () => {
  it("treats the last word as unfinished until a space follows it", () => {
    expect(parseQuery("judder braki").tokens.map((t) => t.prefix)).toEqual([false, true]);
    expect(parseQuery("judder braki ").tokens.map((t) => t.prefix)).toEqual([false, false]);
  });

  it("drops stopwords and spots a case number", () => {
    // "when I brake" is an owner phrase: it becomes the braking concept as one token
    expect(parseQuery("the wheel shakes when I brake").tokens.map((t) => t.concept ?? t.word)).toEqual([
      "wheel",
      "_vibration",
      "_brake",
    ]);
    expect(parseQuery("#1041").caseNumber).toBe(true);
    expect(parseQuery("1041").caseNumber).toBe(false);
  });
});

describe("typo distance", () => {
  it("counts edits, with a swap of neighbours as one", () => {
    expect(editDistance("grindng", "grinding", 2)).toBe(1);
    expect(editDistance("vibraiton", "vibration", 2)).toBe(1);
    expect(editDistance("clunk", "clunk", 1)).toBe(0);
    expect(editDistance("brake", "smoke", 1)).toBe(2); // over the bound: reported as bound + 1
  });

  it("finds near words in a vocabulary, and none for short words", () => {
    const byLength = new Map<number, string[]>([
      [8, ["grinding", "steering"]],
      [5, ["clunk", "brake"]],
    ]);
    expect(nearWords("grindng", byLength, false)).toEqual(["grinding"]);
    expect(nearWords("brk", byLength, false)).toEqual([]);
    expect(nearWords("stee", byLength, true)).toEqual(["steering"]);
  });
});
