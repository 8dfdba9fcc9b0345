import { randomUUID } from "node:crypto";
import { eq, getTableColumns, type SQL, sql } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import type { Db, Tx } from "~/db/client.server";
import { causes, checkLinks, checks, kbTemplates, symptomLinks, symptoms } from "~/db/schema";
import { refuse } from "~/http/errors.server";
import type { KnowledgeDocument, KnowledgeItems } from "~/domain/knowledge-document";

export type KbItemKind = "symptom" | "cause" | "check";
/** The row id an item gets in this workshop: random in the app, derived from the key by the seed. */
export type IdFor = (kind: KbItemKind, key: string) => string;

const randomIds: IdFor = () => randomUUID();

/**
 * Copies a knowledge base into one workshop's own tables, in the caller's transaction. By default
 * rows that exist already are left as they are, so a senior's curation survives a re-seed; an
 * import passes `onExisting: "update"`, and the document's version of an item replaces the row of
 * the same key (its id, and so every case that refers to it, stays).
 */
export async function copyKnowledgeBase(
  tx: Tx,
  workshopId: string,
  kb: KnowledgeItems,
  idFor: IdFor = randomIds,
  onExisting: "keep" | "update" = "keep",
) {
  // One id per key, however often the key is named by links.
  const ids = new Map<string, string>();
  const id = (kind: KbItemKind, key: string) => {
    const k = `${kind}:${key}`;
    let v = ids.get(k);
    if (!v) ids.set(k, (v = idFor(kind, key)));
    return v;
  };
  const update = onExisting === "update";
  if (kb.symptoms.length) {
    const q = tx
      .insert(symptoms)
      // code: the DTC itself for trouble-code symptoms, null for the rest.
      .values(
        kb.symptoms.map((s) => ({
          ...s,
          id: id("symptom", s.key),
          workshopId,
          code: s.code ?? null,
          unlisted: s.unlisted ?? null,
        })),
      );
    await (update
      ? q.onConflictDoUpdate({ target: [symptoms.workshopId, symptoms.key], set: replaced(symptoms) })
      : q.onConflictDoNothing());
  }
  // Parents before children: the tree's foreign key needs them in that order.
  for (const level of ["system", "component", "failure_mode"] as const) {
    const rows = kb.causes.filter((c) => c.level === level);
    if (rows.length === 0) continue;
    const q = tx.insert(causes).values(
      rows.map(({ parentKey, applicability, ...c }) => ({
        ...c,
        id: id("cause", c.key),
        workshopId,
        parentId: parentKey ? id("cause", parentKey) : null,
        applicability: applicability ?? {},
        // The owner summary's plain words: required on failure modes, empty on tree nodes.
        ownerDescription: c.ownerDescription ?? "",
        ifLeft: c.ifLeft ?? "",
        baseRate: c.baseRate ?? null,
        repairMinutes: c.repairMinutes ?? null,
        partsCost: c.partsCost ?? null,
        priority: c.priority ?? null,
      })),
    );
    await (update
      ? q.onConflictDoUpdate({ target: [causes.workshopId, causes.key], set: replaced(causes) })
      : q.onConflictDoNothing());
  }
  if (kb.checks.length) {
    const q = tx.insert(checks).values(
      kb.checks.map(({ result, ...c }) => ({
        ...c,
        id: id("check", c.key),
        workshopId,
        resultKind: result.kind,
        quantity: result.kind === "measurement" ? result.quantity : null,
        unit: result.kind === "measurement" ? result.unit : null,
        rule: result.kind === "measurement" ? result.rule : null,
        gradeScale: result.kind === "measurement" ? (result.gradeScale ?? null) : null,
        failMeans: result.failMeans,
      })),
    );
    await (update
      ? q.onConflictDoUpdate({ target: [checks.workshopId, checks.key], set: replaced(checks) })
      : q.onConflictDoNothing());
  }
  if (kb.symptomLinks.length) {
    const q = tx.insert(symptomLinks).values(
      kb.symptomLinks.map((l) => ({
        workshopId,
        symptomId: id("symptom", l.symptom),
        causeId: id("cause", l.cause),
        p: l.p,
        when: l.when ?? [],
      })),
    );
    await (update
      ? q.onConflictDoUpdate({
          target: [symptomLinks.symptomId, symptomLinks.causeId],
          set: replaced(symptomLinks),
        })
      : q.onConflictDoNothing());
  }
  if (kb.checkLinks.length) {
    const q = tx.insert(checkLinks).values(
      kb.checkLinks.map((l) => ({
        workshopId,
        checkId: id("check", l.check),
        causeId: id("cause", l.cause),
        pFail: l.pFail,
        graded: l.graded ?? null,
      })),
    );
    await (update
      ? q.onConflictDoUpdate({
          target: [checkLinks.checkId, checkLinks.causeId],
          set: replaced(checkLinks),
        })
      : q.onConflictDoNothing());
  }
}

// The columns an import replaces on a row of the same key: everything but its identity and birth.
const KEEP = new Set(["id", "workshop_id", "key", "created_at", "symptom_id", "cause_id", "check_id"]);
function replaced(table: PgTable) {
  const set: Record<string, SQL> = {};
  for (const [field, column] of Object.entries(getTableColumns(table)))
    if (!KEEP.has(column.name))
      set[field] = column.name === "updated_at" ? sql`now()` : sql.raw(`excluded."${column.name}"`);
  return set;
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
