// One cause of the knowledge base with its links, as its page shows them, and a senior's change of
// one link's strength: written with a new knowledge-base version and an audit row that says the
// change in words, before and after.
import { and, asc, eq, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "~/db/schema";
import { describeStrength, rescaleBands } from "~/domain/link-strength";
import { refuse, requireId } from "~/http/errors.server";
import { nextKbVersion } from "./version.server";

const NOT_FOUND = "No such cause in this workshop's knowledge base.";

/** One cause of the workshop, or a 404: what an action checks before it reads its form. */
export async function findCause(db: Db, workshopId: string, causeId: string) {
  requireId(causeId, NOT_FOUND);
  const [cause] = await db
    .select()
    .from(causes)
    .where(and(eq(causes.id, causeId), eq(causes.workshopId, workshopId)));
  if (!cause) refuse(404, NOT_FOUND);
  return cause;
}

/** The cause, its place in the tree, and its links to symptoms and checks, strongest first. */
export async function causeWithLinks(db: Db, workshopId: string, causeId: string) {
  const cause = await findCause(db, workshopId, causeId);
  const [parent] = cause.parentId
    ? await db
        .select({ id: causes.id, name: causes.name, parentId: causes.parentId })
        .from(causes)
        .where(eq(causes.id, cause.parentId))
    : [];
  const symptomRows = await db
    .select({
      id: symptoms.id,
      name: symptoms.name,
      kind: symptoms.kind,
      p: symptomLinks.p,
      when: symptomLinks.when,
    })
    .from(symptomLinks)
    .innerJoin(symptoms, eq(symptoms.id, symptomLinks.symptomId))
    .where(eq(symptomLinks.causeId, cause.id))
    .orderBy(sql`${symptomLinks.p} desc`, asc(symptoms.name));
  const checkRows = await db
    .select({
      id: checks.id,
      name: checks.name,
      minutes: checks.minutes,
      pFail: checkLinks.pFail,
      graded: checkLinks.graded,
    })
    .from(checkLinks)
    .innerJoin(checks, eq(checks.id, checkLinks.checkId))
    .where(eq(checkLinks.causeId, cause.id))
    .orderBy(sql`${checkLinks.pFail} desc`, asc(checks.name));
  return { cause, parent: parent ?? null, symptoms: symptomRows, checks: checkRows };
}

export type LinkChange = { link: "symptom" | "check"; causeId: string; otherId: string; p: number };

/** Sets one link's strength; a graded check link keeps its bands in proportion (rescaleBands). */
export async function setLinkStrength(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  change: LinkChange,
): Promise<{ before: number; after: number; causeName: string; otherName: string; kbVersion: number }> {
  requireId(change.causeId, NOT_FOUND);
  requireId(change.otherId, "No such link in this workshop's knowledge base.");
  return db.transaction(async (tx) => {
    const [cause] = await tx
      .select({ name: causes.name })
      .from(causes)
      .where(and(eq(causes.id, change.causeId), eq(causes.workshopId, member.workshopId)));
    if (!cause) refuse(404, NOT_FOUND);
    let before: number;
    let otherName: string;
    if (change.link === "symptom") {
      const [row] = await tx
        .select({ p: symptomLinks.p, name: symptoms.name })
        .from(symptomLinks)
        .innerJoin(symptoms, eq(symptoms.id, symptomLinks.symptomId))
        .where(and(eq(symptomLinks.causeId, change.causeId), eq(symptomLinks.symptomId, change.otherId)))
        .for("update");
      if (!row) refuse(404, "No such link in this workshop's knowledge base.");
      [before, otherName] = [row.p, row.name];
      await tx
        .update(symptomLinks)
        .set({ p: change.p })
        .where(and(eq(symptomLinks.causeId, change.causeId), eq(symptomLinks.symptomId, change.otherId)));
    } else {
      const [row] = await tx
        .select({ p: checkLinks.pFail, graded: checkLinks.graded, name: checks.name })
        .from(checkLinks)
        .innerJoin(checks, eq(checks.id, checkLinks.checkId))
        .where(and(eq(checkLinks.causeId, change.causeId), eq(checkLinks.checkId, change.otherId)))
        .for("update");
      if (!row) refuse(404, "No such link in this workshop's knowledge base.");
      [before, otherName] = [row.p, row.name];
      await tx
        .update(checkLinks)
        .set({ pFail: change.p, graded: row.graded ? rescaleBands(row.graded, change.p) : null })
        .where(and(eq(checkLinks.causeId, change.causeId), eq(checkLinks.checkId, change.otherId)));
    }
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Link “${cause.name}” – “${otherName}”: ${describeStrength(before)} → ${describeStrength(change.p)}`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.link",
      entity: change.link === "symptom" ? "symptom_link" : "check_link",
      entityId: change.causeId,
      before: { p: before },
      after: {
        p: change.p,
        link: change.link,
        cause: cause.name,
        other: otherName,
        kbVersion,
        items: [change.causeId, change.otherId],
      },
    });
    return { before, after: change.p, causeName: cause.name, otherName, kbVersion };
  });
}
