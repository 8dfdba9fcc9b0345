import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadAccount, signInFromProfile } from "~/auth/accounts.server";
import { limitSignIn } from "~/auth/rate-limit.server";
import { auditLog, identities, invitations, members, workshops } from "~/db/schema";
import { testDb } from "../../setup/integration-worker";

describe("sign-in accounts", () => {
  it("recognises a seeded demo member by provider id", async () => {
    const userId = await signInFromProfile(testDb(), {
      providerUserId: "910003",
      login: "priya-hale",
      name: "Priya Hale",
      email: null,
    });
    const account = await loadAccount(testDb(), userId);
    expect(account).toMatchObject({ role: "technician", workshopName: "Bramblegate Motor Works" });
  });

  it("creates a user without a workshop for a newcomer, once", async () => {
    const profile = {
      providerUserId: "777001",
      login: "new-person",
      name: "New Person",
      email: "new@person.example",
    };
    const a = await signInFromProfile(testDb(), profile);
    const b = await signInFromProfile(testDb(), profile);
    expect(a).toBe(b);
    const ids = await testDb().select().from(identities).where(eq(identities.providerUserId, "777001"));
    expect(ids).toHaveLength(1);
    expect((await loadAccount(testDb(), a))?.role).toBeNull();
  });

  it("accepts a pending invitation by login and records it in the audit log", async () => {
    const [w] = await testDb()
      .select({ id: workshops.id })
      .from(workshops)
      .where(eq(workshops.slug, "bramblegate"));
    await testDb()
      .insert(invitations)
      .values({
        workshopId: w.id,
        githubLogin: "Invited-Tech",
        role: "senior",
        expiresAt: new Date(Date.now() + 86_400_000),
      });
    const userId = await signInFromProfile(testDb(), {
      providerUserId: "777002",
      login: "invited-tech",
      name: "Invited Tech",
      email: null,
    });
    const [m] = await testDb().select().from(members).where(eq(members.userId, userId));
    expect(m).toMatchObject({ workshopId: w.id, role: "senior", skill: "senior" });
    const [inv] = await testDb()
      .select()
      .from(invitations)
      .where(eq(invitations.githubLogin, "Invited-Tech"));
    expect(inv.acceptedAt).not.toBeNull();
    const entries = await testDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, "member.join"), eq(auditLog.actorUserId, userId)));
    expect(entries).toHaveLength(1);
  });

  it("ignores an expired invitation", async () => {
    const [w] = await testDb()
      .select({ id: workshops.id })
      .from(workshops)
      .where(eq(workshops.slug, "saltmarsh"));
    await testDb()
      .insert(invitations)
      .values({
        workshopId: w.id,
        email: "late@person.example",
        role: "technician",
        expiresAt: new Date(Date.now() - 1000),
      });
    const userId = await signInFromProfile(testDb(), {
      providerUserId: "777003",
      login: "late",
      name: "Late",
      email: "late@person.example",
    });
    expect((await loadAccount(testDb(), userId))?.role).toBeNull();
  });
});

describe("sign-in rate limit (OWASP ASVS 5.0 V6.3.1)", () => {
  it("answers the N+1th attempt in the window with 429 and Retry-After", async () => {
    const now = new Date("2026-12-01T10:00:00Z");
    for (let i = 0; i < 5; i++) await limitSignIn(testDb(), "ip:198.51.100.7", 5, 60, now);
    const refused = await limitSignIn(testDb(), "ip:198.51.100.7", 5, 60, now).catch((r: Response) => r);
    expect(refused).toBeInstanceOf(Response);
    expect((refused as Response).status).toBe(429);
    expect((refused as Response).headers.get("Retry-After")).toBe("60");
    // Another bucket is unaffected, and the window moves on.
    await expect(limitSignIn(testDb(), "ip:198.51.100.8", 5, 60, now)).resolves.toBeUndefined();
    await expect(
      limitSignIn(testDb(), "ip:198.51.100.7", 5, 60, new Date(now.getTime() + 61_000)),
    ).resolves.toBeUndefined();
  });
});
