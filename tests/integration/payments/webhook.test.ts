// The webhook route: signature, exactly-once effect, order-independence, our amount as the truth,
// and events kept until their payment is known. Signatures follow the public scheme (HMAC-SHA256
// over "<t>.<body>", docs.stripe.com/webhooks/signature), made by the SDK's generateTestHeaderString
// or by the fake itself. Amounts are invented (common practice, no published source).
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { auditLog, paymentEvents, payments } from "~/db/schema";
import { reconcilePayments, startCheckout } from "~/payments/checkout.server";
import { paymentsClient } from "~/payments/stripe.server";
import { testDb } from "../../setup/integration-worker";
import type { FakePayments } from "../../fakes/payments";
import {
  auditFor,
  checkoutArgs,
  eventRows,
  paymentRow,
  post,
  sentEstimate,
  signedEvent,
  startPayFake,
  startWebhookServer,
} from "./helpers";

let fake: FakePayments;
let hook: { url: string; close(): Promise<void> };
let version = 10;

beforeAll(async () => {
  hook = await startWebhookServer(testDb());
  fake = await startPayFake(hook.url);
});
afterAll(async () => {
  await fake.close();
  await hook.close();
});

async function openPayment(amountMinor = 4500) {
  const db = testDb();
  const { paymentId } = await startCheckout(db, checkoutArgs(await sentEstimate(db, version++), amountMinor));
  return { paymentId, sessionId: (await paymentRow(db, paymentId)).checkoutSessionId! };
}

const completedEvent = (id: string, session: Record<string, unknown>) => ({
  id,
  type: "checkout.session.completed",
  data: { object: { object: "checkout.session", payment_status: "paid", ...session } },
});

async function counts() {
  const db = testDb();
  const [[e], [a], [p]] = await Promise.all([
    db.select({ n: count() }).from(paymentEvents),
    db.select({ n: count() }).from(auditLog),
    db.select({ n: count() }).from(payments).where(eq(payments.status, "open")),
  ]);
  return { events: e!.n, audit: a!.n, open: p!.n };
}

