// Shared by the API and case integration tests: calls route handlers directly with our own
// database in the router context, as DEVELOPERS.md says tests do.
import { and, count, eq, sql } from "drizzle-orm";
import { RouterContextProvider } from "react-router";
import { loadAccount } from "~/auth/accounts.server";
import { asMember, type CurrentMember } from "~/auth/guards.server";
import { createSession } from "~/auth/session.server";
import { dbContext } from "~/http/context";
import type { Db } from "~/db/client.server";
import { auditLog, findings, observations } from "~/db/schema";
import { openCase } from "~/cases/open-case.server";
import { guardRequest } from "~/http/request-guard.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";

/** APP_URL of the tests (tests/setup/test-env.ts): the only origin allowed to write. */
export const APP = "http://127.0.0.1:3999";

export const BRAMBLEGATE = seedId("workshop:bramblegate");
export const caseId = (key: string) => seedId(`case:${key}`);
export const symptomId = (key: string) => kbId("bramblegate", "symptom", key);
export const checkId = (key: string) => kbId("bramblegate", "check", key);
export const causeId = (key: string) => kbId("bramblegate", "cause", key);

export function contextFor(db: Db) {
  const context = new RouterContextProvider();
  context.set(dbContext, db);
  return context;
}

const cookies = new Map<string, string>();

/** A session cookie for a demo login (seeds/demo/people.ts), one per login and test file. */
export async function cookieFor(db: Db, login: string): Promise<string> {
  const hit = cookies.get(login);
  if (hit) return hit;
  const token = await createSession(db, seedId(`user:${login}`), "vitest");
  const cookie = `rl_session=${token}`;
  cookies.set(login, cookie);
  return cookie;
}

export async function memberFor(db: Db, login: string): Promise<CurrentMember> {
  const account = await loadAccount(db, seedId(`user:${login}`));
  if (!account) throw new Error(`no demo account ${login}`);
  return asMember(account);
}

export type Send = {
  method?: string;
  cookie?: string | null;
  json?: unknown;
  raw?: string;
  origin?: string | null;
  headers?: Record<string, string>;
};

/** A request as the browser's own fetch sends it: cookie, same origin on writes, JSON body. */
export function request(path: string, send: Send = {}): Request {
  const method = send.method ?? (send.json !== undefined || send.raw !== undefined ? "POST" : "GET");
  const headers = new Headers(send.headers);
  if (send.cookie) headers.set("cookie", send.cookie);
  const origin = send.origin === undefined ? (method === "GET" ? null : APP) : send.origin;
  if (origin) headers.set("origin", origin);
  let body: string | undefined;
  if (send.json !== undefined) body = JSON.stringify(send.json);
  if (send.raw !== undefined) body = send.raw;
  if (body !== undefined) headers.set("content-type", "application/json");
  return new Request(`${APP}${path}`, { method, headers, body });
}

type Handler = (args: never) => unknown;
export type Answer = {
  status: number;
  body: Record<string, unknown> & { error?: string };
  contentType: string | null;
};

/**
 * Runs a loader or action with the given params and reads its JSON answer. The request first
 * passes the root middleware's guard, as every request to the server does.
 */
export async function run(
  handler: Handler,
  db: Db,
  req: Request,
  params: Record<string, string | undefined>,
): Promise<Answer> {
  let res: Response;
  try {
    await guardRequest(req, APP);
    res = (await handler({ request: req, params, context: contextFor(db) } as never)) as Response;
  } catch (refused) {
    if (!(refused instanceof Response)) throw refused;
    res = refused;
  }
  const text = await res.text();
  return {
    status: res.status,
    body: text ? (JSON.parse(text) as Answer["body"]) : {},
    contentType: res.headers.get("content-type"),
  };
}

/** Every refusal is `{ error: string }` in JSON, with no stack trace (app/http.server.ts). */
export function isCleanError(a: Answer): boolean {
  const raw = JSON.stringify(a.body);
  return (
    Boolean(a.contentType?.includes("application/json")) &&
    typeof a.body.error === "string" &&
    a.body.error.length > 0 &&
    !/\n\s+at |\.ts:\d+|node_modules/.test(raw)
  );
}

/** Rows a refused request must leave alone: the case's evidence and the whole audit log. */
export async function snapshot(db: Db, caseIdValue: string) {
  const [[o], [f], [a]] = await Promise.all([
    db.select({ n: count() }).from(observations).where(eq(observations.caseId, caseIdValue)),
    db.select({ n: count() }).from(findings).where(eq(findings.caseId, caseIdValue)),
    db.select({ n: count() }).from(auditLog),
  ]);
  const rows = await db.execute<{ h: string }>(
    sql`select md5(coalesce(string_agg(id::text || present::text || source::text, ',' order by id), '')) as h from observations where case_id = ${caseIdValue}`,
  );
  return { observations: o.n, findings: f.n, audit: a.n, observationHash: rows.rows[0].h };
}

export async function findingRow(db: Db, caseIdValue: string, check: string) {
  const [row] = await db
    .select()
    .from(findings)
    .where(and(eq(findings.caseId, caseIdValue), eq(findings.checkId, check)));
  return row;
}

/** A fresh open case on a demo vehicle, assigned to whoever opens it (open-case.server's openCase). */
export async function freshCase(db: Db, login = "priya-hale", vehicle = "orlan-brisk") {
  const created = await openCase(db, await memberFor(db, login), {
    vehicleId: seedId(`vehicle:${vehicle}`),
    mileageKm: 70_000,
    complaint: "Test case: judder under braking.",
  });
  return created.id;
}

/** The refusal a server module threw (app/http.server.ts's refuse), as status and JSON body. */
export async function refusal(
  work: Promise<unknown>,
): Promise<{ status: number; body: Record<string, unknown> }> {
  try {
    await work;
  } catch (error) {
    if (error instanceof Response)
      return { status: error.status, body: (await error.json()) as Record<string, unknown> };
    throw error;
  }
  throw new Error("expected a refusal, but the call succeeded");
}
