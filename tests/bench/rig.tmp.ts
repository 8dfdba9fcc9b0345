// Benchmark of the case page under load: the production build on loopback against its own
// PostgreSQL cluster, a signed-in technician's document request for a case with 30 findings,
// its JSON API, and the landing page as the trivial baseline, all in the same run; then the same
// server with one worker process per core, and the framework's stock server, as references.
// Run: npx tsx tests/bench/case-page.bench.ts (also part of npm run bench). Reports; never fails.
import { type ChildProcess, execFileSync, spawn } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { availableParallelism } from "node:os";
import { join } from "node:path";
import { eq } from "drizzle-orm";

const PG = { RL_PG_PORT: "54349", RL_PG_DIR: "/tmp/ramplight-bench-pg", RL_PG_FAST: "1", RL_PG_DB: "postgres" };
const APP_PORT = 3997;
const APP_URL = `http://127.0.0.1:${APP_PORT}`;
const UNUSED = "http://127.0.0.1:4997"; // the server only validates the sign-in provider's URLs; nothing listens here
const CONNECTIONS = 20;
const WARMUP_S = 3;
const DURATION_S = 10;
const TARGET_P99_MS = 50;
const TARGET_RATIO = 0.5;

process.env.TEST_PG_URL = `postgres://postgres@127.0.0.1:${PG.RL_PG_PORT}/postgres`;
const { buildTemplate } = await import("../setup/template");
const { cloneTemplate } = await import("../setup/pg-admin");
const { createDb } = await import("../../app/db/client.server");
const { createSession } = await import("../../app/auth/session.server");
const { checks, findings, observations } = await import("../../app/db/schema");
const { seedId } = await import("../../seeds/ids");
const { kbId } = await import("../../seeds/knowledge");

type Stats = { latency: { p50: number; p99: number; average: number }; requests: { average: number; total: number }; non2xx: number; errors: number; timeouts: number };
type Autocannon = (opts: { url: string; connections: number; duration: number; headers?: Record<string, string> }) => Promise<Stats>;
const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

const pg = (cmd: "reset" | "stop") => execFileSync("bash", ["scripts/pg.sh", cmd], { env: { ...process.env, ...PG }, stdio: ["ignore", "ignore", "inherit"] });

function newestMtime(dir: string): number {
  let newest = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    newest = Math.max(newest, e.isDirectory() ? newestMtime(p) : statSync(p).mtimeMs);
  }
  return newest;
}

function ensureBuild() {
  const out = "build/server/index.js";
  if (existsSync(out) && statSync(out).mtimeMs >= newestMtime("app")) return;
  console.log("building the production bundle (build/ is missing or older than app/)…");
  execFileSync("node_modules/.bin/react-router", ["build"], { stdio: ["ignore", "ignore", "inherit"] });
}

/** A demo case on Priya's bench with the owner's judder report and 30 findings (passed checks). */
async function seedCase(databaseUrl: string) {
  const { db, pool } = createDb(databaseUrl, { max: 2 });
  try {
    const { openCase } = await import("../../app/cases/workflow.server");
    const { loadAccount } = await import("../../app/auth/accounts.server");
    const { asMember } = await import("../../app/auth/guards.server");
    const member = asMember((await loadAccount(db, seedId("user:priya-hale")))!);
    const created = await openCase(db, member, { vehicleId: seedId("vehicle:orlan-brisk"), mileageKm: 70_000, complaint: "Bench: steering wheel shakes under braking." });
    const kbChecks = await db.select({ id: checks.id }).from(checks).where(eq(checks.workshopId, member.workshopId)).orderBy(checks.id).limit(30);
    await db.insert(findings).values(kbChecks.map((k) => ({ workshopId: member.workshopId, caseId: created.id, checkId: k.id, result: "pass" as const, recordedById: member.memberId })));
    await db.insert(observations).values({ workshopId: member.workshopId, caseId: created.id, symptomId: kbId("bramblegate", "symptom", "vibration_braking"), present: true, source: "owner", recordedById: member.memberId });
    const token = await createSession(db, member.userId, "case-page bench");
    return { caseId: created.id, cookie: `rl_session=${token}`, findings: kbChecks.length };
  } finally {
    await pool.end();
  }
}

