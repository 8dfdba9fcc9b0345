// The knowledge-base document format (app/domain/knowledge-document.ts): the starter base is a valid document,
// and malformed items are refused with the item and the reason.
import { describe, expect, it } from "vitest";
import { KnowledgeDocumentSchema, toDocument } from "~/domain/knowledge-document";
import { starterKnowledgeBase } from "../../../seeds/kb";

const starter = toDocument("Starter", starterKnowledgeBase);

describe("the knowledge-base document", () => {
  it("holds the whole starter base and survives a JSON round trip unchanged", () => {
    const parsed = KnowledgeDocumentSchema.parse(JSON.parse(JSON.stringify(starter)));
    expect(parsed.symptoms).toHaveLength(starterKnowledgeBase.symptoms.length);
    expect(JSON.parse(JSON.stringify(parsed))).toEqual(JSON.parse(JSON.stringify(starter)));
  });

  it("refuses a probability of 1.7, an unknown kind and a malformed code, naming where", () => {
    const bad = structuredClone(starter);
    bad.symptomLinks[3].p = 1.7;
    (bad.symptoms[0] as { kind: string }).kind = "rumble";
    bad.symptoms[1].code = "Q1234";
    const result = KnowledgeDocumentSchema.safeParse(bad);
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    expect(paths).toEqual(
      expect.arrayContaining([
        "symptomLinks.3.p: a probability is at most 1",
        expect.stringMatching(/^symptoms\.0\.kind: /),
        "symptoms.1.code: a trouble code is a letter P, C, B or U and four characters, such as P0420",
      ]),
    );
  });

  it("refuses a document of another format", () => {
    expect(
      KnowledgeDocumentSchema.safeParse({ ...starter, format: "something-else" }).error!.issues[0].message,
    ).toMatch(/not a Ramplight knowledge base/);
  });
});
