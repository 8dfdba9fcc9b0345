import { z } from "zod";

// Parsed once at start-up: a missing or malformed variable stops the server with a clear message.
// The sign-in provider's URLs have no default on purpose: an unset variable must never send a
// sign-in to the real provider by accident.
// The payments API. No default URL either: an unset variable must never reach the hosted service
// from a demo. Plain HTTP is allowed to loopback only (the local fake).
function paymentsFields() {
  return {
    PAYMENTS_SECRET_KEY: z
      .string({ message: "PAYMENTS_SECRET_KEY is required (a secret key, sk_test_… for the local fake)" })
      .regex(/^(sk|rk)_(test|live)_\w+$/, "PAYMENTS_SECRET_KEY must be a secret key such as sk_test_…"),
    PAYMENTS_API_URL: z
      .url({ message: "PAYMENTS_API_URL is required, e.g. http://127.0.0.1:4103 for the local fake" })
      .refine(
        (u) => u.startsWith("https://") || isLoopback(u),
        "PAYMENTS_API_URL must be https://, or http:// to 127.0.0.1 or localhost (the local fake)",
      ),
    PAY_WEBHOOK_SECRET: z
      .string({ message: "PAY_WEBHOOK_SECRET is required (the webhook signing secret, whsec_…)" })
      .regex(/^whsec_\w{8,}$/, "PAY_WEBHOOK_SECRET must be a webhook signing secret such as whsec_…"),
  };
}

export function isLoopback(url: string): boolean {
  const host = new URL(url).hostname;
  return host === "127.0.0.1" || host === "localhost" || host === "[::1]";
}

const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.url({
    message: "DATABASE_URL must be a postgres:// URL (scripts/pg.sh url prints the local one)",
  }),
  APP_URL: z.url({ message: "APP_URL must be the public URL of this server, e.g. http://127.0.0.1:3000" }),
  GITHUB_CLIENT_ID: z.string().min(1, "GITHUB_CLIENT_ID is required"),
  GITHUB_CLIENT_SECRET: z.string().min(8, "GITHUB_CLIENT_SECRET is required (at least 8 characters)"),
  GITHUB_OAUTH_URL: z.url({
    message: "GITHUB_OAUTH_URL (base of /login/oauth/authorize and /access_token) is required",
  }),
  GITHUB_API_URL: z.url({ message: "GITHUB_API_URL (base of /user) is required" }),
  // Per client address only a flood is refused: a workshop signs everyone in from one address.
  SIGN_IN_LIMIT_PER_IP: z.coerce.number().int().positive().default(300),
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_S: z.coerce.number().int().positive().default(300),
  // The e-mailed code: its key (64 hex digits; derived from the OAuth secret when unset), how long a
  // code lives, how many tries one code gets, and how many codes and tries one address gets per window.
  SIGN_IN_CODE_SECRET: z
    .string()
    .regex(/^[0-9a-fA-F]{64}$/, "SIGN_IN_CODE_SECRET must be 64 hexadecimal digits")
    .optional(),
  SIGN_IN_CODE_PERIOD_S: z.coerce.number().int().positive().default(600),
  SIGN_IN_CODE_TRIES: z.coerce.number().int().positive().default(5),
  SIGN_IN_CODE_SENDS_PER_ADDRESS: z.coerce.number().int().positive().default(5),
  SIGN_IN_CODE_TRIES_PER_ADDRESS: z.coerce.number().int().positive().default(10),
  SIGN_IN_CODE_WINDOW_S: z.coerce.number().int().positive().default(900),
  ...paymentsFields(),
});

export type Env = z.infer<typeof EnvSchema>;

let parsed: Env | undefined;

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) refuseToStart(result.error);
  return result.data;
}

function refuseToStart(error: z.ZodError): never {
  const lines = error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
  throw new Error(`Ramplight cannot start; fix these environment variables:\n${lines}`);
}

export function env(): Env {
  parsed ??= parseEnv(process.env);
  return parsed;
}

export const isSecure = (e: Env) => e.APP_URL.startsWith("https://");

/** The origin our own pages are served from: the only one whose writes are accepted. */
export const appOrigin = () => new URL(env().APP_URL).origin;

const PaymentsSchema = z.object(paymentsFields());
export type PaymentsConfig = z.infer<typeof PaymentsSchema>;

/**
 * The payments part of the environment, read afresh on each call rather than cached with the rest:
 * a test starts the fake on a port picked at start and points PAYMENTS_API_URL at it. The server
 * has already refused to start without these (env() above), so this only fails in a test.
 */
export function paymentsConfig(): PaymentsConfig {
  const result = PaymentsSchema.safeParse(process.env);
  if (!result.success) refuseToStart(result.error);
  return result.data;
}

/** Where the payment service's hosted page lives: PAYMENTS_PAGE_URL, or the API's own origin (the fake serves both). */
export function paymentsPageOrigin(): string {
  return new URL(process.env.PAYMENTS_PAGE_URL || paymentsConfig().PAYMENTS_API_URL).origin;
}
