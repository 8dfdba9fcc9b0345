// Starts every fake for the offline demo: `npx tsx tests/fakes/start.ts` (or, so that a stop
// signal reaches this process and not a wrapper, `node --import tsx tests/fakes/start.ts`).
// Configuration comes from the environment only; see docs/fakes.md.
import { rm, writeFile } from "node:fs/promises";
import { pathToFileURL } from "node:url";
import { DEMO_PEOPLE } from "../../seeds/demo/people";
import { startFakeOAuthProvider } from "./oauth-provider";
import { startFakePayments } from "./payments";
import { startFakeSmtp } from "./smtp";

type Env = Record<string, string | undefined>;

export type RunningFakes = { lines: string[]; close(): Promise<void> };

function port(env: Env, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0 || value > 65535)
    throw new Error(`${name} must be a port number, not "${raw}"`);
  return value;
}

// Refuse to start half-configured: a fake that silently invents a client id would hide the very
// misconfiguration the demo should surface.
function required(env: Env, names: string[]): void {
  const missing = names.filter((n) => !env[n]);
  if (missing.length > 0)
    throw new Error(`tests/fakes/start.ts: set ${missing.join(", ")} (see docs/fakes.md)`);
}

export async function startAllFakes(env: Env): Promise<RunningFakes> {
  required(env, ["OAUTH_CLIENT_ID", "OAUTH_CLIENT_SECRET", "OAUTH_REDIRECT_URI"]);
  if (env.PAY_WEBHOOK_URL) required(env, ["PAY_WEBHOOK_SECRET"]);
  const redirectUris = env
    .OAUTH_REDIRECT_URI!.split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  const started: { close(): Promise<void> }[] = [];
  const close = async () => {
    await Promise.allSettled(started.reverse().map((s) => s.close()));
  };
  try {
    const oauth = await startFakeOAuthProvider({
      port: port(env, "FAKE_OAUTH_PORT", 4101),
      clients: [{ clientId: env.OAUTH_CLIENT_ID!, clientSecret: env.OAUTH_CLIENT_SECRET!, redirectUris }],
      users: DEMO_PEOPLE,
    });
    started.push(oauth);
    const smtp = await startFakeSmtp({
      port: port(env, "FAKE_SMTP_PORT", 4102),
      dir: env.FAKE_MAIL_DIR || undefined,
    });
    started.push(smtp);
    const pay = await startFakePayments({
      port: port(env, "FAKE_PAY_PORT", 4103),
      webhookUrl: env.PAY_WEBHOOK_URL || undefined,
      webhookSecret: env.PAY_WEBHOOK_SECRET || undefined,
    });
    started.push(pay);
    const webhook = env.PAY_WEBHOOK_URL
      ? `webhooks to ${env.PAY_WEBHOOK_URL}`
      : "no webhooks (PAY_WEBHOOK_URL unset)";
    return {
      lines: [
        `fake-oauth    ${oauth.url}  (client ${env.OAUTH_CLIENT_ID}, ${DEMO_PEOPLE.length} demo people)`,
        `fake-smtp     smtp://${smtp.host}:${smtp.port}  (${env.FAKE_MAIL_DIR ? `mail saved in ${env.FAKE_MAIL_DIR}` : "mail kept in memory"})`,
        `fake-payments ${pay.url}  (${webhook})`,
      ],
      close,
    };
  } catch (err) {
    await close(); // a port clash on the third fake must not leave the first two running
    throw err;
  }
}

async function main(): Promise<void> {
  const fakes = await startAllFakes(process.env);
  const pidFile = process.env.FAKES_PID_FILE;
  if (pidFile) await writeFile(pidFile, `${process.pid}\n`);
  for (const line of fakes.lines) console.log(line);
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) process.exit(1); // a second signal means "now"
    stopping = true;
    console.log(`fakes: ${signal}, stopping`);
    void fakes
      .close()
      .then(() => (pidFile ? rm(pidFile, { force: true }) : undefined))
      .then(() => process.exit(0));
  };
  process.on("SIGTERM", () => stop("SIGTERM"));
  process.on("SIGINT", () => stop("SIGINT"));
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
