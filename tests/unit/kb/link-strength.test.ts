// Link strengths in words (app/domain/link-strength.ts): each word stands for one stated
// probability, a figure reads back as its nearest word, and what a senior types is read or refused.
// The scale is ours (docs/knowledge-format.md), not a published one: these checks hold it to itself.
import { describe, expect, it } from "vitest";
import { describeAudit } from "~/audit/describe";
import {
  describeStrength,
  readStrength,
  rescaleBands,
  STRENGTHS,
  strengthOf,
  wordFor,
} from "~/domain/link-strength";

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

  it("keeps a graded link's bands in proportion when its strength changes (sums checked by arithmetic)", () => {
    const b = rescaleBands({ well_within: 0.3, near: 0.1, beyond: 0.4, far_beyond: 0.2 }, 0.3);
    expect(b.beyond + b.far_beyond).toBeCloseTo(0.3, 12);
    expect(b.well_within + b.near + b.beyond + b.far_beyond).toBeCloseTo(1, 12);
    expect(b.beyond / b.far_beyond).toBeCloseTo(2, 12);
    expect(b.well_within / b.near).toBeCloseTo(3, 12);
    expect(rescaleBands({ well_within: 1, near: 0, beyond: 0, far_beyond: 0 }, 0.4)).toEqual({
      well_within: 0.6,
      near: 0,
      beyond: 0.2,
      far_beyond: 0.2,
    });
  });

  it("says a strength change in the audit log in words, before and after", () => {
    const text = describeAudit({
      action: "kb.link",
      before: { p: 0.8 },
      after: { p: 0.6, link: "symptom", cause: "Warped front disc", other: "Vibration under braking" },
    }).text;
    expect(text).toBe(
      "changed how often “Warped front disc” shows as “Vibration under braking”: from usually (80%) to often (60%)",
    );
  });

  it("says an import in the audit log in words, with what it added and updated", () => {
    const text = describeAudit({
      action: "kb.import",
      before: null,
      after: {
        name: "Shared base",
        kbVersion: 4,
        counts: {
          symptoms: { added: 1, updated: 220 },
          causes: { added: 0, updated: 215 },
          checks: { added: 2, updated: 0 },
        },
      },
    }).text;
    expect(text).toBe(
      "imported the knowledge base “Shared base” as version 4: 1 symptom added, 220 updated; 0 causes added, 215 updated; 2 checks added, 0 updated",
    );
  });

  it("says a proposal and its review in the audit log in words", () => {
    const after = {
      kind: "link",
      symptom: "Vibration under braking",
      cause: "Glazed pads",
      p: 0.35,
      comment: "Seen it.",
    };
    expect(describeAudit({ action: "kb.propose", before: null, after }).text).toBe(
      "proposed that “Glazed pads” shows as “Vibration under braking” sometimes (35%)",
    );
    expect(describeAudit({ action: "kb.proposal.accept", before: null, after }).text).toBe(
      "accepted the proposal that “Glazed pads” shows as “Vibration under braking” sometimes (35%): “Seen it.”",
    );
    expect(describeAudit({ action: "kb.proposal.reject", before: null, after }).href).toBe("/kb/proposals");
  });
});
