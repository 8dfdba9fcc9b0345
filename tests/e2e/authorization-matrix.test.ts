import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { can, type Permission } from "~/domain/permissions";
import { type RouteAccessLevel, ROUTE_ACCESS, type RouteAccess } from "~/auth/route-access";
import { createSession } from "~/auth/session.server";
import { createDb } from "~/db/client.server";
import { members, users, workshops } from "~/db/schema";
import routes from "~/routes";
import type { Role } from "~/domain/people";
import { DEMO_PEOPLE } from "../../seeds/demo/people";
import { seedId } from "../../seeds/ids";
import { kbId } from "../../seeds/knowledge";

// Every route × every kind of caller, against the running production server. Expected outcomes
// come from app/auth/route-access.ts and the role table; docs/permissions.md states both in words.

type Actor = {
  name: string;
  kind: "anonymous" | "newcomer" | "suspended" | "member";
  role?: Role;
  cookie?: string;
  userId?: string;
  workshop?: string;
};

function routeFiles(list: { file: string; children?: unknown[] }[]): string[] {
  return list.flatMap((r) => [
    r.file,
    ...routeFiles((r.children ?? []) as { file: string; children?: unknown[] }[]),
  ]);
}

// Case #1041 of the demo (Bramblegate, open, assigned to the technician).
const OPEN_CASE = seedId("case:b1");
// A check of the Bramblegate knowledge base (seeds/kb/brakes.ts).
const A_CHECK = kbId("bramblegate", "check", "brake_road_test");
// A failure mode of the same knowledge base (seeds/kb/brakes.ts).
const A_CAUSE = kbId("bramblegate", "cause", "brake_pad_noise");
const A_SYMPTOM = kbId("bramblegate", "symptom", "squeal_braking");
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
const actors: Actor[] = [{ name: "anonymous", kind: "anonymous" }];

beforeAll(async () => {
  for (const p of DEMO_PEOPLE.filter((p) => p.workshop)) {
    const token = await createSession(db, seedId(`user:${p.login}`), "matrix");
    actors.push({
      name: `${p.role} of ${p.workshop}`,
      kind: "member",
      role: p.role!,
      cookie: `rl_session=${token}`,
      userId: seedId(`user:${p.login}`),
      workshop: p.workshop!,
    });
  }
  const [newcomer] = await db.insert(users).values({ name: "Matrix Newcomer" }).returning({ id: users.id });
  actors.push({
    name: "signed in, no workshop",
    kind: "newcomer",
    cookie: `rl_session=${await createSession(db, newcomer.id, "matrix")}`,
    userId: newcomer.id,
  });
  const [suspended] = await db.insert(users).values({ name: "Matrix Suspended" }).returning({ id: users.id });
  const [w] = await db.select({ id: workshops.id }).from(workshops).where(eq(workshops.slug, "bramblegate"));
  await db
    .insert(members)
    .values({ workshopId: w.id, userId: suspended.id, role: "senior", skill: "senior", status: "suspended" });
  actors.push({
    name: "suspended senior",
    kind: "suspended",
    cookie: `rl_session=${await createSession(db, suspended.id, "matrix")}`,
    userId: suspended.id,
  });
});
afterAll(() => pool.end());

type Want = "allowed" | "sign-in" | "welcome" | "forbidden" | "has-workshop" | "not-found";

function expected(access: RouteAccessLevel, actor: Actor, rule: RouteAccess): Want {
  if (access === "public") return "allowed";
  // Only a live token opens an owner's page; the matrix holds none, so everyone meets the 404.
  if (access === "owner-link") return "not-found";
  if (actor.kind === "anonymous") return "sign-in";
  // Another workshop's record does not exist for this member, whatever their role.
  if (rule.record && actor.kind === "member" && actor.workshop !== "bramblegate") return "not-found";
  if (rule.api && (actor.kind === "newcomer" || actor.kind === "suspended")) return "forbidden";
  if (access === "account") return "allowed";
  if (access === "no-workshop")
    return actor.kind === "newcomer"
      ? "allowed"
      : actor.kind === "suspended"
        ? "has-workshop"
        : "has-workshop";
  if (actor.kind === "newcomer") return "welcome";
  if (actor.kind === "suspended") return "forbidden";
  if (access === "member") return "allowed";
  return can(actor.role!, access as Permission) ? "allowed" : "forbidden";
}