describe("POST /api/payments/webhook", () => {
  it("answers 400 to a bad or missing signature and changes nothing", async () => {
    const { paymentId, sessionId } = await openPayment();
    const before = await counts();
    const { payload, header } = signedEvent(
      completedEvent("evt_test_forged", { id: sessionId, amount_total: 4500, currency: "gbp" }),
    );
    const tampered = payload.replace('"amount_total":4500', '"amount_total":4501');
    const answers = [
      await post(hook.url, tampered, header), // body changed after signing
      await post(hook.url, payload, header.replace(/v1=[0-9a-f]+/, `v1=${"0".repeat(64)}`)),
      await post(hook.url, payload, null),
      await post(hook.url, payload, "t=1,v1=abc"),
    ];
    for (const a of answers) {
      expect(a.status).toBe(400);
      expect(String(a.body.error)).toMatch(/refused/);
    }
    expect(await counts()).toEqual(before);
    expect((await paymentRow(testDb(), paymentId)).status).toBe("open");
  });

  it("applies the same event delivered twice once", async () => {
    const db = testDb();
    const { paymentId, sessionId } = await openPayment();
    const first = await fake.pay(sessionId);
    expect(first).toMatchObject({ delivered: true, lastStatus: 200 });
    const again = await fake.redeliver(first!.eventId);
    expect(again).toMatchObject({ delivered: true, lastStatus: 200 });
    // And once more by hand, the same id and body freshly signed: answered as a repeat.
    const stored = (await eventRows(db)).find((e) => e.eventId === first!.eventId)!;
    const { payload, header } = signedEvent(stored.payload as never);
    expect((await post(hook.url, payload, header)).body).toEqual({ received: true, repeat: true });
    expect((await eventRows(db)).filter((e) => e.eventId === first!.eventId)).toHaveLength(1);
    expect((await auditFor(db, paymentId)).map((a) => a.action)).toEqual(["payment.paid"]);
    expect((await paymentRow(db, paymentId)).status).toBe("paid");
  });

  it("ends refunded when the refund arrives before the payment, and stays refunded after", async () => {
    const db = testDb();
    const { paymentId, sessionId } = await openPayment();
    fake.holdWebhooks();
    await fake.pay(sessionId);
    const pi = fake.sessions().find((s) => s.id === sessionId)!.payment_intent!;
    // A refund made on the service's side (its dashboard), not through Ramplight.
    await paymentsClient().refunds.create({ payment_intent: pi });
    const [refundDelivery, paidDelivery] = await fake.releaseWebhooks("reverse");
    expect(refundDelivery).toMatchObject({ type: "charge.refunded", lastStatus: 200 });
    expect(paidDelivery).toMatchObject({ type: "checkout.session.completed", lastStatus: 200 });
    let row = await paymentRow(db, paymentId);
    expect(row.status).toBe("refunded");
    expect(row.paidAt).toBeInstanceOf(Date);
    expect(row.refundedAt).toBeInstanceOf(Date);
    const events = await eventRows(db);
    expect(events.find((e) => e.eventId === refundDelivery!.eventId)?.outcome).toBe("reconciled");

    // The completed event again, and another completed event for the same session: still refunded.
    await fake.redeliver(paidDelivery!.eventId);
    const { payload, header } = signedEvent(
      completedEvent("evt_test_late_completed", { id: sessionId, amount_total: 4500, currency: "gbp" }),
    );
    expect((await post(hook.url, payload, header)).body).toMatchObject({ outcome: "ignored" });
    row = await paymentRow(db, paymentId);
    expect(row.status).toBe("refunded");
    expect((await auditFor(db, paymentId)).map((a) => a.action)).toEqual([
      "payment.paid",
      "payment.refunded",
    ]);
  });

  it("refuses an amount or currency that is not ours: 409, the payment flagged with the reason", async () => {
    const db = testDb();
    for (const [i, wrong] of [
      { amount_total: 450, currency: "gbp" },
      { amount_total: 4500, currency: "eur" },
    ].entries()) {
      const { paymentId, sessionId } = await openPayment();
      const { payload, header } = signedEvent(
        completedEvent(`evt_test_mismatch_${i}`, { id: sessionId, ...wrong }),
      );
      const answer = await post(hook.url, payload, header);
      expect(answer.status).toBe(409);
      expect(answer.body).toMatchObject({ outcome: "mismatch" });
      const row = await paymentRow(db, paymentId);
      expect(row.status).toBe("flagged");
      expect(row.paidAt).toBeNull();
      expect(row.flaggedReason).toContain("we asked for £45.00");
      expect((await eventRows(db)).find((e) => e.eventId === `evt_test_mismatch_${i}`)?.outcome).toBe(
        "mismatch",
      );
      expect((await auditFor(db, paymentId)).map((a) => a.action)).toEqual(["payment.flagged"]);
    }
  });

  it("keeps an event for a session we do not know, and applies it once startCheckout stores it", async () => {
    const db = testDb();
    const { paymentId, sessionId } = await openPayment(3300);
    // As if the answer to the session's creation had been lost: our row does not know its session.
    await db.update(payments).set({ checkoutSessionId: null }).where(eq(payments.id, paymentId));
    const delivery = await fake.pay(sessionId);
    expect(delivery).toMatchObject({ delivered: true, lastStatus: 200 });
    const kept = (await eventRows(db)).find((e) => e.eventId === delivery!.eventId)!;
    expect(kept).toMatchObject({ outcome: "unknown_session", sessionId });
    expect((await paymentRow(db, paymentId)).status).toBe("open");

    // The owner's retry: the same row, the same session (idempotency key = payment id), now paid.
    const sent = (await paymentRow(db, paymentId)).sentEstimateId;
    const again = await startCheckout(db, checkoutArgs(sent, 3300));
    expect(again.paymentId).toBe(paymentId);
    const row = await paymentRow(db, paymentId);
    expect(row).toMatchObject({ status: "paid", checkoutSessionId: sessionId });
    expect((await eventRows(db)).find((e) => e.eventId === delivery!.eventId)?.outcome).toBe("reconciled");
  });

  it("reconcilePayments applies kept events once their payment is known, and keeps the rest", async () => {
    const db = testDb();
    const { paymentId, sessionId } = await openPayment(2000);
    await db.update(payments).set({ checkoutSessionId: null }).where(eq(payments.id, paymentId));
    await fake.pay(sessionId);
    const stranger = signedEvent(
      completedEvent("evt_test_stranger", { id: "cs_test_not_ours", amount_total: 100, currency: "gbp" }),
    );
    expect((await post(hook.url, stranger.payload, stranger.header)).body).toMatchObject({
      outcome: "unknown_session",
    });
    await db.update(payments).set({ checkoutSessionId: sessionId }).where(eq(payments.id, paymentId));
    const result = await reconcilePayments(db);
    expect(result.reconciled).toBeGreaterThanOrEqual(1);
    expect((await paymentRow(db, paymentId)).status).toBe("paid");
    const left = (await eventRows(db)).filter((e) => e.outcome === "unknown_session").map((e) => e.eventId);
    expect(left).toContain("evt_test_stranger");
    expect(result.kept).toBe(left.length);
  });
});
