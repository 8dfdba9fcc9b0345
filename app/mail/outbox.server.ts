import { and, desc, eq } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db, Tx } from "~/db/client.server";
import { mailOutbox } from "~/db/schema";
import { refuse } from "~/http/errors.server";
import { enqueueDelivery } from "./queue.server";

export type QueuedMail = {
  workshopId: string | null;
  caseId?: string | null;
  kind: string; // what the message is for: "owner-estimate", "owner-answered", "invitation"…
  to: string;
  subject: string;
  text: string;
};

/**
 * Puts a message in the outbox and asks the job queue to deliver it, both inside the caller's
 * transaction: the message exists exactly when the event it tells of was committed, and pg-boss
 * delivers it afterwards (retrying while the mail server is away). Returns the outbox row's id.
 */
export async function queueMail(tx: Db | Tx, mail: QueuedMail): Promise<string> {
  const [row] = await tx
    .insert(mailOutbox)
    .values({
      workshopId: mail.workshopId,
      caseId: mail.caseId ?? null,
      kind: mail.kind,
      toAddress: mail.to,
      subject: mail.subject,
      text: mail.text,
    })
    .returning({ id: mailOutbox.id });
  await enqueueDelivery(tx, row.id);
  return row.id;
}

const SHOWN = 200; // the newest messages; older ones stay in the table

// A link that acts for someone (the owner's estimate link, a sign-in link) is theirs alone: the
// admin's page shows that a link was sent, never the link itself.
const PRIVATE_LINK =
  /(\/(?:o|auth\/[a-z-]+)\/)[A-Za-z0-9_-]{20,}|([?&](?:token|code|magic)[^=&\s]*=)[^&\s]+/g;
export const maskLinks = (text: string) =>
  text.replace(PRIVATE_LINK, (_m, path, query) => `${path ?? query}[hidden]`);

/** The workshop's messages, newest first, for the admin's mail page (private links hidden). */
export async function listOutbox(db: Db, workshopId: string) {
  const rows = await db
    .select({
      id: mailOutbox.id,
      kind: mailOutbox.kind,
      to: mailOutbox.toAddress,
      subject: mailOutbox.subject,
      text: mailOutbox.text,
      state: mailOutbox.state,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      createdAt: mailOutbox.createdAt,
      sentAt: mailOutbox.sentAt,
    })
    .from(mailOutbox)
    .where(eq(mailOutbox.workshopId, workshopId))
    .orderBy(desc(mailOutbox.createdAt), desc(mailOutbox.id))
    .limit(SHOWN);
  return rows.map((r) => ({ ...r, text: maskLinks(r.text) }));
}

/**
 * An admin's "Send again" for a message that ran out of tries: back to `queued` with a fresh job,
 * in one transaction with its audit row. Only a failed message of the admin's own workshop qualifies;
 * one already sent is never sent twice.
 */
export async function resendMail(db: Db, by: CurrentMember, outboxId: string): Promise<string> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(mailOutbox)
      .set({ state: "queued" })
      .where(
        and(
          eq(mailOutbox.id, outboxId),
          eq(mailOutbox.workshopId, by.workshopId),
          eq(mailOutbox.state, "failed"),
        ),
      )
      .returning({ id: mailOutbox.id, to: mailOutbox.toAddress, subject: mailOutbox.subject });
    if (!row) {
      const [other] = await tx
        .select({ state: mailOutbox.state })
        .from(mailOutbox)
        .where(and(eq(mailOutbox.id, outboxId), eq(mailOutbox.workshopId, by.workshopId)));
      if (!other) refuse(404, "That message does not exist.");
      refuse(
        409,
        other.state === "sent" ? "That message was sent already." : "That message is already queued.",
      );
    }
    await enqueueDelivery(tx, row.id);
    await audit(tx, {
      workshopId: by.workshopId,
      actorUserId: by.userId,
      action: "mail.resend",
      entity: "mail",
      entityId: row.id,
      after: { to: row.to, subject: row.subject },
    });
    return `The e-mail to ${row.to} is queued again.`;
  });
}
