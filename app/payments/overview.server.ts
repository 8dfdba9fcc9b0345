// The admin's view of the workshop's payments: every payment newest first, and the kept events
// that name this workshop but whose payment we could not find yet.
import { and, desc, eq, sql } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { cases, paymentEvents, payments } from "~/db/schema";

export async function listPayments(db: Db, workshopId: string) {
  return db
    .select({
      id: payments.id,
      caseId: payments.caseId,
      caseNumber: cases.number,
      purpose: payments.purpose,
      amountMinor: payments.amountMinor,
      currency: payments.currency,
      status: payments.status,
      flaggedReason: payments.flaggedReason,
      createdAt: payments.createdAt,
      paidAt: payments.paidAt,
      refundedAt: payments.refundedAt,
    })
    .from(payments)
    .innerJoin(cases, eq(cases.id, payments.caseId))
    .where(eq(payments.workshopId, workshopId))
    .orderBy(desc(payments.createdAt), desc(payments.id))
    .limit(200);
}

/**
 * Kept events naming this workshop in the metadata we gave the session. An event naming no
 * workshop is shown to nobody here: which workshop it belongs to is exactly what is unknown.
 */
export async function keptEvents(db: Db, workshopId: string) {
  return db
    .select({
      eventId: paymentEvents.eventId,
      type: paymentEvents.type,
      sessionId: paymentEvents.sessionId,
      receivedAt: paymentEvents.receivedAt,
    })
    .from(paymentEvents)
    .where(
      and(
        eq(paymentEvents.outcome, "unknown_session"),
        sql`${paymentEvents.payload}->'data'->'object'->'metadata'->>'workshop_id' = ${workshopId}`,
      ),
    )
    .orderBy(desc(paymentEvents.receivedAt))
    .limit(100);
}
