import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { Db } from "~/db/client.server";
import { cases, members, ownerDecisions, ownerLinks, payments, sentEstimates, users } from "~/db/schema";
import type { Decision } from "~/domain/owner-side";
import { refuse } from "~/http/errors.server";
import { queueMail } from "~/mail/outbox.server";
import { formatMinor } from "~/money";
import { totalsOf } from "./document";
import { hashOwnerToken, wellFormedToken } from "./owner-token.server";

// One answer for every link that does not work (unknown, tampered, expired, revoked, superseded),
// so a guess learns nothing about which it was.
export const NOT_VALID = "This link does not work any more. Ask the workshop to send you a new one.";

/** The sent estimate behind an owner's token, or a 404 with the one message. Records nothing. */
export async function findOwnerLink(db: Db, token: string) {
  if (!wellFormedToken(token)) refuse(404, NOT_VALID);
  const [row] = await db
    .select({ link: ownerLinks, sent: sentEstimates })
    .from(ownerLinks)
    .innerJoin(sentEstimates, eq(sentEstimates.id, ownerLinks.sentEstimateId))
    .where(eq(ownerLinks.tokenHash, hashOwnerToken(token)));
  if (!row || row.link.revokedAt || row.link.expiresAt.getTime() <= Date.now()) refuse(404, NOT_VALID);
  const decisions = await db
    .select({ itemId: ownerDecisions.itemId, decision: ownerDecisions.decision })
    .from(ownerDecisions)
    .where(eq(ownerDecisions.sentEstimateId, row.sent.id));
  return { ...row, decisions: new Map(decisions.map((d) => [d.itemId, d.decision])) };
}
export type OwnerLink = Awaited<ReturnType<typeof findOwnerLink>>;

/** Opening the page is recorded (count, first and last time); the first opening is audited. */
export async function recordOpen(db: Db, found: OwnerLink) {
  const [r] = await db
    .update(ownerLinks)
    .set({
      openCount: sql`${ownerLinks.openCount} + 1`,
      lastOpenedAt: new Date(),
      firstOpenedAt: sql`coalesce(${ownerLinks.firstOpenedAt}, now())`,
    })
    .where(eq(ownerLinks.id, found.link.id))
    .returning({ openCount: ownerLinks.openCount });
  if (r?.openCount === 1)
    await audit(db, {
      workshopId: found.sent.workshopId,
      actorUserId: null,
      action: "owner.opened",
      entity: "case",
      entityId: found.sent.caseId,
      after: { version: found.sent.version },
    });
}

/**
 * The owner's answer: a word on every item they can decide on, and a note. Once: a second answer
 * is refused (the workshop may send a new estimate). The case's technician and the advisor who
 * sent it are told by e-mail, queued in the same transaction.
 */
export async function answerEstimate(
  db: Db,
  token: string,
  input: { decisions: Record<string, Decision>; note: string },
) {
  const found = await findOwnerLink(db, token);
  const doc = found.sent.document;
  const open = doc.items.filter((i) => !i.required);
  const missing = open.filter((i) => !input.decisions[i.id]);
  if (missing.length)
    refuse(400, "Choose approve or decline for every item.", {
      errors: Object.fromEntries(missing.map((i) => [`item-${i.id}`, ["Choose approve or decline."]])),
    });
  return db.transaction(async (tx) => {
    const [locked] = await tx
      .select({ answeredAt: sentEstimates.answeredAt })
      .from(sentEstimates)
      .where(eq(sentEstimates.id, found.sent.id))
      .for("update");
    if (locked.answeredAt)
      refuse(409, "You have already answered this estimate. Call the workshop to change your answer.");
    await tx
      .insert(ownerDecisions)
      .values(
        open.map((i) => ({ sentEstimateId: found.sent.id, itemId: i.id, decision: input.decisions[i.id] })),
      );
    await tx
      .update(sentEstimates)
      .set({ answeredAt: new Date(), ownerNote: input.note || null })
      .where(eq(sentEstimates.id, found.sent.id));
    const approved = new Set(open.filter((i) => input.decisions[i.id] === "approved").map((i) => i.id));
    const total = totalsOf(doc, approved).gross;
    await audit(tx, {
      workshopId: found.sent.workshopId,
      actorUserId: null,
      action: "owner.answered",
      entity: "case",
      entityId: found.sent.caseId,
      after: { version: found.sent.version, approved: approved.size, of: open.length, total },
    });
    const words = `${doc.ownerName} approved ${approved.size} of ${open.length} items on case ${doc.caseNumber} (${doc.registration}), ${formatMinor(total, doc.currency)} in all.`;
    for (const to of await noticeAddresses(tx as unknown as Db, found.sent.caseId, found.sent.sentById))
      await queueMail(tx, {
        workshopId: found.sent.workshopId,
        caseId: found.sent.caseId,
        kind: "owner-answered",
        to,
        subject: `Case ${doc.caseNumber}: the owner answered the estimate`,
        text: [
          words,
          "",
          ...open.map((i) => `${input.decisions[i.id] === "approved" ? "Approved" : "Declined"}: ${i.title}`),
          ...(input.note ? ["", `Their note: ${input.note}`] : []),
        ].join("\n"),
      });
    return { approved: approved.size, of: open.length, total };
  });
}

/** The e-mail of the case's technician and of the advisor who sent the estimate, once each. */
async function noticeAddresses(db: Db, caseId: string, sentById: string | null) {
  const [c] = await db.select({ assigned: cases.assignedMemberId }).from(cases).where(eq(cases.id, caseId));
  const ids = [c?.assigned, sentById].filter((x): x is string => Boolean(x));
  if (!ids.length) return [];
  const rows = await db
    .select({ email: users.email })
    .from(members)
    .innerJoin(users, eq(users.id, members.userId))
    .where(and(inArray(members.id, ids), eq(members.status, "active")));
  return [...new Set(rows.map((r) => r.email).filter((e): e is string => Boolean(e)))];
}

/** The newest sent estimate of a case with its link and answer, for the case page and the desk. */
export async function newestSent(db: Db, workshopId: string, caseId: string) {
  const [sent] = await db
    .select()
    .from(sentEstimates)
    .where(and(eq(sentEstimates.caseId, caseId), eq(sentEstimates.workshopId, workshopId)))
    .orderBy(desc(sentEstimates.version))
    .limit(1);
  if (!sent) return null;
  const links = await db.select().from(ownerLinks).where(eq(ownerLinks.sentEstimateId, sent.id));
  const decisions = await db.select().from(ownerDecisions).where(eq(ownerDecisions.sentEstimateId, sent.id));
  const paid = await db
    .select()
    .from(payments)
    .where(eq(payments.sentEstimateId, sent.id))
    .orderBy(desc(payments.createdAt));
  return { sent, links, decisions, paid };
}
