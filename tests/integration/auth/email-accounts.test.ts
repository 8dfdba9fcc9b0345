import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadAccount, signInFromEmail } from "~/auth/accounts.server";
import { auditLog, invitations, members, users, workshops } from "~/db/schema";
import { testDb } from "../../setup/integration-worker";

// Addresses under .example (RFC 2606: reserved, never delivered anywhere).
async function workshop(slug: string) {
  const [w] = await testDb().select({ id: workshops.id }).from(workshops).where(eq(workshops.slug, slug));
  return w.id;
}

describe("signing in by a proven e-mail address", () => {
  it("finds the demo member whose e-mail it is, whatever the case of the address", async () => {
    const userId = await signInFromEmail(testDb(), "Ines@Bramblegate.example");
    expect(await loadAccount(testDb(), userId)).toMatchObject({ name: "Ines Okafor", role: "admin" });
  });

  it("creates a user without a workshop for an address nobody invited, once", async () => {
    const a = await signInFromEmail(testDb(), "stranger@nowhere.example");
    const b = await signInFromEmail(testDb(), "stranger@nowhere.example");
    expect(a).toBe(b);
    expect((await loadAccount(testDb(), a))?.role).toBeNull();
  });

  it("joins the workshop of a waiting invitation with its role, audited", async () => {
    const workshopId = await workshop("bramblegate");
    const [inv] = await testDb()
      .insert(invitations)
      .values({
        workshopId,
        email: "joiner@mail.example",
        role: "advisor",
        expiresAt: new Date(Date.now() + 86_400_000),
      })
      .returning();
    const userId = await signInFromEmail(testDb(), "joiner@mail.example");
    const [m] = await testDb().select().from(members).where(eq(members.userId, userId));
    expect(m).toMatchObject({ workshopId, role: "advisor" });
    const [after] = await testDb().select().from(invitations).where(eq(invitations.id, inv.id));
    expect(after.acceptedAt).not.toBeNull();
    const joined = await testDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, "member.join"), eq(auditLog.actorUserId, userId)));
    expect(joined).toHaveLength(1);
  });

  it("closes an expired invitation with an audit row and joins nobody", async () => {
    const workshopId = await workshop("saltmarsh");
    const [inv] = await testDb()
      .insert(invitations)
      .values({
        workshopId,
        email: "too.late@mail.example",
        role: "technician",
        expiresAt: new Date(Date.now() - 1000),
      })
      .returning();
    const userId = await signInFromEmail(testDb(), "too.late@mail.example");
    expect((await loadAccount(testDb(), userId))?.role).toBeNull();
    expect(await testDb().select().from(invitations).where(eq(invitations.id, inv.id))).toHaveLength(0);
    const closed = await testDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, "member.invite_expired"), eq(auditLog.entityId, inv.id)));
    expect(closed).toHaveLength(1);
    expect(closed[0].workshopId).toBe(workshopId);
    const [u] = await testDb().select().from(users).where(eq(users.id, userId));
    expect(u.email).toBe("too.late@mail.example");
  });
});
