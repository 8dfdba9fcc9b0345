// Knowledge-base export and import against the real database (docs/knowledge-format.md): a round
// trip through an empty workshop is lossless, a re-import replaces rows in place, and every kind
// of malformed document is refused with the item and the reason while nothing at all is written.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, causes, checkLinks, checks, symptomLinks, symptoms, workshops } from "~/db/schema";
import type { KnowledgeDocument } from "~/domain/knowledge-document";
import { exportKnowledge, importKnowledge, readDocumentText } from "~/kb/transfer.server";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";
import { memberFor } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const withoutName = ({ name: _n, ...rest }: KnowledgeDocument) => rest;

async function emptyWorkshop(slug: string) {
  const [w] = await db()
    .insert(workshops)
    .values({
      slug,
      name: `Empty ${slug}`,
      country: "GB",
      currency: "GBP",
      taxRate: 0.2,
      labourRatePerHour: 80,
    })
    .returning({ id: workshops.id });
  return w.id;
}

/** Everything an import could touch, counted: rows per table, audit rows and the version. */
async function footprint() {
  const n = async (
    t:
      | typeof symptoms
      | typeof causes
      | typeof checks
      | typeof symptomLinks
      | typeof checkLinks
      | typeof auditLog,
  ) => (await db().select({ n: count() }).from(t))[0].n;
  const versions = await db().select({ id: workshops.id, v: workshops.kbVersion }).from(workshops);
  return {
    symptoms: await n(symptoms),
    causes: await n(causes),
    checks: await n(checks),
    symptomLinks: await n(symptomLinks),
    checkLinks: await n(checkLinks),
    audit: await n(auditLog),
    versions,
  };
}

