// Benchmark of the case page under load: the production build on loopback against its own
// PostgreSQL cluster, a signed-in technician's document request for a case with 30 findings,
// its JSON API, and the landing page as the trivial baseline, all in the same run; then the same
// server with one worker process per core, and the framework's stock server, as references.
// Run: npx tsx tests/bench/case-page.bench.ts (also part of npm run bench). Reports; never fails.
import { type ChildProcess, execFileSync, spawn } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { availableParallelism, tmpdir } from "node:os";
import { join } from "node:path";
import { eq } from "drizzle-orm";

const PG = {
  RL_PG_PORT: "54349",
  RL_PG_DIR: "/tmp/ramplight-bench-pg",
  RL_PG_FAST: "1",
  RL_PG_DB: "postgres",
};
const APP_PORT = 3997;
const APP_URL = `http://127.0.0.1:${APP_PORT}`;
const UNUSED = "http://127.0.0.1:4997"; // the server only validates the sign-in provider's URLs; nothing listens here
const CONNECTIONS = 20;
const WARMUP_S = 3;
const DURATION_S = 10;
const PAIRED_ROUNDS = 5;
const PAIRED_S = 4;
// Targets, all relative to this machine in this run except the browser figures: the case page's
// p99 at most 3× the trivial route's, its throughput at least 0.4× the trivial route's, the
// document at most 50 KiB; in Chromium, keypress → re-ranked list painted ≤ 100 ms (median),
// layout shift ≤ 0.1 (web.dev's "good" CLS), the case page's JavaScript ≤ 140 KB as transferred.
const TARGET_P99_TIMES = 3;
const TARGET_RATIO = 0.4;
const TARGET_DOC_KIB = 50;
const TARGET_PAINT_MS = 100;
const TARGET_CLS = 0.1;
const TARGET_JS_KB = 140;
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
// What a technician types, one after another, each adding a symptom that moves the ranking.
const TYPED = [
  "judder when braking",
  "squeal when braking",
  "grinding when braking",
  "pulls to one side braking",
  "pedal pulses",
  "clunk over bumps",
  "shakes at motorway speed",
  "burning smell from a wheel",
  "abs light",
  "soft pedal",
  "knock from a wheel",
  "hum that changes cornering",
];

process.env.TEST_PG_URL = `postgres://postgres@127.0.0.1:${PG.RL_PG_PORT}/postgres`;
const { buildTemplate } = await import("../setup/template");
const { cloneTemplate } = await import("../setup/pg-admin");
const { createDb } = await import("../../app/db/client.server");
const { createSession } = await import("../../app/auth/session.server");
const { checks, findings, observations } = await import("../../app/db/schema");
const { seedId } = await import("../../seeds/ids");
const { kbId } = await import("../../seeds/knowledge");

type Stats = {
  latency: { p50: number; p99: number; average: number };
  requests: { average: number; total: number };
  non2xx: number;
  errors: number;
  timeouts: number;
};
type Autocannon = (opts: {
  url: string;
  connections: number;
  duration: number;
  headers?: Record<string, string>;
}) => Promise<Stats>;
const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

const pg = (cmd: "reset" | "stop") =>
  execFileSync("bash", ["scripts/pg.sh", cmd], {
    env: { ...process.env, ...PG },
    stdio: ["ignore", "ignore", "inherit"],
  });

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
    const { openCase } = await import("../../app/cases/open-case.server");
    const { loadAccount } = await import("../../app/auth/accounts.server");
    const { asMember } = await import("../../app/auth/guards.server");
    const member = asMember((await loadAccount(db, seedId("user:priya-hale")))!);
    const created = await openCase(db, member, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 70_000,
      complaint: "Bench: steering wheel shakes under braking.",
    });
    const kbChecks = await db
      .select({ id: checks.id })
      .from(checks)
      .where(eq(checks.workshopId, member.workshopId))
      .orderBy(checks.id)
      .limit(30);
    await db.insert(findings).values(
      kbChecks.map((k) => ({
        workshopId: member.workshopId,
        caseId: created.id,
        checkId: k.id,
        result: "pass" as const,
        recordedById: member.memberId,
      })),
    );
    await db.insert(observations).values({
      workshopId: member.workshopId,
      caseId: created.id,
      symptomId: kbId("bramblegate", "symptom", "vibration_braking"),
      present: true,
      source: "owner",
      recordedById: member.memberId,
    });
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
  const done = await Promise.race([
    exited.then(() => true),
    new Promise((r) => setTimeout(() => r(false), 5000)),
  ]);
  if (!done) server.kill("SIGKILL");
}

