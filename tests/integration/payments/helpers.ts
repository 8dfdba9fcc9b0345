// Shared by the payments tests: the payments fake on port 0, the webhook route behind a loopback
// HTTP server (so the fake's own signed deliveries pass the request guard and the route exactly as
// they would in the demo), a sent estimate to pay against, and signed events made by the SDK.
import { createServer, type Server } from "node:http";
import { eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { auditLog, paymentEvents, payments, sentEstimates } from "~/db/schema";
import { guardRequest } from "~/http/request-guard.server";
import { makePaymentsClient } from "~/payments/stripe.server";
import { action as webhookAction } from "~/routes/api/payments-webhook";
import { startFakePayments, type FakePayments } from "../../fakes/payments";
import { TEST_ENV } from "../../setup/test-env";
import { APP, BRAMBLEGATE, caseId, contextFor } from "../api/helpers";
import { SAMPLE_SENT_DOCUMENT } from "../../setup/sent-document";

export const SECRET = TEST_ENV.PAY_WEBHOOK_SECRET;
export const CASE = caseId("b1");
export { BRAMBLEGATE };

/** The webhook route on 127.0.0.1:<free port>, through the same guard every request passes. */
export async function startWebhookServer(db: Db): Promise<{ url: string; close(): Promise<void> }> {
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === "string") headers.set(k, v);
      const request = new Request(`${APP}${req.url}`, {
        method: req.method,
        headers,
        body: Buffer.concat(chunks),
      });
      void (async () => {
        let answer: Response;
        try {
          await guardRequest(request, APP);
          answer = await webhookAction({ request, params: {}, context: contextFor(db) } as never);
        } catch (refused) {
          answer = refused instanceof Response ? refused : new Response("fault", { status: 500 });
        }
        res.writeHead(answer.status, { "content-type": "application/json" });
        res.end(await answer.text());
      })();
    });
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const address = server.address() as { port: number };
  return {
    url: `http://127.0.0.1:${address.port}/api/payments/webhook`,
    close: () => new Promise((r) => server.close(() => r())),
  };
}

/** The fake on port 0, sending to our route, with the app pointed at it. */
export async function startPayFake(webhookUrl: string): Promise<FakePayments> {
  const fake = await startFakePayments({
    port: 0,
    webhookUrl,
    webhookSecret: SECRET,
    webhookAttempts: 1, // a refused event must stay refused, not be retried into a repeat
  });
  process.env.PAYMENTS_API_URL = fake.url;
  return fake;
}

/** A sent estimate of case #1041 to pay against (sent_estimates keeps what was sent). */
export async function sentEstimate(db: Db, version: number): Promise<string> {
  const [row] = await db
    .insert(sentEstimates)
    .values({
      workshopId: BRAMBLEGATE,
      caseId: CASE,
      version,
      toEmail: "owner@mail.example",
      document: SAMPLE_SENT_DOCUMENT,
    })
    .returning({ id: sentEstimates.id });
  return row!.id;
}

export const checkoutArgs = (sentEstimateId: string, amountMinor = 4500) => ({
  workshopId: BRAMBLEGATE,
  caseId: CASE,
  sentEstimateId,
  purpose: "diagnostic_fee" as const,
  amountMinor,
  currency: "GBP",
  description: "Diagnostic fee, case #1041",
  successUrl: `${APP}/paid?session={CHECKOUT_SESSION_ID}`,
  cancelUrl: `${APP}/not-paid`,
});

/** A signed delivery made with the SDK's own test helper (docs.stripe.com/webhooks/signature). */
export function signedEvent(event: { id: string; type: string; data: { object: unknown } }) {
  const payload = JSON.stringify({ object: "event", created: Math.floor(Date.now() / 1000), ...event });
  const header = makePaymentsClient("sk_test_x", "http://127.0.0.1:1").webhooks.generateTestHeaderString({
    payload,
    secret: SECRET,
  });
  return { payload, header };
}

export async function post(url: string, payload: string, signature: string | null) {
  const res = await fetch(url, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      ...(signature !== null ? { "stripe-signature": signature } : {}),
    },
    body: payload,
  });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

export async function paymentRow(db: Db, id: string) {
  const [row] = await db.select().from(payments).where(eq(payments.id, id));
  return row!;
}

export async function auditFor(db: Db, paymentId: string) {
  return db.select().from(auditLog).where(eq(auditLog.entityId, paymentId));
}

export async function eventRows(db: Db) {
  return db.select().from(paymentEvents);
}
