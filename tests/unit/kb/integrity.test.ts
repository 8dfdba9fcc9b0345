// The rules across a knowledge-base document's items (app/domain/knowledge-integrity.ts), on the
// starter base and on small spoiled copies of it. Trouble codes are held to SAE J2012's shape
// (a letter P, C, B or U and four characters), rules to app/measure's compiler.
import { describe, expect, it } from "vitest";
import { missingCautions, neededCautions } from "~/domain/hazards";
import { documentProblems } from "~/domain/knowledge-integrity";
import type { KnowledgeItems } from "~/domain/knowledge-document";
import { starterKnowledgeBase } from "../../../seeds/kb";

const starter = starterKnowledgeBase as KnowledgeItems;
const spoilt = (f: (d: KnowledgeItems) => void) => {
  const d = structuredClone(starter);
  f(d);
  return documentProblems(d).map((p) => `${p.where}: ${p.message}`);
};

describe("knowledge-base integrity", () => {
  it("finds no problem in the starter base", () => {
    expect(documentProblems(starter)).toEqual([]);
  });

  it("names a failure mode hung straight under a system", () => {
    const said = spoilt((d) => {
      const fm = d.causes.find((c) => c.level === "failure_mode")!;
      fm.parentKey = d.causes.find((c) => c.level === "system")!.key;
    });
    expect(said.join("\n")).toMatch(/the parent of a failure mode is a component, and “.*” is a system/);
  });

  it("refuses a symptom linked to a tree node instead of a failure mode", () => {
    const said = spoilt((d) => {
      d.symptomLinks[0].cause = d.causes.find((c) => c.level === "component")!.key;
    });
    expect(said.join("\n")).toMatch(/a symptom links to a failure mode, not to a tree node/);
  });

  it("refuses the same pair linked twice", () => {
    expect(spoilt((d) => d.symptomLinks.push({ ...d.symptomLinks[0] })).join("\n")).toMatch(/linked twice/);
  });

  it("asks for lifting on a ramp check and for fuel on injector work (common practice, no published source)", () => {
    expect(
      neededCautions({ name: "Look underneath", instructions: ["Check the floor pan."], access: ["ramp"] }),
    ).toEqual(["lifting"]);
    expect(
      missingCautions({
        name: "Injector back-leak test",
        instructions: ["Disconnect the return pipes from each injector."],
        access: [],
        cautions: [],
      }),
    ).toContain("fuel");
  });
});
