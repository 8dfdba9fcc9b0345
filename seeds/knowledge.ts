import type { Db } from "../app/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "../app/db/schema";
import { seedId } from "./ids";
import type { KnowledgeBaseSeed } from "./kb/types";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

export const kbId = (workshopSlug: string, kind: "symptom" | "cause" | "check", key: string) =>
  seedId(`${workshopSlug}:${kind}:${key}`);

/**
 * Copies the starter knowledge base into one workshop. Rows that exist already are left as they
 * are, so a senior's curation survives a re-seed.
 */
export async function seedKnowledgeBase(tx: Tx, workshop: { id: string; slug: string }, kb: KnowledgeBaseSeed) {
  const sid = (key: string) => kbId(workshop.slug, "symptom", key);
  const cid = (key: string) => kbId(workshop.slug, "cause", key);
  const kid = (key: string) => kbId(workshop.slug, "check", key);

  await tx
    .insert(symptoms)
    // code: the DTC itself for trouble-code symptoms, null for the rest.
    .values(kb.symptoms.map((s) => ({ ...s, id: sid(s.key), workshopId: workshop.id, code: s.code ?? null })))
    .onConflictDoNothing();

  // Parents before children: the tree's foreign key needs them in that order.
  const byLevel = ["system", "component", "failure_mode"] as const;
  for (const level of byLevel) {
    const rows = kb.causes.filter((c) => c.level === level);
    if (rows.length === 0) continue;
    await tx
      .insert(causes)
      .values(
        rows.map(({ parentKey, applicability, ...c }) => ({
          ...c,
          id: cid(c.key),
          workshopId: workshop.id,
          parentId: parentKey ? cid(parentKey) : null,
          applicability: applicability ?? {},
          // The owner summary's plain words: required on failure modes, empty on tree nodes.
          ownerDescription: c.ownerDescription ?? "",
          ifLeft: c.ifLeft ?? "",
        })),
      )
      .onConflictDoNothing();
  }

  await tx
    .insert(checks)
    .values(
      kb.checks.map(({ result, ...c }) => ({
        ...c,
        id: kid(c.key),
        workshopId: workshop.id,
        resultKind: result.kind,
        quantity: result.kind === "measurement" ? result.quantity : null,
        unit: result.kind === "measurement" ? result.unit : null,
        rule: result.kind === "measurement" ? result.rule : null,
        failMeans: result.failMeans,
      })),
    )
    .onConflictDoNothing();

  await tx
    .insert(symptomLinks)
    .values(kb.symptomLinks.map((l) => ({ workshopId: workshop.id, symptomId: sid(l.symptom), causeId: cid(l.cause), p: l.p })))
    .onConflictDoNothing();
  await tx
    .insert(checkLinks)
    .values(kb.checkLinks.map((l) => ({ workshopId: workshop.id, checkId: kid(l.check), causeId: cid(l.cause), pFail: l.pFail })))
    .onConflictDoNothing();
}
