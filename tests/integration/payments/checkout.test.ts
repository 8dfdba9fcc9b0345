// Taking a payment and refunding it through the unmodified SDK against the payments fake, with the
// fake's signed webhooks reaching the real route. Amounts are invented (common practice, no
// published source); the wire shapes are the SDK's documented ones (docs.stripe.com/api).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { paymentsFor, refundPayment, startCheckout } from "~/payments/checkout.server";
import { paymentsClient } from "~/payments/stripe.server";
import { testDb } from "../../setup/integration-worker";
import type { FakePayments } from "../../fakes/payments";
import { memberFor, refusal } from "../api/helpers";
import {
  BRAMBLEGATE,
  CASE,
  auditFor,
  checkoutArgs,
  paymentRow,
  sentEstimate,
  startPayFake,
  startWebhookServer,
} from "./helpers";

let fake: FakePayments;
let hook: { url: string; close(): Promise<void> };

beforeAll(async () => {
  hook = await startWebhookServer(testDb());
  fake = await startPayFake(hook.url);
});
afterAll(async () => {
  await fake.close();
  await hook.close();
});

describe("startCheckout against the payments fake", () => {
  it("creates a session with our amount and currency, keyed to our payment row", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 1);
    const { paymentId, url } = await startCheckout(db, checkoutArgs(sent, 4500));
    const row = await paymentRow(db, paymentId);
    expect(row).toMatchObject({ status: "open", amountMinor: 4500, currency: "GBP", caseId: CASE });
    const session = fake.sessions().find((s) => s.id === row.checkoutSessionId)!;
    expect(session).toMatchObject({
      amount_total: 4500,
      currency: "gbp", // the API's currencies are lower case (docs.stripe.com/currencies)
      client_reference_id: paymentId,
      metadata: { payment_id: paymentId, workshop_id: BRAMBLEGATE, case_id: CASE },
      status: "open",
    });
    expect(url).toBe(session.url);

    // Asked again (a second click, a reload): the same row and the same session, not a new charge.
    const again = await startCheckout(db, checkoutArgs(sent, 4500));
    expect(again).toEqual({ paymentId, url });
    expect(fake.sessions().filter((s) => s.client_reference_id === paymentId)).toHaveLength(1);
  });

  it("does not open a second checkout for a session already paid whose event is still on its way", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 8);
    const { paymentId } = await startCheckout(db, checkoutArgs(sent, 2700));
    fake.holdWebhooks();
    await fake.pay((await paymentRow(db, paymentId)).checkoutSessionId!);
    const refused = await refusal(startCheckout(db, checkoutArgs(sent, 2700)));
    expect(refused.status).toBe(409);
    expect(fake.sessions().filter((s) => s.client_reference_id === paymentId)).toHaveLength(1);
    await fake.releaseWebhooks();
    expect((await paymentRow(db, paymentId)).status).toBe("paid");
  });

  it("refuses an amount of 0 or an estimate of another case, and writes nothing", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 2);
    const before = fake.sessions().length;
    expect((await refusal(startCheckout(db, checkoutArgs(sent, 0)))).status).toBe(400);
    const other = { ...checkoutArgs(sent), caseId: "00000000-0000-4000-8000-000000000000" };
    expect((await refusal(startCheckout(db, other))).status).toBe(404);
    expect(fake.sessions().length).toBe(before);
    expect((await paymentsFor(db, BRAMBLEGATE, CASE)).filter((p) => p.sentEstimateId === sent)).toEqual([]);
  });

  it("is paid when the owner pays on the hosted page: the signed webhook marks it paid", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 3);
    const { paymentId } = await startCheckout(db, { ...checkoutArgs(sent, 2500), purpose: "deposit" });
    const sessionId = (await paymentRow(db, paymentId)).checkoutSessionId!;
    const delivery = await fake.pay(sessionId);
    expect(delivery).toMatchObject({ delivered: true, lastStatus: 200, attempts: 1 });
    const row = await paymentRow(db, paymentId);
    expect(row.status).toBe("paid");
    expect(row.paidAt).toBeInstanceOf(Date);
    expect(row.paymentIntentId).toMatch(/^pi_test_/);
    expect((await auditFor(db, paymentId)).map((a) => a.action)).toEqual(["payment.paid"]);
    const listed = await paymentsFor(db, BRAMBLEGATE, CASE);
    expect(listed.find((p) => p.id === paymentId)).toMatchObject({ status: "paid", purpose: "deposit" });
  });
});

