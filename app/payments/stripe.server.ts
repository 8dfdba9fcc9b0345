// The payments SDK's client, from the environment (app/config/env.server.ts). Against the local
// fake it speaks plain HTTP to loopback; no retries of its own (a retry is the caller's decision,
// made with the same idempotency key) and no telemetry headers.
import Stripe from "stripe";
import { isLoopback, paymentsConfig } from "~/config/env.server";
import { refuse } from "~/http/errors.server";

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

/**
 * Runs one call to the service; its refusal becomes ours with its message (409: it was asked
 * something it will not do, such as refunding twice), and an unreachable service a 503 that says
 * nothing was done. Anything else is thrown on.
 */
export async function askService<T>(what: string, call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (error instanceof Stripe.errors.StripeInvalidRequestError)
      refuse(409, `The payments service refused to ${what}: ${error.message} Nothing changed.`);
    if (error instanceof Stripe.errors.StripeError)
      refuse(503, `The payments service could not ${what} just now; nothing changed. Try again shortly.`);
    throw error;
  }
}

export type { Stripe };
