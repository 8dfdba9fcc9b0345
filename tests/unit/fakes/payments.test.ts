import { createServer } from "node:http";
import type { IncomingHttpHeaders, Server } from "node:http";
import Stripe from "stripe";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { startFakePayments } from "../../fakes/payments";
import type { FakePayments, FakePaymentsOptions } from "../../fakes/payments";
import { parseBracketForm, signWebhook } from "../../fakes/payments-wire";

const SECRET = "whsec_test_ramplight_demo_only";

// A stand-in for the app's webhook route: records raw bodies and answers with scripted statuses.
type Received = { body: string; headers: IncomingHttpHeaders };
async function startReceiver(statuses: number[] = []) {
  const received: Received[] = [];
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      received.push({ body: Buffer.concat(chunks).toString("utf8"), headers: req.headers });
      res.writeHead(statuses.shift() ?? 200).end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const address = server.address();
  if (address === null || typeof address === "string") throw new Error("no address");
  return {
    url: `http://127.0.0.1:${address.port}/webhooks/payments`,
    received,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

let receiver: Awaited<ReturnType<typeof startReceiver>>;
let fake: FakePayments;
const cleanups: (() => Promise<void>)[] = [];

async function start(statuses: number[] = [], extra: Partial<FakePaymentsOptions> = {}) {
  receiver = await startReceiver(statuses);
  fake = await startFakePayments({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: SECRET,
    retryDelayMs: 5,
    ...extra,
  });
  cleanups.push(receiver.close, fake.close);
}
afterEach(async () => {
  for (const close of cleanups.splice(0)) await close();
});

const sdk = (key = "sk_test_ramplight_fake") =>
  new Stripe(key, {
    host: "127.0.0.1",
    port: fake.port,
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });

const sessionParams = (): Stripe.Checkout.SessionCreateParams => ({
  mode: "payment",
  success_url: "http://127.0.0.1:3999/jobs/42/paid?session={CHECKOUT_SESSION_ID}",
  cancel_url: "http://127.0.0.1:3999/jobs/42",
  client_reference_id: "job_42",
  metadata: { workshop: "bramblegate", jobId: "42" },
  line_items: [
    {
      quantity: 1,
      price_data: { currency: "gbp", unit_amount: 8400, product_data: { name: "Labour, 1 h" } },
    },
    {
      quantity: 2,
      price_data: { currency: "gbp", unit_amount: 1250, product_data: { name: "Wiper blade" } },
    },
  ],
});

describe("fake payments with the stripe SDK", () => {
  beforeEach(() => start());

  it("creates and retrieves a checkout session", async () => {
    const session = await sdk().checkout.sessions.create(sessionParams());
    expect(session).toMatchObject({
      id: expect.stringMatching(/^cs_test_/),
      object: "checkout.session",
      url: `${fake.url}/pay/${session.id}`,
      payment_status: "unpaid",
      status: "open",
      amount_total: 10900,
      currency: "gbp",
      metadata: { workshop: "bramblegate", jobId: "42" },
      client_reference_id: "job_42",
    });
    const again = await sdk().checkout.sessions.retrieve(session.id);
    expect(again).toMatchObject({ id: session.id, amount_total: 10900 });
  });

  it("shows a hosted page with the total, Pay and Cancel", async () => {
    const session = await sdk().checkout.sessions.create(sessionParams());
    const html = await (await fetch(session.url!)).text();
    expect(html).toContain("Fake payment page (local demo only)");
    expect(html).toContain("£109.00");
    expect(html).toMatch(/<button type="submit">Pay<\/button>/);
    expect(html).toMatch(/<button type="submit">Cancel<\/button>/);
  });

  it("paying redirects to success_url and sends a webhook that constructEvent verifies", async () => {
    const stripe = sdk();
    const session = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(`${fake.url}/pay/${session.id}/pay`, { method: "POST", redirect: "manual" });
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe(`http://127.0.0.1:3999/jobs/42/paid?session=${session.id}`);

    expect(receiver.received).toHaveLength(1);
    const { body, headers } = receiver.received[0]!;
    expect(headers["stripe-signature"]).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const event = stripe.webhooks.constructEvent(body, headers["stripe-signature"] as string, SECRET);
    expect(event.type).toBe("checkout.session.completed");
    const paid = event.data.object as Stripe.Checkout.Session;
    expect(paid).toMatchObject({
      id: session.id,
      payment_status: "paid",
      status: "complete",
      client_reference_id: "job_42",
    });
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("paid");
  });

  it("a tampered body or a wrong secret fails verification", async () => {
    const stripe = sdk();
    const session = await stripe.checkout.sessions.create(sessionParams());
    await fake.pay(session.id);
    const { body, headers } = receiver.received[0]!;
    const signature = headers["stripe-signature"] as string;
    const tampered = body.replace('"amount_total": 10900', '"amount_total": 1');
    expect(tampered).not.toBe(body);
    expect(() => stripe.webhooks.constructEvent(tampered, signature, SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => stripe.webhooks.constructEvent(body, signature, "whsec_other")).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
  });

  it("paying twice sends one event; cancelling leaves the session open", async () => {
    const stripe = sdk();
    const paid = await stripe.checkout.sessions.create(sessionParams());
    await fake.pay(paid.id);
    expect(await fake.pay(paid.id)).toBeNull();
    expect(receiver.received).toHaveLength(1);
    const other = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(`${fake.url}/pay/${other.id}/cancel`, { method: "POST", redirect: "manual" });
    expect(res.headers.get("location")).toBe("http://127.0.0.1:3999/jobs/42");
    expect((await stripe.checkout.sessions.retrieve(other.id)).status).toBe("open");
  });

  it("answers like the real API for unknown sessions, bad params and live keys", async () => {
    await expect(sdk().checkout.sessions.retrieve("cs_test_missing")).rejects.toBeInstanceOf(
      Stripe.errors.StripeInvalidRequestError,
    );
    await expect(sdk().checkout.sessions.create({ ...sessionParams(), mode: undefined })).rejects.toThrow(
      /mode must be/,
    );
    await expect(sdk("sk_live_nope").checkout.sessions.create(sessionParams())).rejects.toBeInstanceOf(
      Stripe.errors.StripeAuthenticationError,
    );
  });
});

describe("fake payments webhook retries", () => {
  it("retries a failed delivery and stops once it succeeds", async () => {
    await start([500, 503]);
    const session = await sdk().checkout.sessions.create(sessionParams());
    const delivery = await fake.pay(session.id);
    expect(delivery).toMatchObject({
      type: "checkout.session.completed",
      attempts: 3,
      delivered: true,
      lastStatus: 200,
    });
    expect(receiver.received).toHaveLength(3);
    // Every attempt carries a valid signature over the same event.
    const ids = receiver.received.map(
      (r) => sdk().webhooks.constructEvent(r.body, r.headers["stripe-signature"] as string, SECRET).id,
    );
    expect(new Set(ids).size).toBe(1);
  });

  it("gives up after a bounded number of attempts", async () => {
    await start([500, 500, 500, 500, 500], { webhookAttempts: 2 });
    const session = await sdk().checkout.sessions.create(sessionParams());
    const delivery = await fake.pay(session.id);
    expect(delivery).toMatchObject({ attempts: 2, delivered: false, lastStatus: 500 });
    expect(receiver.received).toHaveLength(2);
    expect(fake.deliveries()).toHaveLength(1);
  });

  it("refuses to listen on a non-loopback address", async () => {
    await expect(startFakePayments({ host: "0.0.0.0" })).rejects.toThrow(/loopback/);
  });
});

describe("payments wire format", () => {
  it("parses the SDK's bracketed form encoding into nested objects and arrays", () => {
    const form = parseBracketForm(
      "mode=payment&line_items[0][quantity]=2&line_items[0][price_data][currency]=gbp&metadata[jobId]=42&expand[]=a&__proto__[x]=1",
    );
    expect(form).toEqual({
      mode: "payment",
      line_items: [{ quantity: "2", price_data: { currency: "gbp" } }],
      metadata: { jobId: "42" },
      expand: ["a"],
    });
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  it("signs exactly like the SDK's own test helper", () => {
    const payload = JSON.stringify({ id: "evt_test_1", object: "event" });
    const timestamp = 1_760_000_000;
    expect(signWebhook(payload, SECRET, timestamp)).toBe(
      Stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET, timestamp }),
    );
  });
});