describe("knowledge-base export and import", () => {
  it("exports, imports into an empty workshop and exports again to the same document", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const first = await exportKnowledge(db(), BRAMBLEGATE);
    expect(first.symptoms.length).toBeGreaterThanOrEqual(110);
    // The empty workshop's own admin: the import acts for a member of the target workshop.
    const target = await emptyWorkshop("empty-round-trip");
    const answer = await importKnowledge(
      db(),
      { workshopId: target, userId: senior.userId, memberId: senior.memberId },
      first,
    );
    expect(answer.ok, JSON.stringify(answer)).toBe(true);
    if (!answer.ok) return;
    expect(answer.counts.symptoms).toEqual({ added: first.symptoms.length, updated: 0 });
    expect(answer.counts.causes.added).toBe(first.causes.length);
    const second = await exportKnowledge(db(), target);
    expect(withoutName(second)).toEqual(withoutName(first));
    // Through JSON text as a file carries it, too.
    const read = readDocumentText(JSON.stringify(second));
    expect("raw" in read && withoutName(read.raw as KnowledgeDocument)).toEqual(withoutName(first));
  });

  it("keeps what the starter base says beyond the basic figures: graded links, conditions, unlisted rates", async () => {
    const doc = await exportKnowledge(db(), BRAMBLEGATE);
    expect(doc.checkLinks.some((l) => l.graded)).toBe(true);
    expect(doc.symptomLinks.some((l) => l.when?.length)).toBe(true);
    expect(doc.symptoms.some((s) => s.unlisted !== undefined)).toBe(true);
    expect(doc.checks.some((c) => c.result.kind === "measurement" && c.result.gradeScale)).toBe(true);
  });

  it("re-imports into the same workshop in place: same row ids, a new version, one audit row in words' reach", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const doc = await exportKnowledge(db(), BRAMBLEGATE);
    const idsBefore = await db()
      .select({ id: symptoms.id, key: symptoms.key })
      .from(symptoms)
      .where(eq(symptoms.workshopId, BRAMBLEGATE));
    const before = await footprint();
    const edited = structuredClone(doc);
    edited.symptoms[0].synonyms = [...edited.symptoms[0].synonyms, "a word added on import"];
    const answer = await importKnowledge(db(), senior, edited);
    expect(answer.ok).toBe(true);
    if (!answer.ok) return;
    expect(answer.counts.symptoms).toEqual({ added: 0, updated: doc.symptoms.length });
    const after = await footprint();
    expect(after.symptoms).toBe(before.symptoms);
    expect(after.audit).toBe(before.audit + 1);
    const v = (f: typeof before) => f.versions.find((x) => x.id === BRAMBLEGATE)!.v;
    expect(v(after)).toBe(v(before) + 1);
    const idsAfter = await db()
      .select({ id: symptoms.id, key: symptoms.key })
      .from(symptoms)
      .where(eq(symptoms.workshopId, BRAMBLEGATE));
    expect(new Map(idsAfter.map((r) => [r.key, r.id]))).toEqual(new Map(idsBefore.map((r) => [r.key, r.id])));
    const [row] = await db()
      .select({ synonyms: symptoms.synonyms })
      .from(symptoms)
      .where(eq(symptoms.id, idsBefore.find((r) => r.key === doc.symptoms[0].key)!.id));
    expect(row.synonyms).toContain("a word added on import");
  });

  describe("refuses a malformed document, naming the item and the reason, and writes nothing", () => {
    const cases: [string, (d: KnowledgeDocument) => unknown, RegExp][] = [
      [
        "a probability of 1.7",
        (d) => ((d.symptomLinks[0].p = 1.7), d),
        /^symptomLinks\.0.*p: a probability is at most 1/,
      ],
      [
        "a link to an unknown cause",
        (d) => ((d.symptomLinks[0].cause = "no_such_cause"), d),
        /symptomLinks\.0 .*no cause has the key “no_such_cause”/,
      ],
      [
        "a link to an unknown check",
        (d) => ((d.checkLinks[0].check = "no_such_check"), d),
        /checkLinks\.0 .*no check has the key “no_such_check”/,
      ],
      [
        "a loop in the cause tree",
        (d) => {
          const system = d.causes.find((c) => c.level === "system")!;
          const component = d.causes.find((c) => c.parentKey === system.key)!;
          system.parentKey = component.key;
          return d;
        },
        /the cause tree loops back/,
      ],
      [
        "two symptoms of the same name",
        (d) => ((d.symptoms[1].name = d.symptoms[0].name), d),
        /symptoms\.1 .*is already the name of symptom/,
      ],
      [
        "two items of the same key",
        (d) => ((d.checks[1].key = d.checks[0].key), d),
        /the key “.*” is used by two checks/,
      ],
      [
        "a hazardous check without its caution",
        (d) => {
          const c = d.checks.find((x) => x.cautions.includes("brake_hydraulics"))!;
          c.cautions = c.cautions.filter((x) => x !== "brake_hydraulics");
          return d;
        },
        /its work calls for a caution it does not carry: .*brake hydraulics/,
      ],
      [
        "a trouble code that does not parse",
        (d) => ((d.symptoms.find((s) => s.code)!.code = "P04"), d),
        /code/,
      ],
      [
        "a rule that does not compile",
        (d) => {
          const c = d.checks.find((x) => x.result.kind === "measurement")!;
          (c.result as { rule: string }).rule = "value <= <= 3 mm";
          return d;
        },
        /rule/,
      ],
      ["another format", (d) => ({ ...d, format: "spreadsheet" }), /not a Ramplight knowledge base/],
      ["not an object at all", () => [1, 2, 3], /./],
    ];
    for (const [what, spoil, message] of cases) {
      it(what, async () => {
        const senior = await memberFor(db(), "tomas-varga");
        const doc = await exportKnowledge(db(), BRAMBLEGATE);
        const before = await footprint();
        const answer = await importKnowledge(db(), senior, spoil(structuredClone(doc)));
        expect(answer.ok).toBe(false);
        if (answer.ok) return;
        const said = answer.problems.map((p) => `${p.where}: ${p.message}`);
        expect(
          said.some((s) => message.test(s)),
          said.join("\n"),
        ).toBe(true);
        expect(await footprint()).toEqual(before);
      });
    }

    it("names every problem in one pass: a shape problem does not hide a missing caution", async () => {
      const senior = await memberFor(db(), "tomas-varga");
      const doc = await exportKnowledge(db(), BRAMBLEGATE);
      doc.symptomLinks[0].p = 1.7;
      const bleed = doc.checks.find((x) => x.cautions.includes("brake_hydraulics"))!;
      bleed.cautions = bleed.cautions.filter((x) => x !== "brake_hydraulics");
      const answer = await importKnowledge(db(), senior, doc);
      expect(answer.ok).toBe(false);
      const said = answer.ok ? [] : answer.problems.map((p) => `${p.where}: ${p.message}`);
      expect(said).toEqual(
        expect.arrayContaining([
          expect.stringMatching(/^symptomLinks\.0.*a probability is at most 1/),
          expect.stringMatching(new RegExp(`^checks\\.\\d+ \\(${bleed.key}\\): .*brake hydraulics`)),
        ]),
      );
    });

    it("a file that is not JSON", () => {
      const read = readDocumentText("{ this is not json");
      expect("problem" in read && read.problem.message).toMatch(/not JSON/);
    });
  });
});
