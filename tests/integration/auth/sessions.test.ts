import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { accountForSession } from "~/auth/accounts.server";
import {
  createSession,
  findSessionUser,
  hashToken,
  revokeAllSessions,
  revokeSession,
  SESSION_TTL_MS,
} from "~/auth/session.server";
import { sessions, users } from "~/db/schema";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";

async function aUser() {
  const [u] = await testDb().insert(users).values({ name: "Session Tester" }).returning({ id: users.id });
  return u.id;
}

describe("server-side sessions", () => {
  it("stores only the hash of a 256-bit token (OWASP ASVS 5.0 V7.2.3)", async () => {
    const userId = await aUser();
    const token = await createSession(testDb(), userId, "vitest");
    expect(Buffer.from(token, "base64url")).toHaveLength(32);
    const rows = await testDb().select().from(sessions).where(eq(sessions.userId, userId));
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).toBe(hashToken(token));
    expect(rows[0].tokenHash).not.toContain(token);
  });

  it("gives a new token at each sign-in (ASVS V7.2.4)", async () => {
    const userId = await aUser();
    const a = await createSession(testDb(), userId, null);
    const b = await createSession(testDb(), userId, null);
    expect(a).not.toBe(b);
  });

  it("expires after its time to live", async () => {
    const userId = await aUser();
    const start = new Date("2026-12-01T08:00:00Z");
    const token = await createSession(testDb(), userId, null, start);
    expect(
      await findSessionUser(testDb(), token, new Date(start.getTime() + SESSION_TTL_MS - 1000)),
    ).not.toBeNull();
    expect(
      await findSessionUser(testDb(), token, new Date(start.getTime() + SESSION_TTL_MS + 1000)),
    ).toBeNull();
  });

  it("revokes one session, or all of a user's", async () => {
    const userId = await aUser();
    const [a, b, c] = [
      await createSession(testDb(), userId, null),
      await createSession(testDb(), userId, null),
      await createSession(testDb(), userId, null),
    ];
    await revokeSession(testDb(), a);
    expect(await findSessionUser(testDb(), a)).toBeNull();
    expect(await findSessionUser(testDb(), b)).not.toBeNull();
    await revokeAllSessions(testDb(), userId);
    expect(await findSessionUser(testDb(), b)).toBeNull();
    expect(await findSessionUser(testDb(), c)).toBeNull();
  });

  it("finds nothing for an unknown token", async () => {
    expect(await findSessionUser(testDb(), "x".repeat(43))).toBeNull();
  });
});

// What every signed-in request actually runs: session, person and membership in one query.
describe("the per-request session lookup (accountForSession)", () => {
  it("returns the person and their membership for a live session", async () => {
    const token = await createSession(testDb(), seedId("user:priya-hale"), null);
    expect(await accountForSession(testDb(), token)).toMatchObject({
      userId: seedId("user:priya-hale"),
      role: "technician",
      workshopName: "Bramblegate Motor Works",
      status: "active",
    });
  });

  it("returns an account without membership for someone who has none yet", async () => {
    const userId = await aUser();
    const account = await accountForSession(testDb(), await createSession(testDb(), userId, null));
    expect(account).toMatchObject({ userId, memberId: null, role: null, workshopId: null });
  });

  it("refuses an expired session, one second after its time to live (ASVS 5.0 V7.3, from memory)", async () => {
    const userId = await aUser();
    const start = new Date("2026-12-01T08:00:00Z");
    const token = await createSession(testDb(), userId, null, start);
    expect(
      await accountForSession(testDb(), token, new Date(start.getTime() + SESSION_TTL_MS - 1000)),
    ).not.toBeNull();
    expect(
      await accountForSession(testDb(), token, new Date(start.getTime() + SESSION_TTL_MS + 1000)),
    ).toBeNull();
  });

  it("refuses a revoked session and an unknown token", async () => {
    const userId = await aUser();
    const token = await createSession(testDb(), userId, null);
    await revokeSession(testDb(), token);
    expect(await accountForSession(testDb(), token)).toBeNull();
    expect(await accountForSession(testDb(), "y".repeat(43))).toBeNull();
  });
});
