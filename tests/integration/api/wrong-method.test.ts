// A method a route does not serve is refused by React Router itself, before our handlers run, so
// only the whole server shows what the caller gets. This file runs the production build
// (the server build scripts/test.sh makes before vitest, in RL_BUILD_DIR) against this file's database.
// docs/api.md promises `{ error: string }` JSON for every refusal under /api/.
import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { createRequestHandler, type ServerBuild } from "react-router";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../../setup/integration-worker";
import { APP, caseId, cookieFor } from "./helpers";

const BUILD = resolve(process.env.RL_BUILD_DIR ?? "build", "server/index.js");
let handle: (request: Request) => Promise<Response>;
let cookie: string;
let closePool: (() => Promise<void>) | undefined;

beforeAll(async () => {
  if (!existsSync(BUILD)) return;
  // process.env.DATABASE_URL points at this file's database now, so the build's pool uses it.
  const build = (await import(/* @vite-ignore */ pathToFileURL(BUILD).href)) as ServerBuild;
  handle = createRequestHandler(build, "production");
  closePool = (build.entry.module as { closeServerDb?: () => Promise<void> }).closeServerDb;
  cookie = await cookieFor(testDb(), "priya-hale");
});

// The build has its own pool; it closes before this file's database is dropped.
afterAll(async () => {
  await closePool?.();
});

async function send(method: string, path: string) {
  const headers: Record<string, string> = { cookie, "content-type": "application/json" };
  if (method !== "GET") headers.origin = APP;
  const res = await handle(
    new Request(`${APP}${path}`, { method, headers, body: method === "GET" ? undefined : "{}" }),
  );
  const text = await res.text();
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, body: body as { error?: unknown } | null, text };
}

describe.skipIf(!existsSync(BUILD))("a method the API route does not serve (production build)", () => {
  it("the control: the build answers GET /api/cases/:id with the case", async () => {
    const a = await send("GET", `/api/cases/${caseId("b1")}`);
    expect(a.status).toBe(200);
  });

  // Expected: 405 with { error } naming the methods the route serves, like the evidence routes'
  // own 405 (app/cases/evidence-api.server.ts).
  for (const [method, path] of [
    ["GET", "/api/what-if"],
    ["POST", `/api/cases/${caseId("b1")}`],
    ["PUT", `/api/cases/${caseId("b1")}`],
    ["POST", `/api/cases/${caseId("b1")}/diagnosis`],
    ["POST", "/api/search"],
  ] as const) {
    it(`${method} ${path.replace(caseId("b1"), ":caseId")} answers 405 with { error: string }`, async () => {
      const a = await send(method, path);
      expect(a.status, a.text.slice(0, 200)).toBe(405);
      expect(typeof a.body?.error, a.text.slice(0, 200)).toBe("string");
    });
  }
});
