// POST /api/payments/webhook: an event from the payments service. Its signature is its
// authentication (HMAC-SHA256 over the raw body with the endpoint's secret, verified by the SDK's
// constructEvent, docs.stripe.com/webhooks/signature), so the body is read as text and verified
// before anything is parsed or stored. The request guard has already capped its size.
import { eq } from "drizzle-orm";
import { z } from "zod";
import type { Db } from "~/db/client.server";
import { paymentEvents } from "~/db/schema";
import { httpError } from "~/http/errors.server";
import { applyEvent, sessionIdOf, type Effect, type PaymentEvent } from "./effects.server";
import { paymentsClient, webhookSecret } from "./stripe.server";

const EventShape = z.object({
  id: z.string().min(1).max(255),
  type: z.string().min(1).max(255),
  created: z.number().int(),
  data: z.object({ object: z.record(z.string(), z.unknown()) }),
});

export async function receiveWebhook(db: Db, request: Request): Promise<Response> {
  const signature = request.headers.get("stripe-signature");
  if (!signature)
    return httpError(
      400,
      "The Stripe-Signature header is missing, so the event was refused. Nothing changed.",
    );
  const raw = await request.text();
  let event: PaymentEvent;
  try {
    const verified: unknown = paymentsClient().webhooks.constructEvent(raw, signature, webhookSecret());
    event = EventShape.parse(verified) as PaymentEvent;
  } catch (error) {
    const what =
      error instanceof z.ZodError ? "is not a payment event" : "has a signature that does not match";
    return httpError(400, `That request ${what}, so it was refused. Nothing changed.`);
  }

  // One transaction: the event id and its effect land together, so a repeat (the service retries
  // until it gets a 2xx, and may deliver twice anyway) finds the id and does nothing again.
  const effect = await db.transaction(async (tx): Promise<Effect | null> => {
    const fresh = await tx
      .insert(paymentEvents)
      .values({
        eventId: event.id,
        type: event.type,
        sessionId: sessionIdOf(event),
        payload: event,
        outcome: "received",
      })
      .onConflictDoNothing()
      .returning({ id: paymentEvents.eventId });
    if (fresh.length === 0) return null;
    const done = await applyEvent(tx, event);
    await tx.update(paymentEvents).set({ outcome: done.outcome }).where(eq(paymentEvents.eventId, event.id));
    return done;
  });
  if (!effect) return Response.json({ received: true, repeat: true });
  // Refused so that it shows as failed on the service's side too; our row is flagged meanwhile.
  if (effect.outcome === "mismatch") return httpError(409, effect.message, { outcome: effect.outcome });
  return Response.json({ received: true, outcome: effect.outcome });
}
