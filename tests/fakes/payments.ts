// A fake of the hosted payments API, just the Checkout Sessions and refunds Ramplight uses, speaking the
// public wire format so the unmodified stripe SDK can talk to it (host/port/protocol options).
// Paying on its hosted page sends a signed `checkout.session.completed` webhook, signed the way
// the real service signs, so the app's verification code runs unchanged in the demo.
import { randomBytes } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import { listen, readBody, redirect, sendHtml, sendJson, sendText } from "./http-util";
import { asRecord, asString, parseBracketForm, renderPayPage, PAY_PAGE_TITLE } from "./payments-wire";
import type { FormObject, PayPageSession } from "./payments-wire";
import { createDeliverer, type WebhookDelivery } from "./payments-deliver";
import { createRefund, newCharge, type Charge, type Refund } from "./payments-refunds";

export type { WebhookDelivery } from "./payments-deliver";

export type FakePaymentsOptions = {
  port?: number;
  host?: string; // loopback only; defaults to 127.0.0.1
  webhookUrl?: string; // no deliveries when unset
  webhookSecret?: string; // "whsec_..."; required when webhookUrl is set
  webhookAttempts?: number; // total tries per event, default 3 (the real service retries for days)
  retryDelayMs?: number; // doubled after each failure, default 200
  now?: () => number;
};

export type CheckoutSession = {
  id: string;
  object: "checkout.session";
  url: string | null;
  mode: string;
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid" | "no_payment_required";
  amount_subtotal: number | null;
  amount_total: number | null;
  currency: string | null;
  metadata: Record<string, string>;
  client_reference_id: string | null;
  customer_email: string | null;
  success_url: string | null;
  cancel_url: string | null;
  payment_intent: string | null;
  created: number;
  expires_at: number;
  livemode: false;
};

export type FakePayments = {
  url: string;
  port: number;
  close(): Promise<void>;
  sessions(): CheckoutSession[];
  deliveries(): WebhookDelivery[];
  events(): { id: string; type: string }[]; // every event made, in order
  refunds(): Refund[];
  // Same as pressing "Pay" on the hosted page; resolves after the webhook attempts finish.
  pay(sessionId: string): Promise<WebhookDelivery | null>;
  // For tests: hold events back from now on, then send them in the order made or reversed.
  holdWebhooks(): void;
  releaseWebhooks(order?: "sent" | "reverse"): Promise<(WebhookDelivery | null)[]>;
  // Sends an event already made once more, same id and body (a duplicate delivery).
  redeliver(eventId: string): Promise<WebhookDelivery | null>;
  // Resolves when no webhook is being sent (a refund's event goes out after its answer).
  settled(): Promise<void>;
};

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;
const stripeError = (
  res: ServerResponse,
  status: number,
  message: string,
  extra: Record<string, string> = {},
) => sendJson(res, status, { error: { type: "invalid_request_error", message, ...extra } });

