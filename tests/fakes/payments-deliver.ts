// The payments fake's webhook sender: signs each event as the real service does, retries a
// non-2xx, and, for tests, can hold events back and release them in any order or send one again
// (the real service promises neither order nor exactly-once delivery).
import { randomBytes } from "node:crypto";
import { signWebhook } from "./payments-wire";

export type WebhookDelivery = {
  eventId: string;
  type: string;
  attempts: number;
  delivered: boolean;
  lastStatus: number | null;
  lastError: string | null;
};

export type DelivererOptions = {
  webhookUrl?: string;
  webhookSecret?: string;
  webhookAttempts?: number;
  retryDelayMs?: number;
  now: () => number;
};

type Event = { id: string; type: string; body: string };

export function createDeliverer(opts: DelivererOptions) {
  const deliveries: WebhookDelivery[] = [];
  const sent = new Map<string, Event>();
  const held: Event[] = [];
  const inflight = new Set<Promise<unknown>>();
  let holding = false;

  function build(type: string, object: unknown, apiVersion: string | null): Event {
    const event = {
      id: `evt_test_${randomBytes(12).toString("hex")}`,
      object: "event",
      api_version: apiVersion,
      created: Math.floor(opts.now() / 1000),
      data: { object },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    return { id: event.id, type, body: JSON.stringify(event, null, 2) };
  }

  async function send(event: Event): Promise<WebhookDelivery | null> {
    if (!opts.webhookUrl || !opts.webhookSecret) return null;
    const record: WebhookDelivery = {
      eventId: event.id,
      type: event.type,
      attempts: 0,
      delivered: false,
      lastStatus: null,
      lastError: null,
    };
    deliveries.push(record);
    const attempts = Math.max(1, opts.webhookAttempts ?? 3);
    let delay = opts.retryDelayMs ?? 200;
    while (record.attempts < attempts && !record.delivered) {
      if (record.attempts > 0) {
        await new Promise((r) => setTimeout(r, delay));
        delay *= 2;
      }
      record.attempts += 1;
      try {
        // Signed afresh on each attempt, with a new timestamp, as the real service does.
        const signature = signWebhook(event.body, opts.webhookSecret, Math.floor(opts.now() / 1000));
        const res = await fetch(opts.webhookUrl, {
          method: "POST",
          headers: {
            "content-type": "application/json; charset=utf-8",
            "stripe-signature": signature,
            "user-agent": "Ramplight-fake-payments/1.0",
          },
          body: event.body,
          signal: AbortSignal.timeout(5000),
        });
        await res.body?.cancel();
        record.lastStatus = res.status;
        record.lastError = null;
        record.delivered = res.status >= 200 && res.status < 300;
      } catch (err) {
        record.lastStatus = null;
        record.lastError = err instanceof Error ? err.message : String(err);
      }
    }
    return record;
  }

  const track = <T>(p: Promise<T>): Promise<T> => {
    inflight.add(p);
    void p.finally(() => inflight.delete(p));
    return p;
  };

  return {
    /** Sends a new event now (or holds it); resolves after its attempts. */
    emit(type: string, object: unknown, apiVersion: string | null): Promise<WebhookDelivery | null> {
      const event = build(type, object, apiVersion);
      sent.set(event.id, event);
      if (holding) {
        held.push(event);
        return Promise.resolve(null);
      }
      return track(send(event));
    },
    hold() {
      holding = true;
    },
    /** Sends what was held, one after another, oldest first or (reverse) newest first. */
    async release(order: "sent" | "reverse" = "sent"): Promise<(WebhookDelivery | null)[]> {
      holding = false;
      const batch = held.splice(0);
      if (order === "reverse") batch.reverse();
      const out: (WebhookDelivery | null)[] = [];
      for (const e of batch) out.push(await track(send(e)));
      return out;
    },
    /** The same event (same id and body) once more, as a redelivery by the real service is. */
    redeliver(eventId: string): Promise<WebhookDelivery | null> {
      const event = sent.get(eventId);
      if (!event) throw new Error(`No such event: '${eventId}'`);
      return track(send(event));
    },
    /** Resolves when no delivery is under way. */
    async settled(): Promise<void> {
      while (inflight.size) await Promise.allSettled([...inflight]);
    },
    deliveries: () => deliveries.map((d) => ({ ...d })),
    events: () => [...sent.values()].map((e) => ({ id: e.id, type: e.type })),
  };
}