async function waitFor(url: string, child: ChildProcess, ms = 30_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`the app server exited early with code ${child.exitCode}`);
    try {
      if ((await fetch(url)).status < 500) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the app server did not answer at ${url} within ${ms} ms`);
}

async function stopServer(server: ChildProcess | undefined) {
  if (!server || server.exitCode !== null || server.signalCode !== null) return;
  const exited = new Promise((r) => server.once("exit", r));
  server.kill("SIGTERM");
  const done = await Promise.race([exited.then(() => true), new Promise((r) => setTimeout(() => r(false), 5000))]);
  if (!done) server.kill("SIGKILL");
}

async function measure(name: string, path: string, headers: Record<string, string>, connections = CONNECTIONS, duration = DURATION_S) {
  const url = `${APP_URL}${path}`;
  await autocannon({ url, connections, duration: WARMUP_S, headers });
  const r = await autocannon({ url, connections, duration, headers });
  return { name, p50: r.latency.p50, p99: r.latency.p99, rps: r.requests.average, total: r.requests.total, bad: r.non2xx + r.errors + r.timeouts };
}

let server: ChildProcess | undefined;
let stderr = "";
let cleaned = false;
async function cleanup() {
  if (cleaned) return;
  cleaned = true;
  await stopServer(server);
  try {
    pg("stop");
  } catch (e) {
    console.error("could not stop the bench cluster:", (e as Error).message);
  }
}
for (const signal of ["SIGINT", "SIGTERM"] as const) process.once(signal, () => void cleanup().then(() => process.exit(130)));


try {
  pg("reset");
  await buildTemplate();
  const databaseUrl = await cloneTemplate("rl_bench");
  const seeded = await seedCase(databaseUrl);
  Object.assign(process.env, { APP_URL, GITHUB_CLIENT_ID: "x", GITHUB_CLIENT_SECRET: "bench-secret-0123456789", GITHUB_OAUTH_URL: UNUSED, GITHUB_API_URL: UNUSED, DATABASE_URL: databaseUrl, NODE_ENV: "production" });
  const { createRequestHandler } = await import("react-router");
  const build = await import(process.cwd() + "/build/server/index.js");
  const handler = createRequestHandler(build, "production");
  const once = async (path: string, headers: Record<string, string>) => { const r = await handler(new Request(APP_URL + path, { headers })); const t = await r.arrayBuffer();  return t.byteLength; };
  const all = { landing: ["/", {}], page: [`/cases/${seeded.caseId}`, { cookie: seeded.cookie }], api: [`/api/cases/${seeded.caseId}`, { cookie: seeded.cookie }], data: [`/cases/${seeded.caseId}.data`, { cookie: seeded.cookie }], board: ["/board", { cookie: seeded.cookie }], welcome: ["/settings/workshop", { cookie: seeded.cookie }], notfound: ["/no-such-page", {}] } as const;
  const only = process.env.RIG_ONLY?.split(",");
  const routes = Object.fromEntries(Object.entries(all).filter(([k]) => !only || only.includes(k)));
  const best: Record<string, number> = {}; const bytes: Record<string, number> = {};
  const rounds = Number(process.env.RIG_ROUNDS ?? 6);
  for (let round = 0; round < rounds; round++) for (const [k, [path, h]] of Object.entries(routes)) {
    const t0 = performance.now(); for (let i = 0; i < 60; i++) bytes[k] = await once(path, h as Record<string, string>);
    const ms = (performance.now() - t0) / 60; best[k] = Math.min(best[k] ?? Infinity, ms);
  }
  console.log(Object.entries(best).map(([k, v]) => `${k} ${v.toFixed(2)} ms (${bytes[k]} B)`).join(" | "));
  process.exit(0);
} finally {
  await cleanup();
}
