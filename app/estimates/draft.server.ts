import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db, Tx } from "~/db/client.server";
import { estimateItems, estimateLines } from "~/db/schema";
import type { Priority } from "~/domain/knowledge";
import type { SentLine } from "~/domain/estimate-document";
import { refuse } from "~/http/errors.server";
import { divRound, toBasisPoints } from "~/money";
import type { DraftItem } from "./document";
import { checkMinutes, type EstimateCase } from "./estimate-case.server";

type Who = Pick<CurrentMember, "workshopId" | "userId">;

export async function loadDraft(db: Db | Tx, workshopId: string, caseId: string): Promise<DraftItem[]> {
  const items = await db
    .select()
    .from(estimateItems)
    .where(and(eq(estimateItems.caseId, caseId), eq(estimateItems.workshopId, workshopId)))
    .orderBy(asc(estimateItems.position), asc(estimateItems.createdAt));
  const lines = items.length
    ? await db
        .select()
        .from(estimateLines)
        .where(
          inArray(
            estimateLines.itemId,
            items.map((i) => i.id),
          ),
        )
        .orderBy(asc(estimateLines.position), asc(estimateLines.createdAt))
    : [];
  return items.map((i) => ({
    id: i.id,
    title: i.title,
    priority: i.priority,
    required: i.required,
    lines: lines.filter((l) => l.itemId === i.id),
  }));
}

async function nextPosition(tx: Tx, caseId: string) {
  const [r] = await tx
    .select({ n: sql<number>`coalesce(max(${estimateItems.position}), -1) + 1` })
    .from(estimateItems)
    .where(eq(estimateItems.caseId, caseId));
  return Number(r.n);
}

/** Minutes → labour hours in thousandths, rounded up to the next quarter hour (common practice, no published source). */
export const billedHoursMilli = (minutes: number) => Math.ceil(minutes / 15) * 250;

/**
 * The first draft from the confirmed cause: the diagnostic fee (the checks done, at the labour
 * rate, owed whatever the owner decides) and the repair the knowledge base gives for the cause
 * (its typical parts and time). The advisor edits every figure before sending.
 */
export async function draftFromCause(db: Db, who: Who, c: EstimateCase) {
  if (!c.cause) refuse(409, "The case has no confirmed cause yet: conclude it first.");
  const cause = c.cause;
  const rateBp = toBasisPoints(c.taxRate);
  const labourMinor = Math.round(c.labourRatePerHour * 100);
  const taxed = (net: number) => (c.pricesIncludeTax ? net + divRound(net * rateBp, 10_000) : net);
  return db.transaction(async (tx) => {
    const existing = await loadDraft(tx, who.workshopId, c.id);
    const position = await nextPosition(tx, c.id);
    const made: string[] = [];
    if (!existing.some((i) => i.required)) {
      const minutes = await checkMinutes(tx, c.id);
      const [fee] = await tx
        .insert(estimateItems)
        .values({
          workshopId: who.workshopId,
          caseId: c.id,
          title: "Diagnosis",
          priority: "soon",
          required: true,
          position,
        })
        .returning({ id: estimateItems.id });
      await tx.insert(estimateLines).values({
        workshopId: who.workshopId,
        itemId: fee.id,
        kind: "diagnostic_fee",
        description: `Diagnostic time: the checks done on this case (${minutes} min)`,
        quantityMilli: Math.max(250, billedHoursMilli(minutes)),
        unitMinor: taxed(labourMinor),
        taxRateBp: rateBp,
      });
      made.push(fee.id);
    }
    if (!existing.some((i) => i.title === cause.name)) {
      const [repair] = await tx
        .insert(estimateItems)
        .values({
          workshopId: who.workshopId,
          caseId: c.id,
          title: cause.name,
          causeId: cause.id,
          priority: (cause.priority ?? "soon") as Priority,
          position: position + 1,
        })
        .returning({ id: estimateItems.id });
      const lines: (typeof estimateLines.$inferInsert)[] = [];
      if (cause.partsCost && cause.partsCost > 0)
        lines.push({
          workshopId: who.workshopId,
          itemId: repair.id,
          kind: "part",
          description: `Parts for: ${cause.name.toLowerCase()}`,
          quantityMilli: 1000,
          unitMinor: taxed(Math.round(cause.partsCost * 100)),
          taxRateBp: rateBp,
        });
      if (cause.repairMinutes && cause.repairMinutes > 0)
        lines.push({
          workshopId: who.workshopId,
          itemId: repair.id,
          kind: "labour",
          description: "Labour",
          quantityMilli: billedHoursMilli(cause.repairMinutes),
          unitMinor: taxed(labourMinor),
          taxRateBp: rateBp,
          position: 1,
        });
      if (lines.length) await tx.insert(estimateLines).values(lines);
      made.push(repair.id);
    }
    await audit(tx, {
      workshopId: who.workshopId,
      actorUserId: who.userId,
      action: "estimate.draft",
      entity: "case",
      entityId: c.id,
      after: { items: made, from: cause.id },
    });
    return made.length;
  });
}

