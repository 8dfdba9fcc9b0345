import type { Db, Tx } from "~/db/client.server";
import { mailOutbox } from "~/db/schema";

export type QueuedMail = {
  workshopId: string | null;
  caseId?: string | null;
  kind: string; // what the message is for: "owner-estimate", "owner-answered", "invitation"…
  to: string;
  subject: string;
  text: string;
};

/**
 * Puts a message in the outbox, inside the caller's transaction: it exists exactly when the event
 * it tells of was committed, and the job queue delivers it afterwards (retrying while the mail
 * server is away). Returns the outbox row's id.
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
  return row.id;
}
