// An item's history in words: each changed field with its value before and after, probabilities as
// percentages, lists joined, long text shortened; link strengths in the documented words
// (docs/knowledge-base.md, app/domain/link-strength.ts). The entries are shaped as the kb editors
// write them (app/kb/*-edit.server.ts); the values are invented for the test.
import { describe, expect, it } from "vitest";
import { changesOf } from "~/audit/changes";

describe("an item's changes in words", () => {
  it("names each changed field of a symptom with its value before and after", () => {
    expect(
      changesOf({
        action: "kb.symptom.update",
        before: { synonyms: ["grinding brakes"], leak: 0.02 },
        after: {
          name: "Grinding when braking",
          changed: ["synonyms", "leak"],
          synonyms: ["grinding brakes", "scrapes"],
          leak: 0.035,
        },
      }),
    ).toEqual([
      { what: "The words people use for it", before: "grinding brakes", after: "grinding brakes; scrapes" },
      { what: "How often it shows without a listed cause", before: "2%", after: "3.5%" },
    ]);
  });

  it("quotes a cause's words, shortens long ones, and says none for an empty value", () => {
    const long = "x".repeat(400);
    const [name, description, partsCost] = changesOf({
      action: "kb.cause.update",
      before: { name: "Old name", description: null, partsCost: 40 },
      after: {
        name: "New name",
        changed: ["name", "description", "partsCost"],
        description: long,
        partsCost: 55,
      },
    });
    expect(name).toEqual({ what: "Its name", before: "“Old name”", after: "“New name”" });
    expect(description.before).toBe("none");
    expect(description.after.length).toBeLessThanOrEqual(162);
    expect(description.after.endsWith("…”")).toBe(true);
    expect(partsCost).toEqual({ what: "The parts cost", before: "40", after: "55" });
  });

  it("says an older entry's new value was not recorded rather than guessing", () => {
    expect(
      changesOf({
        action: "kb.check.update",
        before: { minutes: 10 },
        after: { name: "Run-out", changed: ["minutes"] },
      }),
    ).toEqual([{ what: "Its minutes", before: "10", after: "not recorded" }]);
  });

  it("puts a link's strength in the words for strength", () => {
    expect(
      changesOf({
        action: "kb.link",
        before: { p: 0.6 },
        after: { link: "symptom", cause: "Worn pads", other: "Squeal when braking", p: 0.05 },
      }),
    ).toEqual([
      {
        what: "How often “Worn pads” shows as “Squeal when braking”",
        before: "often (60%)",
        after: "rarely (5%)",
      },
    ]);
  });

  it("has nothing to list for entries that are not edits", () => {
    expect(changesOf({ action: "kb.cause.retire", before: null, after: { name: "Worn pads" } })).toEqual([]);
  });
});
