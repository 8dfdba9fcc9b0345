// The payments SDK's client, from the environment (app/config/env.server.ts). Against the local
// fake it speaks plain HTTP to loopback; no retries of its own (a retry is the caller's decision,
// made with the same idempotency key) and no telemetry headers.
import Stripe from "stripe";
import { isLoopback, paymentsConfig } from "~/config/env.server";

let cached: { key: string; url: string; client: Stripe } | undefined;

export function makePaymentsClient(key: string, apiUrl: string): Stripe {
  const url = new URL(apiUrl);
  const loopback = isLoopback(apiUrl);
  return new Stripe(key, {
    host: url.hostname,
    port: url.port ? Number(url.port) : loopback ? 80 : 443,
    protocol: loopback && url.protocol === "http:" ? "http" : "https",
    maxNetworkRetries: 0,
    telemetry: false,
    timeout: 10_000,
  });
}

/** The process's client; rebuilt only when the key or URL changes (a test's fake on a new port). */
export function paymentsClient(): Stripe {
  const { PAYMENTS_SECRET_KEY: key, PAYMENTS_API_URL: url } = paymentsConfig();
  if (cached?.key !== key || cached.url !== url) cached = { key, url, client: makePaymentsClient(key, url) };
  return cached.client;
}

export const webhookSecret = () => paymentsConfig().PAY_WEBHOOK_SECRET;

export type { Stripe };
