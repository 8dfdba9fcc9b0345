// A workshop's knowledge base out as one document of our own format, and a document in: checked
// whole (shape, then the rules across items) before anything is written, then written in one
// transaction that bumps the knowledge-base version and records who imported what. An item of a
// key the workshop already has is replaced in place (cases that refer to it keep their link); the
// import never deletes, because closed cases refer to what was there.
import { randomUUID } from "node:crypto";
import { and, eq, isNull } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms, workshops } from "~/db/schema";
import type { Applicability } from "~/domain/knowledge";
import {
  type CauseItem,
  type CheckItem,
  type KnowledgeDocument,
  KnowledgeDocumentSchema,
  type SymptomItem,
  toDocument,
} from "~/domain/knowledge-document";
import { documentProblems, type Problem } from "~/domain/knowledge-integrity";
import { copyKnowledgeBase, type KbItemKind } from "./copy.server";
import { nextKbVersion } from "./version.server";

const LEVEL_ORDER = { system: 0, component: 1, failure_mode: 2 } as const;
const byKey = (a: { key: string }, b: { key: string }) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0);
const orNone = <T>(v: T | null | undefined) => (v === null || v === undefined ? undefined : v);

/** The workshop's whole knowledge base as a document, in a stable order (by level, then key). */
export async function exportKnowledge(db: Db, workshopId: string): Promise<KnowledgeDocument> {
  const [[w], s, c, k, sl, cl] = await Promise.all([
    db.select({ name: workshops.name }).from(workshops).where(eq(workshops.id, workshopId)),
    db.select().from(symptoms).where(eq(symptoms.workshopId, workshopId)),
    // A retired cause is not exported: a file brings in what a workshop ranks with.
    db
      .select()
      .from(causes)
      .where(and(eq(causes.workshopId, workshopId), isNull(causes.retiredAt))),
    db.select().from(checks).where(eq(checks.workshopId, workshopId)),
    db.select().from(symptomLinks).where(eq(symptomLinks.workshopId, workshopId)),
    db.select().from(checkLinks).where(eq(checkLinks.workshopId, workshopId)),
  ]);
  const keyOf = new Map<string, string>([...s, ...c, ...k].map((r) => [r.id, r.key]));
  const symptomItems: SymptomItem[] = s
    .map((r) => ({
      key: r.key,
      name: r.name,
      synonyms: r.synonyms,
      system: r.system,
      kind: r.kind,
      code: orNone(r.code),
      conditions: r.conditions,
      leak: r.leak,
      unlisted: orNone(r.unlisted),
    }))
    .sort(byKey);
  const causeItems: CauseItem[] = c
    .map((r) => ({
      key: r.key,
      parentKey: r.parentId ? keyOf.get(r.parentId)! : null,
      level: r.level,
      name: r.name,
      system: r.system,
      description: r.description,
      ownerDescription: r.ownerDescription || undefined,
      ifLeft: r.ifLeft || undefined,
      baseRate: orNone(r.baseRate),
      repairMinutes: orNone(r.repairMinutes),
      partsCost: orNone(r.partsCost),
      priority: orNone(r.priority),
      applicability: Object.keys(r.applicability).length ? (r.applicability as Applicability) : undefined,
    }))
    .sort((a, b) => LEVEL_ORDER[a.level] - LEVEL_ORDER[b.level] || byKey(a, b));
  const checkItems: CheckItem[] = k
    .map((r) => ({
      key: r.key,
      name: r.name,
      instructions: r.instructions,
      tools: r.tools,
      minutes: r.minutes,
      consumablesCost: r.consumablesCost,
      access: r.access as CheckItem["access"],
      skill: r.skill,
      cautions: r.cautions as CheckItem["cautions"],
      result:
        r.resultKind === "measurement"
          ? {
              kind: "measurement" as const,
              quantity: r.quantity ?? "",
              unit: r.unit ?? "",
              rule: r.rule ?? "",
              failMeans: r.failMeans,
              gradeScale: orNone(r.gradeScale),
            }
          : { kind: "pass_fail" as const, failMeans: r.failMeans },
      falseAlarm: r.falseAlarm,
    }))
    .sort(byKey);
  const pairOrder = (a: [string, string], b: [string, string]) =>
    a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : a[1] < b[1] ? -1 : a[1] > b[1] ? 1 : 0;
  const doc = toDocument(w ? `${w.name} knowledge base` : "Knowledge base", {
    symptoms: symptomItems,
    causes: causeItems,
    checks: checkItems,
    symptomLinks: sl
      .filter((l) => keyOf.has(l.causeId))
      .map((l) => ({
        symptom: keyOf.get(l.symptomId)!,
        cause: keyOf.get(l.causeId)!,
        p: l.p,
        when: l.when.length ? (l.when as never) : undefined,
      }))
      .sort((a, b) => pairOrder([a.symptom, a.cause], [b.symptom, b.cause])),
    checkLinks: cl
      .filter((l) => keyOf.has(l.causeId))
      .map((l) => ({
        check: keyOf.get(l.checkId)!,
        cause: keyOf.get(l.causeId)!,
        pFail: l.pFail,
        graded: orNone(l.graded),
      }))
      .sort((a, b) => pairOrder([a.check, a.cause], [b.check, b.cause])),
  });
  // Leave out what is not there, so the document reads as the format describes it.
  return JSON.parse(JSON.stringify(doc)) as KnowledgeDocument;
}

