// One symptom of the knowledge base with the causes it points to, and a senior's edit of its words:
// name, synonyms (Quick find reads them from the next version on), kind, conditions, leak, and a
// trouble code, which must parse as SAE J2012 (app/measure/dtc.ts).
import { and, asc, eq, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes, symptomLinks, symptoms } from "~/db/schema";
import type { SymptomKind, System } from "~/domain/knowledge";
import { refuse, requireId } from "~/http/errors.server";
import { parseDtc } from "~/measure/dtc";
import { keyFor } from "./keys";
import { nextKbVersion } from "./version.server";

const NOT_FOUND = "No such symptom in this workshop's knowledge base.";

export async function symptomWithLinks(db: Db, workshopId: string, symptomId: string) {
  requireId(symptomId, NOT_FOUND);
  const [symptom] = await db
    .select()
    .from(symptoms)
    .where(and(eq(symptoms.id, symptomId), eq(symptoms.workshopId, workshopId)));
  if (!symptom) refuse(404, NOT_FOUND);
  const pointsTo = await db
    .select({ id: causes.id, name: causes.name, p: symptomLinks.p })
    .from(symptomLinks)
    .innerJoin(causes, eq(causes.id, symptomLinks.causeId))
    .where(eq(symptomLinks.symptomId, symptomId))
    .orderBy(sql`${symptomLinks.p} desc`, asc(causes.name));
  return { symptom, pointsTo };
}

export type SymptomEdit = {
  name: string;
  synonyms: string[];
  kind: SymptomKind;
  code: string | null;
  conditions: string[];
  leak: number;
};

/** Problems of an edit by field, shown before anything is saved. */
export function symptomEditProblems(edit: SymptomEdit): Record<string, string[]> {
  if (edit.kind !== "trouble_code")
    return edit.code ? { code: ["Only a trouble-code symptom has a code."] } : {};
  if (!edit.code) return {};
  const parsed = parseDtc(edit.code);
  return parsed.valid ? {} : { code: [parsed.message] };
}

export async function updateSymptom(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  symptomId: string,
  edit: SymptomEdit,
) {
  requireId(symptomId, NOT_FOUND);
  const problems = symptomEditProblems(edit);
  const first = Object.values(problems)[0];
  if (first) refuse(400, first[0], { errors: problems });
  return db.transaction(async (tx) => {
    const [was] = await tx
      .select()
      .from(symptoms)
      .where(and(eq(symptoms.id, symptomId), eq(symptoms.workshopId, member.workshopId)))
      .for("update");
    if (!was) refuse(404, NOT_FOUND);
    const [clash] = await tx
      .select({ id: symptoms.id })
      .from(symptoms)
      .where(
        and(
          eq(symptoms.workshopId, member.workshopId),
          sql`lower(${symptoms.name}) = lower(${edit.name})`,
          sql`${symptoms.id} <> ${symptomId}`,
        ),
      );
    if (clash)
      refuse(400, "Another symptom has that name.", { errors: { name: ["Another symptom has that name."] } });
    const set = { ...edit, code: edit.code ? edit.code.toUpperCase() : null };
    const changed = (Object.keys(set) as (keyof typeof set)[]).filter(
      (k) => JSON.stringify(was[k]) !== JSON.stringify(set[k]),
    );
    if (changed.length === 0) return { changed, kbVersion: null };
    await tx
      .update(symptoms)
      .set({ ...set, updatedAt: new Date() })
      .where(eq(symptoms.id, symptomId));
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Symptom “${edit.name}” edited`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.symptom.update",
      entity: "symptom",
      entityId: symptomId,
      before: Object.fromEntries(changed.map((k) => [k, was[k]])),
      after: {
        ...Object.fromEntries(changed.map((k) => [k, set[k]])),
        name: edit.name,
        changed,
        kbVersion,
        items: [symptomId],
      },
    });
    return { changed, kbVersion };
  });
}

/** A new symptom, refused at its fields like an edit; Quick find offers it from the new version on. */
export async function addSymptom(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  edit: SymptomEdit & { system: System },
) {
  const problems = symptomEditProblems(edit);
  const first = Object.values(problems)[0];
  if (first) refuse(400, first[0], { errors: problems });
  return db.transaction(async (tx) => {
    const [clash] = await tx
      .select({ id: symptoms.id })
      .from(symptoms)
      .where(
        and(eq(symptoms.workshopId, member.workshopId), sql`lower(${symptoms.name}) = lower(${edit.name})`),
      );
    if (clash)
      refuse(400, "Another symptom has that name.", { errors: { name: ["Another symptom has that name."] } });
    const [made] = await tx
      .insert(symptoms)
      .values({ workshopId: member.workshopId, key: keyFor(edit.name), ...edit })
      .returning({ id: symptoms.id });
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Symptom “${edit.name}” added`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.symptom.add",
      entity: "symptom",
      entityId: made.id,
      after: { name: edit.name, kind: edit.kind, kbVersion, items: [made.id] },
    });
    return { id: made.id, kbVersion };
  });
}
