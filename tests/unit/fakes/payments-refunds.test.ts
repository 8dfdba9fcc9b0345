// The payments fake's refunds and its test controls over delivery (hold, reverse, redeliver),
// through the unmodified SDK. Refund and charge fields follow the SDK's types (docs.stripe.com/api/refunds,
// docs.stripe.com/api/charges); amounts are invented (common practice, no published source).
import { createServer, type Server } from "node:http";
import Stripe from "stripe";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { startFakePayments, type FakePayments } from "../../fakes/payments";

const SECRET = "whsec_test_ramplight_refunds_only";
const received: { id: string; type: string; object: Record<string, unknown> }[] = [];
let server: Server;
let fake: FakePayments;

beforeEach(async () => {
  received.length = 0;
  server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const body = Buffer.concat(chunks).toString("utf8");
      const event = new Stripe("sk_test_x").webhooks.constructEvent(
        body,
        String(req.headers["stripe-signature"]),
        SECRET,
      );
      received.push({
        id: event.id,
        type: event.type,
        object: event.data.object as unknown as Record<string, unknown>,
      });
      res.writeHead(200).end();
    });
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const port = (server.address() as { port: number }).port;
  fake = await startFakePayments({
    port: 0,
    webhookUrl: `http://127.0.0.1:${port}/hook`,
    webhookSecret: SECRET,
  });
});
afterEach(async () => {
  await fake.close();
  await new Promise<void>((r) => server.close(() => r()));
});

const sdk = () =>
  new Stripe("sk_test_ramplight_fake", {
    host: "127.0.0.1",
    port: fake.port,
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });

async function paidIntent(amount = 6000): Promise<string> {
  const s = await sdk().checkout.sessions.create({
    mode: "payment",
    success_url: "http://127.0.0.1:3999/paid",
    line_items: [
      { quantity: 1, price_data: { currency: "gbp", unit_amount: amount, product_data: { name: "Fee" } } },
    ],
  });
  await fake.pay(s.id);
  return fake.sessions().find((x) => x.id === s.id)!.payment_intent!;
}

describe("fake payments: refunds", () => {
  it("refunds a payment intent in full and sends charge.refunded with the charge", async () => {
    const pi = await paidIntent();
    const refund = await sdk().refunds.create({ payment_intent: pi }, { idempotencyKey: "r1" });
    expect(refund).toMatchObject({ object: "refund", amount: 6000, currency: "gbp", payment_intent: pi });
    expect(refund.id).toMatch(/^re_test_/);
    // The same key again replays the first answer: one refund, not two.
    const replay = await sdk().refunds.create({ payment_intent: pi }, { idempotencyKey: "r1" });
    expect(replay.id).toBe(refund.id);
    await fake.settled();
    const event = received.find((e) => e.type === "charge.refunded")!;
    expect(event.object).toMatchObject({
      object: "charge",
      payment_intent: pi,
      amount_refunded: 6000,
      refunded: true,
    });
    expect((event.object.refunds as { data: { id: string }[] }).data[0]!.id).toBe(refund.id);
    expect(fake.refunds()).toHaveLength(1);
  });

  it("refunds in parts by charge, then refuses what is not there", async () => {
    const pi = await paidIntent(6000);
    await sdk().refunds.create({ payment_intent: pi, amount: 1000 });
    await fake.settled();
    const charge = received.find((e) => e.type === "charge.refunded")!.object;
    expect(charge).toMatchObject({ amount_refunded: 1000, refunded: false });
    await sdk().refunds.create({ charge: String(charge.id) });
    const again = sdk().refunds.create({ payment_intent: pi });
    await expect(again).rejects.toMatchObject({ statusCode: 400, code: "charge_already_refunded" });
    await expect(sdk().refunds.create({ payment_intent: "pi_test_nope" })).rejects.toMatchObject({
      statusCode: 400,
      code: "resource_missing",
    });
  });

  it("holds events, sends them newest first, and sends one again with the same id", async () => {
    const pi = await paidIntent();
    const paidEvent = received[0]!;
    fake.holdWebhooks();
    await sdk().refunds.create({ payment_intent: pi });
    const s2 = await sdk().checkout.sessions.create({
      mode: "payment",
      success_url: "http://127.0.0.1:3999/paid",
      line_items: [
        { quantity: 1, price_data: { currency: "gbp", unit_amount: 100, product_data: { name: "Fee" } } },
      ],
    });
    await fake.pay(s2.id);
    expect(received).toHaveLength(1);
    await fake.releaseWebhooks("reverse");
    expect(received.map((e) => e.type)).toEqual([
      "checkout.session.completed",
      "checkout.session.completed",
      "charge.refunded",
    ]);
    await fake.redeliver(paidEvent.id);
    expect(received.at(-1)).toMatchObject({ id: paidEvent.id, type: "checkout.session.completed" });
  });
});
