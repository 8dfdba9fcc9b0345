import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import { env } from "~/config/env.server";
import type { Db } from "~/db/client.server";
import { ownerLinks, sentEstimates } from "~/db/schema";
import type { SentEstimateDocument } from "~/domain/estimate-document";
import { refuse } from "~/http/errors.server";
import { queueMail } from "~/mail/outbox.server";
import { formatMinor } from "~/money";
import { depositOf, findingFor, sendProblems, sentItems, totalsOf } from "./document";
import { loadDraft } from "./draft.server";
import { evidenceFor, loadEstimateCase } from "./estimate-case.server";
import { newOwnerToken, OWNER_LINK_DAYS } from "./owner-token.server";

type Who = Pick<CurrentMember, "workshopId" | "userId" | "memberId">;

export const ownerLinkUrl = (token: string) => new URL(`/o/${token}`, env().APP_URL).toString();

/**
 * Sends the estimate: the draft frozen as the next version, a fresh owner link (earlier ones stop
 * working: only the newest estimate can be answered) and the e-mail to the owner, in one transaction.
 */
export async function sendEstimate(db: Db, who: Who, caseId: string, input: { message: string }) {
  return db.transaction(async (tx) => {
    const c = await loadEstimateCase(tx, who.workshopId, caseId);
    if (c.state !== "concluded" || !c.cause)
      refuse(409, "Only a case with a confirmed cause can be sent to its owner.");
    const draft = await loadDraft(tx, who.workshopId, caseId);
    const problems = sendProblems(draft, c.ownerEmail);
    if (Object.keys(problems).length)
      refuse(400, problems.form?.[0] ?? "The estimate is not ready.", { errors: problems });
    const evidence = await evidenceFor(tx, caseId, c.cause.id);
    const document: SentEstimateDocument = {
      workshopName: c.workshopName,
      caseNumber: c.number,
      vehicle: c.vehicleName,
      registration: c.registration,
      ownerName: c.ownerName,
      complaint: c.complaint,
      currency: c.currency,
      pricesIncludeTax: c.pricesIncludeTax,
      findings: [findingFor(c.cause, evidence, c.units)],
      items: sentItems(draft),
      depositMinor: 0,
      message: input.message,
    };
    document.depositMinor = depositOf(document);
    const [{ version }] = await tx
      .select({ version: sql<number>`coalesce(max(${sentEstimates.version}), 0)::int + 1` })
      .from(sentEstimates)
      .where(eq(sentEstimates.caseId, caseId));
    const [sent] = await tx
      .insert(sentEstimates)
      .values({
        workshopId: who.workshopId,
        caseId,
        version,
        document,
        toEmail: c.ownerEmail!,
        sentById: who.memberId,
      })
      .returning({ id: sentEstimates.id });
    await revokeOpenLinks(tx as unknown as Db, who, caseId);
    const { token, hash } = newOwnerToken();
    await tx.insert(ownerLinks).values({
      workshopId: who.workshopId,
      sentEstimateId: sent.id,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + OWNER_LINK_DAYS * 86_400_000),
    });
    const total = formatMinor(totalsOf(document).gross, c.currency);
    await queueMail(tx, {
      workshopId: who.workshopId,
      caseId,
      kind: "owner-estimate",
      to: c.ownerEmail!,
      subject: `${c.workshopName}: what we found on your ${c.vehicleName} (${c.registration})`,
      text: [
        `Hello ${c.ownerName},`,
        "",
        `We have found the cause of "${c.complaint}". What we found, what it costs (up to ${total} for all of it) and what happens if it is left are on this page, where you can approve each item or decline it:`,
        "",
        ownerLinkUrl(token),
        "",
        input.message,
        "",
        `The link works for ${OWNER_LINK_DAYS} days and only for this estimate. Do not forward it: anyone with it can answer for you.`,
        "",
        c.workshopName,
      ]
        .filter((l, i, a) => !(l === "" && a[i - 1] === ""))
        .join("\n"),
    });
    await audit(tx, {
      workshopId: who.workshopId,
      actorUserId: who.userId,
      action: "owner.sent",
      entity: "case",
      entityId: caseId,
      after: { version, to: c.ownerEmail, total: totalsOf(document).gross },
    });
    return { version, token };
  });
}

/** Stops every live link of the case; the advisor does this when a link went to the wrong person. */
export async function revokeOpenLinks(db: Db, who: Who, caseId: string, audited = false) {
  const now = new Date();
  const gone = await db
    .update(ownerLinks)
    .set({ revokedAt: now, revokedById: who.memberId })
    .where(
      and(
        isNull(ownerLinks.revokedAt),
        gt(ownerLinks.expiresAt, now),
        sql`${ownerLinks.sentEstimateId} in (select ${sentEstimates.id} from ${sentEstimates} where ${sentEstimates.caseId} = ${caseId} and ${sentEstimates.workshopId} = ${who.workshopId})`,
      ),
    )
    .returning({ id: ownerLinks.id });
  if (audited)
    await audit(db, {
      workshopId: who.workshopId,
      actorUserId: who.userId,
      action: "owner.link-revoked",
      entity: "case",
      entityId: caseId,
      after: { links: gone.length },
    });
  return gone.length;
}
