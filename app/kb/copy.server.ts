import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import type { Db, Tx } from "~/db/client.server";
import { causes, checkLinks, checks, kbTemplates, symptomLinks, symptoms } from "~/db/schema";
import { refuse } from "~/http/errors.server";
import type { KnowledgeDocument, KnowledgeItems } from "~/domain/knowledge-document";

export type KbItemKind = "symptom" | "cause" | "check";
/** The row id an item gets in this workshop: random in the app, derived from the key by the seed. */
export type IdFor = (kind: KbItemKind, key: string) => string;

const randomIds: IdFor = () => randomUUID();

/**
 * Copies a knowledge base into one workshop's own tables, in the caller's transaction. Rows that
 * exist already are left as they are, so a senior's curation survives a re-seed.
 */
export async function copyKnowledgeBase(
  tx: Tx,
  workshopId: string,
  kb: KnowledgeItems,
  idFor: IdFor = randomIds,
) {
  // One id per key, however often the key is named by links.
  const ids = new Map<string, string>();
  const id = (kind: KbItemKind, key: string) => {
    const k = `${kind}:${key}`;
    let v = ids.get(k);
    if (!v) ids.set(k, (v = idFor(kind, key)));
    return v;
  };
  if (kb.symptoms.length) {
    await tx
      .insert(symptoms)
      // code: the DTC itself for trouble-code symptoms, null for the rest.
      .values(kb.symptoms.map((s) => ({ ...s, id: id("symptom", s.key), workshopId, code: s.code ?? null })))
      .onConflictDoNothing();
  }
  // Parents before children: the tree's foreign key needs them in that order.
  for (const level of ["system", "component", "failure_mode"] as const) {
    const rows = kb.causes.filter((c) => c.level === level);
    if (rows.length === 0) continue;
    await tx
      .insert(causes)
      .values(
        rows.map(({ parentKey, applicability, ...c }) => ({
          ...c,
          id: id("cause", c.key),
          workshopId,
          parentId: parentKey ? id("cause", parentKey) : null,
          applicability: applicability ?? {},
          // The owner summary's plain words: required on failure modes, empty on tree nodes.
          ownerDescription: c.ownerDescription ?? "",
          ifLeft: c.ifLeft ?? "",
        })),
      )
      .onConflictDoNothing();
  }
  if (kb.checks.length) {
    await tx
      .insert(checks)
      .values(
        kb.checks.map(({ result, ...c }) => ({
          ...c,
          id: id("check", c.key),
          workshopId,
          resultKind: result.kind,
          quantity: result.kind === "measurement" ? result.quantity : null,
          unit: result.kind === "measurement" ? result.unit : null,
          rule: result.kind === "measurement" ? result.rule : null,
          failMeans: result.failMeans,
        })),
      )
      .onConflictDoNothing();
  }
  if (kb.symptomLinks.length) {
    await tx
      .insert(symptomLinks)
      .values(
        kb.symptomLinks.map((l) => ({
          workshopId,
          symptomId: id("symptom", l.symptom),
          causeId: id("cause", l.cause),
          p: l.p,
        })),
      )
      .onConflictDoNothing();
  }
  if (kb.checkLinks.length) {
    await tx
      .insert(checkLinks)
      .values(
        kb.checkLinks.map((l) => ({
          workshopId,
          checkId: id("check", l.check),
          causeId: id("cause", l.cause),
          pFail: l.pFail,
        })),
      )
      .onConflictDoNothing();
  }
}

/** The knowledge base a new workshop starts from: written by the seed (seeds/run.ts). */
export const STARTER_TEMPLATE = "starter";

export async function saveTemplate(db: Pick<Db, "insert">, key: string, document: KnowledgeDocument) {
  await db
    .insert(kbTemplates)
    .values({ key, document })
    .onConflictDoUpdate({ target: kbTemplates.key, set: { document, updatedAt: new Date() } });
}

export async function loadTemplate(db: Pick<Db, "select">, key: string): Promise<KnowledgeDocument> {
  const [row] = await db
    .select({ document: kbTemplates.document })
    .from(kbTemplates)
    .where(eq(kbTemplates.key, key));
  if (!row)
    refuse(
      503,
      "The starter knowledge base is not installed on this server yet (npm run db:seed writes it). Nothing was created.",
    );
  return row.document;
}
