// A senior's edits of one cause of the tree: its words and figures, its place (a failure mode
// under another component, a component under another system) and its retirement. Each edit is one
// transaction with a new knowledge-base version and an audit row that names what changed.
import { isDeepStrictEqual } from "node:util";
import { and, eq, isNull, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes } from "~/db/schema";
import type { Applicability, Priority } from "~/domain/knowledge";
import { refuse, requireId } from "~/http/errors.server";
import { nextKbVersion } from "./version.server";

type Member = Pick<CurrentMember, "workshopId" | "userId" | "memberId">;
const NOT_FOUND = "No such cause in this workshop's knowledge base.";
const PARENT_LEVEL = { component: "system", failure_mode: "component" } as const;

export type CauseEdit = {
  name: string;
  parentId: string | null;
  description: string;
  ownerDescription: string;
  ifLeft: string;
  baseRate?: number;
  repairMinutes?: number;
  partsCost?: number;
  priority?: Priority;
  applicability?: Applicability;
};

/** A cause as it stands, as an edit: the base of a change to one part of it (its place, from the tree). */
export const editOf = (c: typeof causes.$inferSelect): CauseEdit => ({
  name: c.name,
  parentId: c.parentId,
  description: c.description,
  ownerDescription: c.ownerDescription,
  ifLeft: c.ifLeft,
  baseRate: c.baseRate ?? undefined,
  repairMinutes: c.repairMinutes ?? undefined,
  partsCost: c.partsCost ?? undefined,
  priority: c.priority ?? undefined,
});

/** Where a cause may move to: the nodes one level up, with their system, by name. */
export async function possibleParents(
  db: Db,
  workshopId: string,
  level: "system" | "component" | "failure_mode",
) {
  if (level === "system") return [];
  return db
    .select({ id: causes.id, name: causes.name, system: causes.system })
    .from(causes)
    .where(
      and(eq(causes.workshopId, workshopId), eq(causes.level, PARENT_LEVEL[level]), isNull(causes.retiredAt)),
    )
    .orderBy(causes.system, causes.name);
}

export async function updateCause(db: Db, member: Member, causeId: string, edit: CauseEdit) {
  requireId(causeId, NOT_FOUND);
  return db.transaction(async (tx) => {
    const [was] = await tx
      .select()
      .from(causes)
      .where(and(eq(causes.id, causeId), eq(causes.workshopId, member.workshopId)))
      .for("update");
    if (!was) refuse(404, NOT_FOUND);
    let system = was.system;
    let parentName: string | null = null;
    if (was.level !== "system") {
      if (!edit.parentId) refuse(400, "Choose where it belongs.");
      requireId(edit.parentId, "Choose where it belongs.");
      const [parent] = await tx
        .select({ level: causes.level, system: causes.system, name: causes.name })
        .from(causes)
        .where(
          and(
            eq(causes.id, edit.parentId),
            eq(causes.workshopId, member.workshopId),
            isNull(causes.retiredAt),
          ),
        );
      if (!parent || parent.level !== PARENT_LEVEL[was.level])
        refuse(400, `A ${was.level.replace("_", " ")} goes under a ${PARENT_LEVEL[was.level]}.`);
      system = parent.system;
      parentName = parent.name;
    }
    const [clash] = await tx
      .select({ id: causes.id })
      .from(causes)
      .where(
        and(
          eq(causes.workshopId, member.workshopId),
          sql`lower(${causes.name}) = lower(${edit.name})`,
          was.level === "system" ? isNull(causes.parentId) : eq(causes.parentId, edit.parentId!),
          sql`${causes.id} <> ${causeId}`,
        ),
      );
    if (clash) refuse(400, "Another cause in the same place has that name.");
    const leaf = was.level === "failure_mode";
    const set = {
      name: edit.name,
      parentId: was.level === "system" ? null : edit.parentId,
      system,
      description: edit.description,
      ownerDescription: edit.ownerDescription,
      ifLeft: edit.ifLeft,
      ...(leaf
        ? {
            baseRate: edit.baseRate,
            repairMinutes: edit.repairMinutes,
            partsCost: edit.partsCost,
            priority: edit.priority,
            ...(edit.applicability ? { applicability: edit.applicability } : {}),
          }
        : {}),
      updatedAt: new Date(),
    };
    const fields = [
      "name",
      "parentId",
      "description",
      "ownerDescription",
      "ifLeft",
      "baseRate",
      "repairMinutes",
      "partsCost",
      "priority",
      "applicability",
    ] as const;
    // Applicability is an object (jsonb keeps its keys in its own order): compared as a value.
    const same = (a: unknown, b: unknown) =>
      typeof a === "object" && a !== null ? isDeepStrictEqual(a, b) : String(a ?? "") === String(b ?? "");
    const changed = fields.filter((f) => f in set && !same(was[f], (set as Record<string, unknown>)[f]));
    // Saved as it was: no new version, no history line.
    if (changed.length === 0) return { changed, kbVersion: null, movedUnder: null };
    await tx.update(causes).set(set).where(eq(causes.id, causeId));
    // A component that moves to another system takes its failure modes along.
    if (was.level === "component" && system !== was.system)
      await tx.update(causes).set({ system }).where(eq(causes.parentId, causeId));
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Cause “${edit.name}” edited`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.cause.update",
      entity: "cause",
      entityId: causeId,
      before: { name: was.name, ...Object.fromEntries(changed.map((f) => [f, was[f]])) },
      after: {
        ...Object.fromEntries(changed.map((f) => [f, (set as Record<string, unknown>)[f]])),
        name: edit.name,
        changed,
        movedUnder: changed.includes("parentId") ? parentName : undefined,
        kbVersion,
        items: [causeId],
      },
    });
    return { changed, kbVersion, movedUnder: changed.includes("parentId") ? parentName : null };
  });
}

/** Retires a cause: no longer ranked, still shown on cases that refer to it. */
export async function retireCause(db: Db, member: Member, causeId: string) {
  requireId(causeId, NOT_FOUND);
  return db.transaction(async (tx) => {
    const [was] = await tx
      .select({ name: causes.name, retiredAt: causes.retiredAt })
      .from(causes)
      .where(and(eq(causes.id, causeId), eq(causes.workshopId, member.workshopId)))
      .for("update");
    if (!was) refuse(404, NOT_FOUND);
    if (was.retiredAt) refuse(409, "This cause is retired already.");
    const [live] = await tx
      .select({ id: causes.id })
      .from(causes)
      .where(and(eq(causes.parentId, causeId), isNull(causes.retiredAt)))
      .limit(1);
    if (live) refuse(409, "Retire or move what is under it first.");
    await tx.update(causes).set({ retiredAt: new Date() }).where(eq(causes.id, causeId));
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Cause “${was.name}” retired`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.cause.retire",
      entity: "cause",
      entityId: causeId,
      after: { name: was.name, kbVersion, items: [causeId] },
    });
    return { name: was.name, kbVersion };
  });
}