async function measure(
  name: string,
  path: string,
  headers: Record<string, string>,
  connections = CONNECTIONS,
  duration = DURATION_S,
) {
  const url = `${APP_URL}${path}`;
  await autocannon({ url, connections, duration: WARMUP_S, headers });
  const r = await autocannon({ url, connections, duration, headers });
  return {
    name,
    p50: r.latency.p50,
    p99: r.latency.p99,
    rps: r.requests.average,
    total: r.requests.total,
    bad: r.non2xx + r.errors + r.timeouts,
  };
}

/**
 * The case page in headless Chromium against the same server: its JavaScript as transferred, its
 * layout shift, and keypress → re-ranked list painted, for symptoms added one after another with
 * Quick find (Enter on the first match; the re-ranked causes come in the answer to that one request).
 */
async function inBrowser(
  seeded: { caseId: string; cookie: string },
  mark: (ok: boolean) => string,
): Promise<string[]> {
  const { chromium } = await import("playwright-core");
  const dir = mkdtempSync(join(tmpdir(), "rl-bench-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
    viewport: { width: 1280, height: 900 },
  });
  try {
    const [name, value] = seeded.cookie.split("=");
    await context.addCookies([{ name, value, url: APP_URL }]);
    const page = await context.newPage();
    let js = 0;
    page.on("requestfinished", (req) => {
      if (req.resourceType() === "script") void req.sizes().then((s) => (js += s.responseBodySize));
    });
    await page.goto(`${APP_URL}/cases/${seeded.caseId}`, { waitUntil: "networkidle" });
    const cls = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          let sum = 0;
          new PerformanceObserver((list) => {
            for (const e of list.getEntries() as (PerformanceEntry & {
              value: number;
              hadRecentInput: boolean;
            })[])
              if (!e.hadRecentInput) sum += e.value;
          }).observe({ type: "layout-shift", buffered: true });
          setTimeout(() => resolve(sum), 500);
        }),
    );
    // The page's own JavaScript, before Quick find's palette is first opened (it loads then).
    const pageJs = js;
    const times: number[] = [];
    await page.keyboard.press("Control+k");
    await page.getByRole("combobox").waitFor();
    for (const phrase of TYPED) {
      await page.keyboard.type(phrase);
      await page.getByRole("option").first().waitFor();
      // Armed in the page: Enter's keydown starts the clock; the first change of the likely-causes
      // list after it, once a frame has been painted, stops it.
      await page.evaluate(() => {
        const w = window as unknown as { __t0?: number; __painted?: Promise<number> };
        const list = document.querySelector('[aria-label="Likely causes, most likely first"]')!;
        w.__painted = new Promise<number>((resolve) => {
          const seen = new MutationObserver(() => {
            seen.disconnect();
            requestAnimationFrame(() => setTimeout(() => resolve(performance.now() - (w.__t0 ?? 0)), 0));
          });
          seen.observe(list, { subtree: true, childList: true, characterData: true, attributes: true });
        });
        document.addEventListener("keydown", (e) => e.key === "Enter" && (w.__t0 = performance.now()), {
          capture: true,
          once: true,
        });
      });
      await page.keyboard.press("Enter");
      times.push(await page.evaluate(() => (window as unknown as { __painted: Promise<number> }).__painted));
    }
    const sorted = [...times].sort((a, b) => a - b);
    const median = sorted[Math.floor(sorted.length / 2)];
    const kb = pageJs / 1000;
    return [
      `in Chromium: keypress → re-ranked list painted, ${times.length} symptoms: median ${median.toFixed(0)} ms, fastest ${sorted[0].toFixed(0)} ms, slowest ${sorted.at(-1)!.toFixed(0)} ms`,
      `target keypress → painted ≤ ${TARGET_PAINT_MS} ms (median): ${median.toFixed(0)} ms — ${mark(median <= TARGET_PAINT_MS)}`,
      `target layout shift (CLS) ≤ ${TARGET_CLS}: ${cls.toFixed(3)} — ${mark(cls <= TARGET_CLS)}`,
      `target case page JavaScript ≤ ${TARGET_JS_KB} KB as transferred: ${kb.toFixed(1)} KB — ${mark(kb <= TARGET_JS_KB)}`,
    ];
  } finally {
    await context.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

const mark = (ok: boolean) => (ok ? "PASS" : "MISS");

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
for (const signal of ["SIGINT", "SIGTERM"] as const)
  process.once(signal, () => void cleanup().then(() => process.exit(130)));

try {
  pg("reset");
  await buildTemplate();
  const databaseUrl = await cloneTemplate("rl_bench");
  const seeded = await seedCase(databaseUrl);
  ensureBuild();
  const env = {
    ...process.env,
    PORT: String(APP_PORT),
    HOST: "127.0.0.1",
    APP_URL,
    GITHUB_CLIENT_ID: "ramplight-bench",
    GITHUB_CLIENT_SECRET: "bench-secret-0123456789",
    GITHUB_OAUTH_URL: UNUSED,
    GITHUB_API_URL: UNUSED,
    PAYMENTS_SECRET_KEY: "sk_test_bench_unused",
    PAYMENTS_API_URL: UNUSED,
    PAY_WEBHOOK_SECRET: "whsec_bench_unused",
    DATABASE_URL: databaseUrl,
    NODE_ENV: "production",
  };
  // Ours first (what npm start runs), then the framework's stock server as a reference, same build.
  const servers = {
    ours: ["scripts/serve.mjs"],
    stock: ["node_modules/@react-router/serve/bin.js", "./build/server/index.js"],
  } as const;
  const start = async (args: readonly string[], extra: Record<string, string> = {}) => {
    // RL_BENCH_PROFILE=dir writes a V8 CPU profile of each server into dir (open it in Chromium's DevTools).
    const profile = process.env.RL_BENCH_PROFILE
      ? ["--cpu-prof", `--cpu-prof-dir=${process.env.RL_BENCH_PROFILE}`]
      : [];
    server = spawn(process.execPath, [...profile, ...args], {
      env: { ...env, ...extra },
      stdio: ["ignore", "ignore", "pipe"],
    });
    server.stderr?.on("data", (d) => (stderr = (stderr + String(d)).slice(-4000)));
    await waitFor(`${APP_URL}/`, server);
  };
  await start(servers.ours);

  const signedIn = { cookie: seeded.cookie };
  // The requests measured must be the real thing: a 200 document and the case's JSON.
  const page = await fetch(`${APP_URL}/cases/${seeded.caseId}`, { headers: signedIn, redirect: "manual" });
  if (page.status !== 200)
    throw new Error(`GET /cases/:id answered ${page.status}, not 200: is the session accepted?`);
  const pageBytes = (await page.arrayBuffer()).byteLength;
  const json = (await (
    await fetch(`${APP_URL}/api/cases/${seeded.caseId}`, { headers: signedIn })
  ).json()) as { case: { findingCount: number } };
  if (json.case.findingCount !== seeded.findings)
    throw new Error(`the case has ${json.case.findingCount} findings, expected ${seeded.findings}`);
  const apiBytes = JSON.stringify(json).length;

  console.log(
    `case-page bench: ${CONNECTIONS} connections, ${WARMUP_S} s warm-up + ${DURATION_S} s each, case with ${seeded.findings} findings, production build on ${APP_URL}`,
  );
  console.log(
    `response sizes: case page ${(pageBytes / 1024).toFixed(0)} KiB, case API ${(apiBytes / 1024).toFixed(0)} KiB`,
  );
  const casePath = `/cases/${seeded.caseId}`;
  const trivial = await measure("landing page GET / (trivial)", "/", {});
  const casePage = await measure("case page GET /cases/:id (signed in)", casePath, signedIn);
  const caseApi = await measure("case API GET /api/cases/:id", `/api/cases/${seeded.caseId}`, signedIn);
  // This machine's speed drifts by a third within minutes (other tenants), so one landing run and
  // one case-page run a minute apart can disagree by that much. The throughput target is judged on
  // paired rounds instead: the two routes back to back, several times, and the median ratio.
  const rounds: number[] = [];
  for (let i = 0; i < PAIRED_ROUNDS; i++) {
    const a = await autocannon({ url: `${APP_URL}/`, connections: CONNECTIONS, duration: PAIRED_S });
    const b = await autocannon({
      url: `${APP_URL}${casePath}`,
      connections: CONNECTIONS,
      duration: PAIRED_S,
      headers: signedIn,
    });
    rounds.push(b.requests.average / a.requests.average);
  }
  const sortedRounds = [...rounds].sort((x, y) => x - y);
  const pairedRatio = sortedRounds[Math.floor(sortedRounds.length / 2)];
  // One connection: the time one request takes with nobody queueing ahead of it.
  const serial = await measure("case page, 1 connection (service time)", casePath, signedIn, 1, 5);
  const browserLines = await inBrowser(seeded, mark);
  await stopServer(server);
  // The same server with one worker process per core (this machine's count), sharing the port.
  const cores = String(availableParallelism());
  await start(servers.ours, { WEB_CONCURRENCY: cores });
  const multiTrivial = await measure(`landing page, ${cores} worker processes`, "/", {});
  const multiPage = await measure(`case page, ${cores} worker processes`, casePath, signedIn);
  await stopServer(server);
  await start(servers.stock);
  const stockTrivial = await measure("landing page, stock react-router-serve", "/", {});
  const stockPage = await measure("case page, stock react-router-serve", casePath, signedIn);

  const pad = (s: string, n: number) => s.padEnd(n);
  console.log(
    `${pad("route (scripts/serve.mjs unless named)", 42)} ${pad("p50 ms", 8)} ${pad("p99 ms", 8)} ${pad("req/s", 10)} non-2xx/errors`,
  );
  const rows = [trivial, casePage, caseApi, serial, multiTrivial, multiPage, stockTrivial, stockPage];
  for (const r of rows)
    console.log(
      `${pad(r.name, 42)} ${pad(String(r.p50), 8)} ${pad(String(r.p99), 8)} ${pad(r.rps.toFixed(0), 10)} ${r.bad}`,
    );
  const ratio = pairedRatio;
  console.log(
    `case page throughput / trivial: ${(casePage.rps / trivial.rps).toFixed(2)}× in the runs above; in ${PAIRED_ROUNDS} paired rounds of ${PAIRED_S} s each: ${rounds.map((r) => r.toFixed(2)).join(", ")} (median ${ratio.toFixed(2)}×)`,
  );
  console.log(
    `target case page p99 ≤ ${TARGET_P99_TIMES}× the trivial route's (${trivial.p99} ms → ${TARGET_P99_TIMES * trivial.p99} ms): ${casePage.p99} ms — ${mark(casePage.p99 <= TARGET_P99_TIMES * trivial.p99)}`,
  );
  console.log(
    `target case page throughput ≥ ${TARGET_RATIO}× trivial (median of the paired rounds): ${ratio.toFixed(2)}× — ${mark(ratio >= TARGET_RATIO)}`,
  );
  console.log(
    `target case page document ≤ ${TARGET_DOC_KIB} KiB: ${(pageBytes / 1024).toFixed(1)} KiB — ${mark(pageBytes <= TARGET_DOC_KIB * 1024)}`,
  );
  for (const line of browserLines) console.log(line);
  console.log(
    `(reference) case API p99 ${caseApi.p99} ms, ${(caseApi.rps / trivial.rps).toFixed(2)}× trivial throughput`,
  );
  console.log(
    `(reference) our server vs the stock one: case page ${(casePage.rps / stockPage.rps).toFixed(2)}× the throughput, landing ${(trivial.rps / stockTrivial.rps).toFixed(2)}×`,
  );
  console.log(
    `(reference) with ${cores} worker processes: case page p99 ${multiPage.p99} ms, ${(multiPage.rps / multiTrivial.rps).toFixed(2)}× trivial throughput, landing p99 ${multiTrivial.p99} ms`,
  );
  console.log(
    `(reference) the trivial route's own p99 in this run: ${trivial.p99} ms (one process), ${multiTrivial.p99} ms (${cores} processes)`,
  );
  if (rows.some((r) => r.bad > 0))
    console.log("warning: some responses were not 2xx; the figures above include them");
} catch (error) {
  console.error("case-page bench failed:", (error as Error).message);
  if (stderr.trim()) console.error(`app server stderr:\n${stderr}`);
  process.exitCode = 1;
} finally {
  await cleanup();
}