describe("refundPayment", () => {
  it("refunds a paid payment through the fake for an admin; the later webhook changes nothing more", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 4);
    const { paymentId } = await startCheckout(db, checkoutArgs(sent, 4500));
    await fake.pay((await paymentRow(db, paymentId)).checkoutSessionId!);
    const paid = await paymentRow(db, paymentId);

    // Not an admin: refused, nothing sent to the service.
    const advisor = await memberFor(db, "dana-reyes");
    expect((await refusal(refundPayment(db, advisor, paymentId))).status).toBe(403);
    // An admin of another workshop does not see it at all.
    const otherAdmin = await memberFor(db, "kit-arbuthnot");
    expect((await refusal(refundPayment(db, otherAdmin, paymentId))).status).toBe(404);
    expect(fake.refunds()).toHaveLength(0);

    const admin = await memberFor(db, "ines-okafor");
    const done = await refundPayment(db, admin, paymentId);
    expect(done.status).toBe("refunded");
    const refund = fake.refunds().find((r) => r.payment_intent === paid.paymentIntentId)!;
    expect(refund).toMatchObject({ amount: 4500, currency: "gbp", status: "succeeded" });
    expect(done.refundId).toBe(refund.id);
    await fake.settled();
    const refundEvent = fake.deliveries().find((d) => d.type === "charge.refunded")!;
    expect(refundEvent).toMatchObject({ delivered: true, lastStatus: 200 });
    const row = await paymentRow(db, paymentId);
    expect(row.status).toBe("refunded");
    const audits = await auditFor(db, paymentId);
    expect(audits.map((a) => a.action)).toEqual(["payment.paid", "payment.refunded"]);
    expect(audits[1]!.actorUserId).toBe(admin.userId);

    // A second refund is refused before the service is asked.
    expect((await refusal(refundPayment(db, admin, paymentId))).status).toBe(409);
    expect(fake.refunds().filter((r) => r.payment_intent === paid.paymentIntentId)).toHaveLength(1);
  });

  it("refuses to refund a payment that is not paid", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 5);
    const { paymentId } = await startCheckout(db, checkoutArgs(sent, 1200));
    const admin = await memberFor(db, "ines-okafor");
    const refused = await refusal(refundPayment(db, admin, paymentId));
    expect(refused.status).toBe(409);
    expect(String(refused.body.error)).toContain("Only a paid payment");
    expect((await paymentRow(db, paymentId)).status).toBe("open");
  });

  it("answers the service's refusal as a 409 with its words, and leaves the row paid", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 6);
    const { paymentId } = await startCheckout(db, checkoutArgs(sent, 3000));
    await fake.pay((await paymentRow(db, paymentId)).checkoutSessionId!);
    const { paymentIntentId } = await paymentRow(db, paymentId);
    // Refunded on the service's side already, its event not here yet.
    fake.holdWebhooks();
    await paymentsClient().refunds.create({ payment_intent: paymentIntentId! });
    const admin = await memberFor(db, "ines-okafor");
    const refused = await refusal(refundPayment(db, admin, paymentId));
    expect(refused.status).toBe(409);
    expect(String(refused.body.error)).toContain("already been refunded");
    expect((await paymentRow(db, paymentId)).status).toBe("paid");
    // Its event, once it comes, settles it.
    await fake.releaseWebhooks();
    expect((await paymentRow(db, paymentId)).status).toBe("refunded");
  });

  it("answers 503 when the service cannot be reached, with nothing refunded", async () => {
    const db = testDb();
    const sent = await sentEstimate(db, 7);
    const { paymentId } = await startCheckout(db, checkoutArgs(sent, 3100));
    await fake.pay((await paymentRow(db, paymentId)).checkoutSessionId!);
    const admin = await memberFor(db, "ines-okafor");
    process.env.PAYMENTS_API_URL = "http://127.0.0.1:9"; // discard port: nothing listens (RFC 863)
    try {
      const refused = await refusal(refundPayment(db, admin, paymentId));
      expect(refused.status).toBe(503);
    } finally {
      process.env.PAYMENTS_API_URL = fake.url;
    }
    expect((await paymentRow(db, paymentId)).status).toBe("paid");
  });
});