function outcome(res: Response): string {
  const location = res.headers.get("location") ?? "";
  if (res.status === 401) return "sign-in";
  if (res.status === 404) return "not-found";
  if (res.status >= 300 && res.status < 400 && location.startsWith("/sign-in")) return "sign-in";
  if (res.status >= 300 && res.status < 400 && location.startsWith("/welcome")) return "welcome";
  if (res.status === 403) return "forbidden";
  if (res.status >= 500 || res.status === 405) return `status ${res.status}`;
  return "allowed";
}

describe("authorization matrix", () => {
  it("has an access rule for every route in app/routes.ts", () => {
    const files = routeFiles(routes as never);
    const missing = files.filter((f) => !ROUTE_ACCESS[f]);
    expect(missing).toEqual([]);
  });

  const base = inject("baseUrl");
  for (const [file, rule] of Object.entries(ROUTE_ACCESS)) {
    if (file === "routes/not-found.tsx" || file === "routes/api/not-found.ts") continue;
    const methods: ["GET" | "POST", string | undefined, RouteAccessLevel][] = [];
    if (rule.GET) methods.push(["GET", undefined, rule.GET]);
    if (typeof rule.POST === "string") methods.push(["POST", undefined, rule.POST]);
    else if (rule.POST)
      for (const [intent, a] of Object.entries(rule.POST)) methods.push(["POST", intent, a]);
    for (const [method, intent, access] of methods) {
      it(`${method} ${rule.path}${intent ? ` (${intent})` : ""} — ${access}`, async () => {
        const results: string[] = [];
        for (const actor of actors) {
          const want = expected(access, actor, rule);
          // Signing out revokes the session it is sent with: use a spare one.
          const cookie =
            file === "routes/auth/sign-out.tsx" && actor.userId
              ? `rl_session=${await createSession(db, actor.userId, "spare")}`
              : actor.cookie;
          const res = await fetch(
            `${base}${rule.path.replace("{case}", OPEN_CASE).replace("{check}", A_CHECK).replace("{cause}", A_CAUSE).replace("{symptom}", A_SYMPTOM)}`,
            {
              method,
              redirect: "manual",
              headers: {
                ...(cookie ? { cookie } : {}),
                ...(method === "POST"
                  ? {
                      origin: base,
                      "content-type": rule.api ? "application/json" : "application/x-www-form-urlencoded",
                    }
                  : {}),
              },
              // Deliberately incomplete: an allowed caller gets a 400 and nothing changes.
              body:
                method === "POST"
                  ? rule.api
                    ? JSON.stringify(intent ? { intent } : {})
                    : new URLSearchParams(intent ? { intent } : {})
                  : undefined,
            },
          );
          await res.arrayBuffer();
          let got = outcome(res);
          // A public page may send a signed-in newcomer on to set up a workshop.
          if (access === "public" && got === "welcome") got = "allowed";
          if (want === "has-workshop")
            got = got === "allowed" && (res.status >= 300 || res.status === 409) ? "has-workshop" : got;
          if (got !== want)
            results.push(
              `${actor.name}: expected ${want}, got ${got} (${res.status} ${res.headers.get("location") ?? ""})`,
            );
        }
        expect(results).toEqual([]);
      });
    }
  }

  it("answers an unknown page, or an unknown API address, with 404 for everyone", async () => {
    for (const actor of actors) {
      const res = await fetch(`${base}/no-such-page`, {
        headers: actor.cookie ? { cookie: actor.cookie } : {},
      });
      expect(res.status, actor.name).toBe(404);
      const api = await fetch(`${base}/api/no-such-thing`, {
        headers: actor.cookie ? { cookie: actor.cookie } : {},
      });
      expect(api.status, actor.name).toBe(404);
      expect((await api.json()).error).toMatch(/no such API address/);
    }
  });

  it("refuses a form post from another origin (OWASP ASVS 5.0 V3.5)", async () => {
    const admin = actors.find((a) => a.role === "admin")!;
    const res = await fetch(`${base}/settings`, {
      method: "POST",
      redirect: "manual",
      headers: {
        cookie: admin.cookie!,
        origin: "http://evil.example",
        "content-type": "application/x-www-form-urlencoded",
      },
      body: new URLSearchParams({
        name: "Hijacked",
        currency: "EUR",
        taxRatePercent: "0",
        units: "metric",
        labourRatePerHour: "1",
      }),
    });
    expect(res.status).toBeGreaterThanOrEqual(400);
    const [w] = await db
      .select({ name: workshops.name })
      .from(workshops)
      .where(eq(workshops.slug, "bramblegate"));
    expect(w.name).toBe("Bramblegate Motor Works");
  });
});
