// A senior grows and prunes the cause tree: a new component under a system or a new failure mode
// under a component, two causes of one level merged into one, and a new link from a cause to a
// symptom or check. Each is one transaction with a new knowledge-base version and an audit line.
import { and, eq, inArray, isNull, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db, Tx } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "~/db/schema";
import type { Priority } from "~/domain/knowledge";
import { describeStrength } from "~/domain/link-strength";
import { refuse, requireId } from "~/http/errors.server";
import { keyFor } from "./keys";
import { nextKbVersion } from "./version.server";

type Member = Pick<CurrentMember, "workshopId" | "userId" | "memberId">;
const NOT_FOUND = "No such cause in this workshop's knowledge base.";
const CHILD_LEVEL = { system: "component", component: "failure_mode" } as const;

export type NewCause = {
  name: string;
  description: string;
  ownerDescription: string;
  baseRate?: number;
  priority?: Priority;
  repairMinutes?: number;
  partsCost?: number;
};

async function liveCause(tx: Tx, workshopId: string, id: string) {
  requireId(id, NOT_FOUND);
  const [row] = await tx
    .select()
    .from(causes)
    .where(and(eq(causes.id, id), eq(causes.workshopId, workshopId)))
    .for("update");
  if (!row) refuse(404, NOT_FOUND);
  return row;
}

/** A component under a system, or a failure mode under a component; returns the new cause's id. */
export async function addCause(db: Db, member: Member, parentId: string, input: NewCause) {
  return db.transaction(async (tx) => {
    const parent = await liveCause(tx, member.workshopId, parentId);
    if (parent.retiredAt) refuse(409, "Nothing can be added under a retired cause.");
    if (parent.level === "failure_mode")
      refuse(400, "A failure mode is the end of a branch: add beside it instead.");
    const level = CHILD_LEVEL[parent.level];
    const leaf = level === "failure_mode";
    if (leaf && (input.baseRate === undefined || input.priority === undefined))
      refuse(400, "A failure mode needs a base rate and a priority.", {
        errors: {
          [input.baseRate === undefined ? "newBaseRate" : "newPriority"]: [
            "A failure mode needs a base rate and a priority.",
          ],
        },
      });
    const [clash] = await tx
      .select({ id: causes.id })
      .from(causes)
      .where(and(eq(causes.parentId, parentId), sql`lower(${causes.name}) = lower(${input.name})`));
    if (clash)
      refuse(400, "Another cause in the same place has that name.", {
        errors: { newName: ["Another cause in the same place has that name."] },
      });
    const [made] = await tx
      .insert(causes)
      .values({
        workshopId: member.workshopId,
        key: keyFor(input.name),
        parentId,
        level,
        name: input.name,
        system: parent.system,
        description: input.description,
        ownerDescription: input.ownerDescription,
        ...(leaf
          ? {
              baseRate: input.baseRate,
              priority: input.priority,
              repairMinutes: input.repairMinutes ?? null,
              partsCost: input.partsCost ?? null,
            }
          : {}),
      })
      .returning({ id: causes.id });
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Cause “${input.name}” added under “${parent.name}”`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.cause.add",
      entity: "cause",
      entityId: made.id,
      after: { name: input.name, under: parent.name, level, kbVersion, items: [made.id, parentId] },
    });
    return { id: made.id, kbVersion };
  });
}

/**
 * Merges one cause into another of the same level. Its links move to the other where the other
 * has no link of its own to the same symptom or check (the other's own strength stands); a
 * component's failure modes move under the other component. The merged cause is retired and
 * remembers where it went, so cases that name it still show it.
 */
export async function mergeCause(db: Db, member: Member, fromId: string, intoId: string) {
  if (fromId === intoId)
    refuse(400, "Choose another cause to merge it into.", {
      errors: { intoId: ["Choose another cause to merge it into."] },
    });
  return db.transaction(async (tx) => {
    const from = await liveCause(tx, member.workshopId, fromId);
    const into = await liveCause(tx, member.workshopId, intoId);
    if (from.retiredAt) refuse(409, "This cause is retired already.");
    if (into.retiredAt)
      refuse(400, "It cannot be merged into a retired cause.", {
        errors: { intoId: ["Choose a cause that is still ranked."] },
      });
    if (from.level !== into.level || from.level === "system")
      refuse(400, "Only two components, or two failure modes, merge.", {
        errors: { intoId: ["Choose a cause of the same level."] },
      });
    let moved = 0;
    let kept = 0;
    if (from.level === "component") {
      const children = await tx
        .update(causes)
        .set({ parentId: intoId, system: into.system })
        .where(and(eq(causes.parentId, fromId), isNull(causes.retiredAt)))
        .returning({ id: causes.id });
      moved = children.length;
    } else {
      const own = new Set(
        (
          await tx
            .select({ id: symptomLinks.symptomId })
            .from(symptomLinks)
            .where(eq(symptomLinks.causeId, intoId))
        ).map((r) => r.id),
      );
      const ownChecks = new Set(
        (
          await tx.select({ id: checkLinks.checkId }).from(checkLinks).where(eq(checkLinks.causeId, intoId))
        ).map((r) => r.id),
      );
      const sl = await tx
        .select({ id: symptomLinks.symptomId })
        .from(symptomLinks)
        .where(eq(symptomLinks.causeId, fromId));
      const cl = await tx
        .select({ id: checkLinks.checkId })
        .from(checkLinks)
        .where(eq(checkLinks.causeId, fromId));
      const slMove = sl.map((r) => r.id).filter((id) => !own.has(id));
      const clMove = cl.map((r) => r.id).filter((id) => !ownChecks.has(id));
      if (slMove.length)
        await tx
          .update(symptomLinks)
          .set({ causeId: intoId })
          .where(and(eq(symptomLinks.causeId, fromId), inArray(symptomLinks.symptomId, slMove)));
      if (clMove.length)
        await tx
          .update(checkLinks)
          .set({ causeId: intoId })
          .where(and(eq(checkLinks.causeId, fromId), inArray(checkLinks.checkId, clMove)));
      moved = slMove.length + clMove.length;
      kept = sl.length + cl.length - moved;
    }
    await tx.update(causes).set({ retiredAt: new Date(), mergedIntoId: intoId }).where(eq(causes.id, fromId));
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Cause “${from.name}” merged into “${into.name}”`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.cause.merge",
      entity: "cause",
      entityId: fromId,
      after: {
        name: from.name,
        into: into.name,
        level: from.level,
        moved,
        kept,
        kbVersion,
        items: [fromId, intoId],
      },
    });
    return { from: from.name, into: into.name, level: from.level, moved, kept, kbVersion };
  });
}

