import { and, eq, gt, isNull, lte, or, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { Db, Tx } from "~/db/client.server";
import { identities, invitations, members, sessions, users, workshops } from "~/db/schema";
import { hashToken } from "./session.server";
import type { ProviderProfile } from "./github.server";
import { skillForRole } from "~/domain/people";

/**
 * Finds the user behind a provider identity, creating it on first sign-in, and accepts a
 * pending invitation (by login or e-mail) when the user is not yet a member anywhere.
 */
export async function signInFromProfile(db: Db, profile: ProviderProfile, now = new Date()) {
  return db.transaction(async (tx) => {
    const [known] = await tx
      .select({ userId: identities.userId })
      .from(identities)
      .where(and(eq(identities.provider, "github"), eq(identities.providerUserId, profile.providerUserId)));
    let userId = known?.userId;
    if (!userId) {
      const [created] = await tx
        .insert(users)
        .values({ name: profile.name, email: profile.email })
        .returning({ id: users.id });
      userId = created.id;
      await tx
        .insert(identities)
        .values({ userId, provider: "github", providerUserId: profile.providerUserId, login: profile.login });
    } else {
      await tx
        .update(identities)
        .set({ login: profile.login })
        .where(and(eq(identities.provider, "github"), eq(identities.providerUserId, profile.providerUserId)));
    }

    await joinByInvitation(tx, userId, { login: profile.login, email: profile.email }, now);
    return userId;
  });
}

/**
 * The user whose e-mail address a sign-in code has just proven, created on first sign-in (with no
 * workshop: they land on /welcome unless an invitation for the address is waiting).
 */
export async function signInFromEmail(db: Db, email: string, now = new Date()) {
  return db.transaction(async (tx) => {
    const [known] = await tx
      .select({ id: users.id })
      .from(users)
      .where(sql`lower(${users.email}) = lower(${email})`)
      .orderBy(users.createdAt)
      .limit(1);
    let userId = known?.id;
    if (!userId) {
      const [created] = await tx
        .insert(users)
        .values({ name: email.split("@")[0], email })
        .returning({ id: users.id });
      userId = created.id;
    }
    await joinByInvitation(tx, userId, { email }, now);
    return userId;
  });
}

/**
 * Accepts the oldest live invitation for this login or address when the user is not yet a member
 * anywhere. Invitations for them that have run out are closed here, each with its audit row, so the
 * admin sees why nobody joined.
 */
async function joinByInvitation(
  tx: Tx,
  userId: string,
  who: { login?: string; email?: string | null },
  now: Date,
) {
  const [membership] = await tx.select({ id: members.id }).from(members).where(eq(members.userId, userId));
  if (membership) return;
  const matches = or(
    who.login ? sql`lower(${invitations.githubLogin}) = lower(${who.login})` : sql`false`,
    who.email ? sql`lower(${invitations.email}) = lower(${who.email})` : sql`false`,
  );
  const expired = await tx
    .delete(invitations)
    .where(and(isNull(invitations.acceptedAt), lte(invitations.expiresAt, now), matches))
    .returning();
  for (const old of expired)
    await audit(tx, {
      workshopId: old.workshopId,
      actorUserId: userId,
      action: "member.invite_expired",
      entity: "invitation",
      entityId: old.id,
      before: { email: old.email, githubLogin: old.githubLogin, role: old.role },
    });
  const [invite] = await tx
    .select()
    .from(invitations)
    .where(and(isNull(invitations.acceptedAt), gt(invitations.expiresAt, now), matches))
    .orderBy(invitations.createdAt)
    .limit(1);
  if (!invite) return;
  await tx.insert(members).values({
    workshopId: invite.workshopId,
    userId,
    role: invite.role,
    skill: skillForRole(invite.role),
  });
  await tx.update(invitations).set({ acceptedAt: now }).where(eq(invitations.id, invite.id));
  await audit(tx, {
    workshopId: invite.workshopId,
    actorUserId: userId,
    action: "member.join",
    entity: "member",
    entityId: userId,
    after: { role: invite.role, invitation: invite.id },
  });
}

const accountFields = {
  userId: users.id,
  name: users.name,
  email: users.email,
  memberId: members.id,
  role: members.role,
  skill: members.skill,
  status: members.status,
  workshopId: workshops.id,
  workshopName: workshops.name,
  workshopSlug: workshops.slug,
};

/** The signed-in person and, when they have one, their workshop membership. */
export async function loadAccount(db: Db, userId: string) {
  const [row] = await db
    .select(accountFields)
    .from(users)
    .leftJoin(members, eq(members.userId, users.id))
    .leftJoin(workshops, eq(workshops.id, members.workshopId))
    .where(eq(users.id, userId));
  return row ?? null;
}

// Every signed-in request starts here, so it is one prepared query per database handle:
// session, person and membership together.
function sessionAccountQuery(db: Db) {
  return db
    .select(accountFields)
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .leftJoin(members, eq(members.userId, users.id))
    .leftJoin(workshops, eq(workshops.id, members.workshopId))
    .where(
      and(
        eq(sessions.tokenHash, sql.placeholder("tokenHash")),
        gt(sessions.expiresAt, sql.placeholder("now")),
      ),
    )
    .limit(1)
    .prepare("session_account");
}
const sessionAccount = new WeakMap<Db, ReturnType<typeof sessionAccountQuery>>();

/** The account behind an unexpired session token, or null. */
export async function accountForSession(db: Db, token: string, now = new Date()) {
  let query = sessionAccount.get(db);
  if (!query) sessionAccount.set(db, (query = sessionAccountQuery(db)));
  const [row] = await query.execute({ tokenHash: hashToken(token), now });
  return row ?? null;
}

export type Account = NonNullable<Awaited<ReturnType<typeof loadAccount>>>;
