// What a payment event does to our payment row, inside the caller's transaction. Our row's amount
// and currency are the truth: the service's word is believed only where it agrees with them. The
// end state does not depend on the order events arrive in (the service promises no order,
// docs.stripe.com/webhooks "Event ordering"): a refunded payment never goes back to paid, and an
// event whose payment we cannot find yet is kept and applied once we can.
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { Tx } from "~/db/client.server";
import { cases, paymentEvents, payments, type Payment } from "~/db/schema";
import { formatMinor } from "~/money";

export type Outcome = "applied" | "ignored" | "unknown_session" | "mismatch";
export type Effect = { outcome: Outcome; message: string };

/** The part of an event we read; the SDK's `Stripe.Event` is wider. */
export type PaymentEvent = { id: string; type: string; created: number; data: { object: unknown } };

type SessionObject = {
  id?: string;
  payment_status?: string;
  amount_total?: number | null;
  currency?: string | null;
  payment_intent?: string | { id: string } | null;
};
type ChargeObject = {
  payment_intent?: string | { id: string } | null;
  refunded?: boolean;
  refunds?: { data?: { id?: string }[] } | null;
};

export const COMPLETED = ["checkout.session.completed", "checkout.session.async_payment_succeeded"];
export const REFUNDED = ["charge.refunded"];

const idOf = (v: string | { id: string } | null | undefined) => (typeof v === "string" ? v : (v?.id ?? null));

/** The checkout session an event is about, when it is about one. */
export function sessionIdOf(event: PaymentEvent): string | null {
  if (!event.type.startsWith("checkout.session.")) return null;
  const id = (event.data.object as SessionObject).id;
  return typeof id === "string" ? id : null;
}

const money = (minor: number | null | undefined, currency: string | null | undefined) =>
  minor == null || !currency ? "no amount" : safeMoney(minor, currency);
function safeMoney(minor: number, currency: string) {
  try {
    return formatMinor(minor, currency.toUpperCase());
  } catch {
    return `${minor} (minor units) ${currency.toUpperCase()}`;
  }
}

const ignored = (message: string): Effect => ({ outcome: "ignored", message });

async function caseNumber(tx: Tx, row: Payment) {
  const [c] = await tx.select({ n: cases.number }).from(cases).where(eq(cases.id, row.caseId));
  return c?.n ?? null;
}

async function change(tx: Tx, row: Payment, set: Partial<Payment>, action: string, actor: string | null) {
  await tx.update(payments).set(set).where(eq(payments.id, row.id));
  await audit(tx, {
    workshopId: row.workshopId,
    actorUserId: actor,
    action,
    entity: "payment",
    entityId: row.id,
    before: { status: row.status },
    after: {
      status: set.status,
      amountMinor: row.amountMinor,
      currency: row.currency,
      caseNumber: await caseNumber(tx, row),
      ...(set.flaggedReason ? { reason: set.flaggedReason } : {}),
    },
  });
}

async function completed(tx: Tx, event: PaymentEvent): Promise<Effect> {
  const s = event.data.object as SessionObject;
  if (typeof s.id !== "string") return ignored("The event names no checkout session.");
  const [row] = await tx.select().from(payments).where(eq(payments.checkoutSessionId, s.id)).for("update");
  if (!row) return { outcome: "unknown_session", message: `No payment of ours has session ${s.id}; kept.` };
  if (s.payment_status !== "paid") return ignored(`The session is ${s.payment_status ?? "not paid"}.`);
  if (row.status !== "open") return ignored(`The payment is already ${row.status}.`);
  const pi = idOf(s.payment_intent);
  if (s.amount_total !== row.amountMinor || (s.currency ?? "").toUpperCase() !== row.currency) {
    const reason = `The payment service reported ${money(s.amount_total, s.currency)}; we asked for ${money(row.amountMinor, row.currency)}.`;
    await change(
      tx,
      row,
      { status: "flagged", flaggedReason: reason, paymentIntentId: pi, updatedAt: new Date() },
      "payment.flagged",
      null,
    );
    return { outcome: "mismatch", message: `${reason} The payment is flagged for a person to look at.` };
  }
  await change(
    tx,
    row,
    { status: "paid", paidAt: new Date(event.created * 1000), paymentIntentId: pi, updatedAt: new Date() },
    "payment.paid",
    null,
  );
  // A refund of this payment may have arrived before the payment itself; it applies now.
  if (pi) await applyKept(tx, { paymentIntentId: pi });
  return { outcome: "applied", message: "Paid." };
}

async function refunded(tx: Tx, event: PaymentEvent): Promise<Effect> {
  const c = event.data.object as ChargeObject;
  const pi = idOf(c.payment_intent);
  if (!pi) return ignored("The charge names no payment intent.");
  const [row] = await tx.select().from(payments).where(eq(payments.paymentIntentId, pi)).for("update");
  if (!row) return { outcome: "unknown_session", message: `No payment of ours has intent ${pi}; kept.` };
  if (c.refunded !== true) return ignored("Only part of the charge was refunded.");
  if (row.status === "refunded") return ignored("The payment is already refunded.");
  if (row.status === "open") return ignored("The payment is not paid.");
  const refundId = c.refunds?.data?.[0]?.id ?? row.refundId;
  const now = new Date(event.created * 1000);
  await change(
    tx,
    row,
    { status: "refunded", refundedAt: now, refundId, updatedAt: new Date() },
    "payment.refunded",
    null,
  );
  return { outcome: "applied", message: "Refunded." };
}

/** Applies one event to our rows. */
export async function applyEvent(tx: Tx, event: PaymentEvent): Promise<Effect> {
  if (COMPLETED.includes(event.type)) return completed(tx, event);
  if (REFUNDED.includes(event.type)) return refunded(tx, event);
  return ignored(`Ramplight does not act on ${event.type}.`);
}

/**
 * Applies kept events whose payment is now known: those of a session (after its id is stored) or
 * refunds of a payment intent (after the payment is paid). Payments first, then refunds, whatever
 * order they came in, since a refund cannot precede its payment. Returns how many were applied.
 */
export async function applyKept(
  tx: Tx,
  match: { sessionId?: string; paymentIntentId?: string; all?: true },
): Promise<number> {
  const which = match.sessionId
    ? and(inArray(paymentEvents.type, COMPLETED), eq(paymentEvents.sessionId, match.sessionId))
    : match.paymentIntentId
      ? and(
          inArray(paymentEvents.type, REFUNDED),
          sql`${paymentEvents.payload}->'data'->'object'->>'payment_intent' = ${match.paymentIntentId}`,
        )
      : undefined;
  if (!which && !match.all) return 0;
  const kept = await tx
    .select()
    .from(paymentEvents)
    .where(and(eq(paymentEvents.outcome, "unknown_session"), which))
    .orderBy(sql`${paymentEvents.type} like 'checkout.%' desc`, asc(paymentEvents.receivedAt))
    .for("update");
  let applied = 0;
  for (const e of kept) {
    // Re-read: applying a payment above may already have applied a kept refund in this list.
    const [now] = await tx
      .select({ outcome: paymentEvents.outcome })
      .from(paymentEvents)
      .where(eq(paymentEvents.eventId, e.eventId));
    if (now?.outcome !== "unknown_session") continue;
    const effect = await applyEvent(tx, e.payload as PaymentEvent);
    if (effect.outcome === "unknown_session") continue;
    await tx
      .update(paymentEvents)
      .set({ outcome: effect.outcome === "applied" ? "reconciled" : effect.outcome })
      .where(eq(paymentEvents.eventId, e.eventId));
    applied += 1;
  }
  return applied;
}