export async function startFakePayments(opts: FakePaymentsOptions = {}): Promise<FakePayments> {
  if (opts.webhookUrl && !opts.webhookSecret) throw new Error("webhookSecret is required with webhookUrl");
  const now = opts.now ?? Date.now;
  const sessions = new Map<
    string,
    { session: CheckoutSession; page: PayPageSession; apiVersion: string | null }
  >();
  const idempotent = new Map<string, unknown>();
  const charges: Charge[] = [];
  const refunds: Refund[] = [];
  const webhooks = createDeliverer({ ...opts, now });
  let base = "";

  function createSession(form: FormObject, apiVersion: string | null): CheckoutSession | string {
    const mode = asString(form.mode);
    if (mode !== "payment" && mode !== "subscription" && mode !== "setup")
      return "mode must be payment, subscription or setup";
    const items: PayPageSession["items"] = [];
    let currency = asString(form.currency)?.toLowerCase() ?? null;
    const lineItems = Array.isArray(form.line_items) ? form.line_items : [];
    for (const raw of lineItems) {
      const item = asRecord(raw);
      const price = asRecord(item.price_data);
      const unitAmount = Number(asString(price.unit_amount));
      const quantity = Number(asString(item.quantity) ?? "1");
      if (!asString(price.currency) || !Number.isInteger(unitAmount) || !Number.isInteger(quantity)) {
        return "this fake supports line_items[].price_data with currency and integer unit_amount only";
      }
      const itemCurrency = asString(price.currency)!.toLowerCase();
      if (currency !== null && currency !== itemCurrency) return "all line items must share one currency";
      currency = itemCurrency;
      items.push({ name: asString(asRecord(price.product_data).name) ?? "Item", quantity, unitAmount });
    }
    if (mode !== "setup" && items.length === 0)
      return "line_items is required in payment and subscription mode";
    const total = mode === "setup" ? null : items.reduce((sum, it) => sum + it.unitAmount * it.quantity, 0);
    const created = Math.floor(now() / 1000);
    const sessionId = `cs_test_${randomBytes(24).toString("hex")}`;
    const metadata = Object.fromEntries(
      Object.entries(asRecord(form.metadata)).map(([k, v]) => [k, asString(v) ?? ""]),
    );
    const session: CheckoutSession = {
      id: sessionId,
      object: "checkout.session",
      url: `${base}/pay/${sessionId}`,
      mode,
      status: "open",
      payment_status: mode === "setup" ? "no_payment_required" : "unpaid",
      amount_subtotal: total,
      amount_total: total,
      currency,
      metadata,
      client_reference_id: asString(form.client_reference_id) ?? null,
      customer_email: asString(form.customer_email) ?? null,
      success_url: asString(form.success_url) ?? null,
      cancel_url: asString(form.cancel_url) ?? null,
      payment_intent: null,
      created,
      expires_at: created + 24 * 3600,
      livemode: false,
    };
    sessions.set(sessionId, { session, apiVersion, page: { ...session, items } });
    return session;
  }

  async function pay(sessionId: string): Promise<WebhookDelivery | null> {
    const entry = sessions.get(sessionId);
    if (!entry) throw new Error(`No such checkout.session: '${sessionId}'`);
    if (entry.session.status !== "open") return null; // paying twice must not send a second event
    Object.assign(entry.session, {
      status: "complete",
      payment_intent: entry.session.mode === "payment" ? id("pi_test") : null,
    });
    if (entry.session.payment_status === "unpaid") entry.session.payment_status = "paid";
    Object.assign(entry.page, { status: entry.session.status, payment_status: entry.session.payment_status });
    const { payment_intent: pi, amount_total: total, currency } = entry.session;
    if (pi && total !== null && currency) charges.push(newCharge(pi, total, currency, now()));
    return webhooks.emit("checkout.session.completed", { ...entry.session }, entry.apiVersion);
  }

  async function api(req: IncomingMessage, res: ServerResponse, path: string): Promise<void> {
    const key = /^Bearer\s+(\S+)$/i.exec(req.headers.authorization ?? "")?.[1];
    if (!key) return stripeError(res, 401, "You did not provide an API key.");
    // A live key here means the app is misconfigured; refuse loudly instead of pretending.
    if (!key.startsWith("sk_test_") && !key.startsWith("rk_test_"))
      return stripeError(res, 401, "The payments fake accepts test keys only.");
    res.setHeader("request-id", id("req"));
    const one = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path);
    if (req.method === "GET" && one) {
      const entry = sessions.get(decodeURIComponent(one[1]!));
      if (!entry)
        return stripeError(res, 404, `No such checkout.session: '${one[1]}'`, {
          code: "resource_missing",
          param: "id",
        });
      return sendJson(res, 200, entry.session);
    }
    const idemKey = req.headers["idempotency-key"];
    const version = req.headers["stripe-version"];
    const replay = typeof idemKey === "string" ? idempotent.get(`${path} ${idemKey}`) : undefined;
    if (req.method === "POST" && replay) return sendJson(res, 200, replay);
    if (req.method === "POST" && path === "/v1/refunds") {
      const made = createRefund(parseBracketForm(await readBody(req)), charges, now());
      if ("error" in made)
        return stripeError(res, made.status, made.error, made.code ? { code: made.code } : {});
      refunds.push(made.refund);
      if (typeof idemKey === "string") idempotent.set(`${path} ${idemKey}`, made.refund);
      sendJson(res, 200, made.refund);
      // After the answer, as the real service does: the app must not need the event to finish.
      void webhooks.emit(
        "charge.refunded",
        structuredClone(made.charge),
        typeof version === "string" ? version : null,
      );
      return;
    }
    if (req.method === "POST" && path === "/v1/checkout/sessions") {
      const result = createSession(
        parseBracketForm(await readBody(req)),
        typeof version === "string" ? version : null,
      );
      if (typeof result === "string") return stripeError(res, 400, result);
      if (typeof idemKey === "string") idempotent.set(`${path} ${idemKey}`, result);
      return sendJson(res, 200, result);
    }
    stripeError(
      res,
      404,
      `Unrecognized request URL (${req.method}: ${path}). The fake covers checkout sessions and refunds only.`,
    );
  }

  async function hosted(
    req: IncomingMessage,
    res: ServerResponse,
    sessionId: string,
    action: string | undefined,
  ) {
    const entry = sessions.get(sessionId);
    if (!entry) return sendHtml(res, 404, PAY_PAGE_TITLE, "<h1>No such checkout</h1>");
    if (req.method === "GET" && action === undefined) return renderPayPage(res, entry.page);
    if (req.method !== "POST" || (action !== "pay" && action !== "cancel"))
      return sendText(res, 405, "method not allowed");
    if (action === "pay") await pay(sessionId);
    const target = action === "pay" ? entry.session.success_url : entry.session.cancel_url;
    if (target) return redirect(res, target.replace("{CHECKOUT_SESSION_ID}", sessionId));
    renderPayPage(res, entry.page);
  }

  const server = await listen(
    async (req, res) => {
      const path = new URL(req.url ?? "/", "http://fake").pathname;
      if (path === "/__health") return sendText(res, 200, "ok");
      if (path.startsWith("/v1/")) return api(req, res, path);
      const page = /^\/pay\/([A-Za-z0-9_]+)(?:\/(pay|cancel))?$/.exec(path);
      if (page) return hosted(req, res, page[1]!, page[2]);
      sendText(res, 404, "not found");
    },
    opts.port,
    opts.host,
  );
  base = server.url;

  return {
    url: base,
    port: server.port,
    close: server.close,
    sessions: () => [...sessions.values()].map((e) => ({ ...e.session })),
    deliveries: webhooks.deliveries,
    events: webhooks.events,
    refunds: () => refunds.map((r) => ({ ...r })),
    pay,
    holdWebhooks: webhooks.hold,
    releaseWebhooks: webhooks.release,
    redeliver: webhooks.redeliver,
    settled: webhooks.settled,
  };
}