export type NewLink = { link: "symptom" | "check"; causeId: string; otherId: string; p: number };

/** A link the cause did not have: how often it shows a symptom, or how often a check fails for it. */
export async function addLink(db: Db, member: Member, link: NewLink) {
  const field = link.link === "symptom" ? "symptomId" : "checkId";
  requireId(link.otherId, "Choose one of this knowledge base's items.");
  return db.transaction(async (tx) => {
    const cause = await liveCause(tx, member.workshopId, link.causeId);
    if (cause.level !== "failure_mode")
      refuse(400, "Links go from a failure mode.", {
        errors: { [field]: ["Links go from a failure mode."] },
      });
    const table = link.link === "symptom" ? symptoms : checks;
    const [other] = await tx
      .select({ name: table.name })
      .from(table)
      .where(and(eq(table.id, link.otherId), eq(table.workshopId, member.workshopId)));
    if (!other)
      refuse(400, "Choose one of this knowledge base's items.", {
        errors: { [field]: ["Choose one of this knowledge base's items."] },
      });
    const inserted =
      link.link === "symptom"
        ? await tx
            .insert(symptomLinks)
            .values({
              workshopId: member.workshopId,
              symptomId: link.otherId,
              causeId: link.causeId,
              p: link.p,
            })
            .onConflictDoNothing()
            .returning({ p: symptomLinks.p })
        : await tx
            .insert(checkLinks)
            .values({
              workshopId: member.workshopId,
              checkId: link.otherId,
              causeId: link.causeId,
              pFail: link.p,
            })
            .onConflictDoNothing()
            .returning({ p: checkLinks.pFail });
    if (inserted.length === 0)
      refuse(409, `“${other.name}” is linked already: change its strength in the table.`, {
        errors: { [field]: [`“${other.name}” is linked already: change its strength in the table.`] },
      });
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Link “${cause.name}” – “${other.name}” added: ${describeStrength(link.p)}`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.link.add",
      entity: link.link === "symptom" ? "symptom_link" : "check_link",
      entityId: link.causeId,
      after: {
        p: link.p,
        link: link.link,
        cause: cause.name,
        other: other.name,
        kbVersion,
        items: [link.causeId, link.otherId],
      },
    });
    return { otherName: other.name, kbVersion };
  });
}
