import { z } from "zod";

// Parsed once at start-up: a missing or malformed variable stops the server with a clear message.
// The sign-in provider's URLs have no default on purpose: an unset variable must never send a
// sign-in to the real provider by accident.
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
  SIGN_IN_LIMIT_PER_IP: z.coerce.number().int().positive().default(20),
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_S: z.coerce.number().int().positive().default(300),
});

export type Env = z.infer<typeof EnvSchema>;

let parsed: Env | undefined;

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Ramplight cannot start; fix these environment variables:\n${lines}`);
  }
  return result.data;
}

export function env(): Env {
  parsed ??= parseEnv(process.env);
  return parsed;
}

export const isSecure = (e: Env) => e.APP_URL.startsWith("https://");

/** The origin our own pages are served from: the only one whose writes are accepted. */
export const appOrigin = () => new URL(env().APP_URL).origin;
