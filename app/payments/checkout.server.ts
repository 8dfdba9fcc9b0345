// Taking the diagnostic fee or a deposit through the payments service's hosted checkout page, and
// refunding it. Our payments row is written first, with our amount and currency; the session is
// created with the row's id as its idempotency key, so a retry after a lost answer (or a crash
// before the session id was stored) gets the same session back and never a second charge.
import { and, desc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, paymentEvents, payments, sentEstimates, type Payment } from "~/db/schema";
import { can } from "~/domain/permissions";
import { PAYMENT_PURPOSES } from "~/domain/owner-side";
import { refuse } from "~/http/errors.server";
import { applyKept } from "./effects.server";
import { askService, paymentsClient } from "./stripe.server";

const StartArgs = z.object({
  workshopId: z.uuid(),
  caseId: z.uuid(),
  sentEstimateId: z.uuid(),
  purpose: z.enum(PAYMENT_PURPOSES),
  amountMinor: z
    .number()
    .int("The amount is whole minor units (pence)")
    .positive("The amount must be above 0"),
  currency: z
    .string()
    .regex(/^[A-Za-z]{3}$/, "The currency is a three-letter ISO 4217 code")
    .transform((c) => c.toUpperCase()),
  description: z.string().trim().min(1).max(200),
  successUrl: z.url(),
  cancelUrl: z.url(),
});
export type StartCheckoutArgs = z.input<typeof StartArgs>;

export async function startCheckout(
  db: Db,
  args: StartCheckoutArgs,
): Promise<{ paymentId: string; url: string }> {
  const parsed = StartArgs.safeParse(args);
  if (!parsed.success) refuse(400, parsed.error.issues[0]?.message ?? "The payment is not valid.");
  const a = parsed.data;

  const payment = await db.transaction(async (tx) => {
    // Locks the sent estimate so two clicks on "Pay" make one row, not two.
    const [sent] = await tx
      .select({ id: sentEstimates.id })
      .from(sentEstimates)
      .where(
        and(
          eq(sentEstimates.id, a.sentEstimateId),
          eq(sentEstimates.workshopId, a.workshopId),
          eq(sentEstimates.caseId, a.caseId),
        ),
      )
      .for("update");
    if (!sent) refuse(404, "That estimate was not sent for this case.");
    const [open] = await tx
      .select()
      .from(payments)
      .where(
        and(
          eq(payments.sentEstimateId, a.sentEstimateId),
          eq(payments.purpose, a.purpose),
          eq(payments.status, "open"),
          eq(payments.amountMinor, a.amountMinor),
          eq(payments.currency, a.currency),
        ),
      )
      .orderBy(desc(payments.createdAt))
      .limit(1);
    // Only a row asking the same amount is reused: its session (same idempotency key) asks that.
    if (open) return open;
    const [created] = await tx
      .insert(payments)
      .values({
        workshopId: a.workshopId,
        caseId: a.caseId,
        sentEstimateId: a.sentEstimateId,
        purpose: a.purpose,
        amountMinor: a.amountMinor,
        currency: a.currency,
      })
      .returning();
    return created!;
  });

  const stripe = paymentsClient();
  if (payment.checkoutSessionId) {
    const id = payment.checkoutSessionId;
    const existing = await askService("find the checkout", () => stripe.checkout.sessions.retrieve(id));
    if (existing.status === "open" && existing.url) return { paymentId: payment.id, url: existing.url };
    // Paid, its event not here yet: a new session would ask the owner to pay twice.
    if (existing.status === "complete")
      refuse(409, "The owner has paid this already; it shows as paid once the payment service confirms it.");
  }
  const session = await askService("open a checkout", () =>
    stripe.checkout.sessions.create(
      {
        mode: "payment",
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: a.currency.toLowerCase(),
              unit_amount: a.amountMinor,
              product_data: { name: a.description },
            },
          },
        ],
        client_reference_id: payment.id,
        metadata: { payment_id: payment.id, workshop_id: a.workshopId, case_id: a.caseId },
        success_url: a.successUrl,
        cancel_url: a.cancelUrl,
      },
      { idempotencyKey: payment.id },
    ),
  );
  if (!session.url) refuse(502, "The payment service gave no checkout page; try again.");
  await db.transaction(async (tx) => {
    await tx
      .update(payments)
      .set({ checkoutSessionId: session.id, updatedAt: new Date() })
      .where(eq(payments.id, payment.id));
    // Events for this session that came before we knew it (a lost answer, a crash) apply now.
    await applyKept(tx, { sessionId: session.id });
  });
  return { paymentId: payment.id, url: session.url };
}

/** Applies every kept event whose payment has become known since; for a periodic job. */
export async function reconcilePayments(db: Db): Promise<{ reconciled: number; kept: number }> {
  return db.transaction(async (tx) => {
    const reconciled = await applyKept(tx, { all: true });
    const [left] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(paymentEvents)
      .where(eq(paymentEvents.outcome, "unknown_session"));
    return { reconciled, kept: left?.n ?? 0 };
  });
}

/** A case's payments, newest first (the case page and the owner's page). */
export async function paymentsFor(db: Db, workshopId: string, caseId: string): Promise<Payment[]> {
  return db
    .select()
    .from(payments)
    .where(and(eq(payments.workshopId, workshopId), eq(payments.caseId, caseId)))
    .orderBy(desc(payments.createdAt));
}

/** Refunds a paid payment in full through the service; admins only. */
export async function refundPayment(db: Db, member: CurrentMember, paymentId: string): Promise<Payment> {
  if (!can(member.role, "payment:refund")) refuse(403, `Your role (${member.role}) cannot refund payments.`);
  if (!z.uuid().safeParse(paymentId).success) refuse(404, "No such payment in this workshop.");
  const [row] = await db
    .select()
    .from(payments)
    .where(and(eq(payments.id, paymentId), eq(payments.workshopId, member.workshopId)));
  if (!row) refuse(404, "No such payment in this workshop.");
  if (row.status !== "paid" || !row.paymentIntentId)
    refuse(409, `Only a paid payment can be refunded; this one is ${row.status}. Nothing changed.`);

  // Outside a transaction: no row is held locked while the service answers. The idempotency key
  // makes a second click, or a retry after a lost answer, the same refund.
  const intent = row.paymentIntentId;
  const refund = await askService("refund it", () =>
    paymentsClient().refunds.create(
      { payment_intent: intent, metadata: { payment_id: row.id } },
      { idempotencyKey: `refund-${row.id}` },
    ),
  );
  return db.transaction(async (tx) => {
    const [locked] = await tx.select().from(payments).where(eq(payments.id, row.id)).for("update");
    const [c] = await tx.select({ n: cases.number }).from(cases).where(eq(cases.id, row.caseId));
    const [updated] = await tx
      .update(payments)
      .set({
        status: "refunded",
        refundId: refund.id,
        refundedAt: locked!.refundedAt ?? new Date(),
        updatedAt: new Date(),
      })
      .where(eq(payments.id, row.id))
      .returning();
    await audit(tx, {
      workshopId: row.workshopId,
      actorUserId: member.userId,
      action: "payment.refunded",
      entity: "payment",
      entityId: row.id,
      before: { status: locked!.status },
      after: { status: "refunded", amountMinor: row.amountMinor, currency: row.currency, caseNumber: c?.n },
    });
    return updated!;
  });
}