export async function addItem(
  db: Db,
  who: Who,
  caseId: string,
  input: { title: string; priority: Priority },
) {
  return db.transaction(async (tx) => {
    const position = await nextPosition(tx, caseId);
    const [row] = await tx
      .insert(estimateItems)
      .values({ workshopId: who.workshopId, caseId, ...input, position })
      .returning({ id: estimateItems.id });
    await audit(tx, {
      workshopId: who.workshopId,
      actorUserId: who.userId,
      action: "estimate.item-add",
      entity: "case",
      entityId: caseId,
      after: input,
    });
    return row.id;
  });
}

/** A new line as typed: what a sent line keeps, less the amount worked out from it. */
export type LineInput = Omit<SentLine, "amountMinor"> & { itemId: string };

export async function addLine(db: Db, who: Who, caseId: string, line: LineInput) {
  await db.transaction(async (tx) => {
    const [item] = await tx
      .select({ id: estimateItems.id })
      .from(estimateItems)
      .where(
        and(
          eq(estimateItems.id, line.itemId),
          eq(estimateItems.caseId, caseId),
          eq(estimateItems.workshopId, who.workshopId),
        ),
      );
    if (!item)
      refuse(404, "That item is not on this estimate.", {
        errors: { itemId: ["Choose an item of this estimate."] },
      });
    const [{ n }] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(estimateLines)
      .where(eq(estimateLines.itemId, line.itemId));
    await tx.insert(estimateLines).values({ workshopId: who.workshopId, ...line, position: n });
    await audit(tx, {
      workshopId: who.workshopId,
      actorUserId: who.userId,
      action: "estimate.line-add",
      entity: "case",
      entityId: caseId,
      after: line,
    });
  });
}

export async function removeLine(db: Db, who: Who, caseId: string, lineId: string) {
  const gone = await db
    .delete(estimateLines)
    .where(
      and(
        eq(estimateLines.id, lineId),
        eq(estimateLines.workshopId, who.workshopId),
        inArray(
          estimateLines.itemId,
          db.select({ id: estimateItems.id }).from(estimateItems).where(eq(estimateItems.caseId, caseId)),
        ),
      ),
    )
    .returning({ id: estimateLines.id });
  if (!gone.length) refuse(404, "That line is not on this estimate.");
}

export async function removeItem(db: Db, who: Who, caseId: string, itemId: string) {
  const gone = await db
    .delete(estimateItems)
    .where(
      and(
        eq(estimateItems.id, itemId),
        eq(estimateItems.caseId, caseId),
        eq(estimateItems.workshopId, who.workshopId),
      ),
    )
    .returning({ id: estimateItems.id });
  if (!gone.length) refuse(404, "That item is not on this estimate.");
}