export type ImportCounts = Record<"symptoms" | "causes" | "checks", { added: number; updated: number }> & {
  symptomLinks: number;
  checkLinks: number;
};
export type ImportAnswer =
  { ok: true; name: string; counts: ImportCounts; kbVersion: number } | { ok: false; problems: Problem[] };

/** Problems a document has, each naming its item: its shape first, then the rules across items. */
export function problemsOf(raw: unknown): { doc: KnowledgeDocument | null; problems: Problem[] } {
  const parsed = KnowledgeDocumentSchema.safeParse(raw);
  if (!parsed.success) {
    const items = (raw ?? {}) as Record<string, { key?: unknown }[] | undefined>;
    const shape = parsed.error.issues.map((i) => {
      const [list, index, ...rest] = i.path;
      const item = typeof list === "string" && typeof index === "number" ? items[list]?.[index] : undefined;
      const where =
        typeof list === "string" && typeof index === "number"
          ? `${list}.${index}${typeof item?.key === "string" ? ` (${item.key})` : ""}${rest.length ? `.${rest.join(".")}` : ""}`
          : i.path.join(".") || "the document";
      return { where, message: i.message };
    });
    return { doc: null, problems: [...shape, ...acrossItems(raw, shape)] };
  }
  const doc = parsed.data as KnowledgeDocument;
  return { doc, problems: documentProblems(doc) };
}

/**
 * The rules across items, tried on a document whose shape is wrong somewhere, so one pass names
 * every problem; an item too malformed for them to read is already named by its shape.
 */
function acrossItems(raw: unknown, shape: Problem[]): Problem[] {
  const lists = ["symptoms", "causes", "checks", "symptomLinks", "checkLinks"] as const;
  const r = raw as Record<string, unknown> | null;
  if (!r || typeof r !== "object" || lists.some((l) => !Array.isArray(r[l]))) return [];
  const flagged = new Set(shape.map((p) => p.where.split(" ")[0].split(".").slice(0, 2).join(".")));
  try {
    return documentProblems(r as unknown as KnowledgeDocument).filter(
      (p) => !flagged.has(p.where.split(" ")[0]),
    );
  } catch {
    return [];
  }
}

/** Imports a document into the member's workshop, or answers its problems and writes nothing. */
export async function importKnowledge(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  raw: unknown,
): Promise<ImportAnswer> {
  const { doc, problems } = problemsOf(raw);
  if (!doc || problems.length) return { ok: false, problems };
  try {
    return await db.transaction(async (tx) => {
      // The workshop's own ids for the keys it has: those rows are replaced in place.
      const existing = new Map<string, string>();
      // One after another: a transaction is one connection.
      const s = await tx
        .select({ id: symptoms.id, key: symptoms.key })
        .from(symptoms)
        .where(eq(symptoms.workshopId, member.workshopId));
      const c = await tx
        .select({ id: causes.id, key: causes.key })
        .from(causes)
        .where(eq(causes.workshopId, member.workshopId));
      const k = await tx
        .select({ id: checks.id, key: checks.key })
        .from(checks)
        .where(eq(checks.workshopId, member.workshopId));
      for (const [kind, rows] of [
        ["symptom", s],
        ["cause", c],
        ["check", k],
      ] as const)
        for (const r of rows) existing.set(`${kind}:${r.key}`, r.id);
      const count = (kind: KbItemKind, list: { key: string }[]) => {
        const updated = list.filter((i) => existing.has(`${kind}:${i.key}`)).length;
        return { added: list.length - updated, updated };
      };
      const counts: ImportCounts = {
        symptoms: count("symptom", doc.symptoms),
        causes: count("cause", doc.causes),
        checks: count("check", doc.checks),
        symptomLinks: doc.symptomLinks.length,
        checkLinks: doc.checkLinks.length,
      };
      await copyKnowledgeBase(
        tx,
        member.workshopId,
        doc,
        (kind, key) => existing.get(`${kind}:${key}`) ?? randomUUID(),
        "update",
      );
      const kbVersion = await nextKbVersion(tx, member.workshopId, `Imported “${doc.name}”`, member.memberId);
      await audit(tx, {
        workshopId: member.workshopId,
        actorUserId: member.userId,
        action: "kb.import",
        entity: "knowledge_base",
        after: { name: doc.name, counts, kbVersion },
      });
      return { ok: true as const, name: doc.name, counts, kbVersion };
    });
  } catch (error) {
    // A rule of the workshop's own tables (a tree node of this workshop made a failure mode while
    // its children stay, say): refused with the database's reason, and the transaction undone.
    const pg = error as {
      code?: string;
      detail?: string;
      message?: string;
      cause?: { code?: string; detail?: string; message?: string };
    };
    const e = pg.code ? pg : pg.cause;
    if (e?.code?.startsWith("23"))
      return {
        ok: false,
        problems: [
          {
            where: "the workshop's knowledge base",
            message: `the document conflicts with what the workshop has: ${e.detail ?? e.message}`,
          },
        ],
      };
    throw error;
  }
}

/** A file's text as a document to import, or the one problem that it is not JSON at all. */
export function readDocumentText(text: string): { raw: unknown } | { problem: Problem } {
  try {
    const raw: unknown = JSON.parse(text);
    // PostgreSQL stores no NUL character in text; say so rather than fail while writing.
    if (JSON.stringify(raw).includes("\\u0000"))
      return { problem: { where: "the file", message: "part of it holds a NUL character (\\0); remove it" } };
    return { raw };
  } catch (e) {
    return {
      problem: {
        where: "the file",
        message: `it is not JSON, so it cannot be a knowledge base (${(e as Error).message})`,
      },
    };
  }
}
