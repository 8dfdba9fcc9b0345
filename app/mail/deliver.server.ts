import { and, eq, sql } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { mailOutbox } from "~/db/schema";
import { mailConfigured, sendMail } from "./mailer.server";

export type Delivery = "sent" | "skipped" | "retry" | "failed";

const ERROR_CHARS = 500; // enough to read a relay's answer; a stack trace is not kept

/**
 * One delivery attempt of one outbox row, as a pg-boss job runs it. The row is claimed with
 * SELECT … FOR UPDATE SKIP LOCKED while state = 'queued', and stays locked until the attempt is
 * recorded, so two jobs for the same row cannot both send it and a row already sent (or failed) is
 * left alone. On a failure the attempt and the error are kept and the error is thrown on, so
 * pg-boss retries the job; on the last try (`final`) the row becomes `failed` instead.
 *
 * The lock is held while the relay is spoken to: the mailer's timeouts bound that. A crash between
 * the relay's acceptance and the commit can send a message twice; its Message-ID is the same both
 * times, so a reader's mail program can tell.
 */
export async function deliverOutboxMail(
  db: Db,
  outboxId: string,
  opts: { final: boolean },
): Promise<Delivery> {
  let failure: Error | undefined;
  const outcome = await db.transaction(async (tx): Promise<Delivery> => {
    const [row] = await tx
      .select()
      .from(mailOutbox)
      .where(and(eq(mailOutbox.id, outboxId), eq(mailOutbox.state, "queued")))
      .for("update", { skipLocked: true });
    if (!row) return "skipped";
    try {
      if (!mailConfigured()) throw new Error("No mail server is set up (SMTP_URL is empty)");
      await sendMail({ to: row.toAddress, subject: row.subject, text: row.text, outboxId: row.id });
    } catch (error) {
      failure = error instanceof Error ? error : new Error(String(error));
      await tx
        .update(mailOutbox)
        .set({
          attempts: sql`${mailOutbox.attempts} + 1`,
          lastError: failure.message.slice(0, ERROR_CHARS),
          state: opts.final ? "failed" : "queued",
        })
        .where(eq(mailOutbox.id, row.id));
      return opts.final ? "failed" : "retry";
    }
    await tx
      .update(mailOutbox)
      .set({ attempts: sql`${mailOutbox.attempts} + 1`, state: "sent", sentAt: new Date() })
      .where(eq(mailOutbox.id, row.id));
    return "sent";
  });
  // Thrown after the commit, so the attempt is on record and pg-boss schedules the next one.
  if (outcome === "retry" && failure) throw failure;
  return outcome;
}
