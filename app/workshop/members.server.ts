import { and, desc, eq, isNull, ne, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import { skillForRole } from "~/domain/people";
import type { Db } from "~/db/client.server";
import { identities, invitations, members, users } from "~/db/schema";
import type { Role } from "~/domain/people";
import { env } from "~/config/env.server";
import { refuse } from "~/http/errors.server";
import { mailConfigured } from "~/mail/mailer.server";
import { queueMail } from "~/mail/outbox.server";
import { z } from "zod";

const INVITE_DAYS = 14;

export async function listMembers(db: Db, workshopId: string) {
  return db
    .select({
      id: members.id,
      name: users.name,
      email: users.email,
      login: identities.login,
      role: members.role,
      skill: members.skill,
      status: members.status,
    })
    .from(members)
    .innerJoin(users, eq(users.id, members.userId))
    .leftJoin(identities, eq(identities.userId, users.id))
    .where(eq(members.workshopId, workshopId))
    .orderBy(users.name);
}

export async function listPendingInvitations(db: Db, workshopId: string) {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      githubLogin: invitations.githubLogin,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .where(and(eq(invitations.workshopId, workshopId), isNull(invitations.acceptedAt)))
    .orderBy(desc(invitations.createdAt));
}

const LOGIN = /^[A-Za-z0-9](?:[A-Za-z0-9-]{0,38})$/;

/**
 * An invitation by e-mail address or code-hosting login. An e-mail invitation's message enters the
 * outbox in the same transaction, and the job queue delivers it: the invitation stands even when
 * the mail relay is down, and the answer says the message is on its way rather than that it arrived.
 * Refusals name the field they concern.
 */
export async function invite(
  db: Db,
  by: CurrentMember,
  input: { target: string; role: Role },
): Promise<string> {
  const isEmail = input.target.includes("@");
  if (isEmail && !z.email().safeParse(input.target).success)
    refuse(400, "That e-mail address does not look right");
  if (!isEmail && !LOGIN.test(input.target))
    refuse(400, "A GitHub login has letters, digits and dashes only");
  await inviteMember(
    db,
    by,
    isEmail ? { email: input.target, role: input.role } : { githubLogin: input.target, role: input.role },
  );
  if (!isEmail)
    return `Invitation saved for ${input.target}: they join as ${input.role} when they next sign in.`;
  return mailConfigured()
    ? `Invitation saved; the e-mail to ${input.target} is queued and goes out shortly (Settings → Mail shows when it was sent).`
    : `Invitation saved for ${input.target}: no mail server is set up, so the e-mail waits in the outbox. Tell them to sign in with a code sent to that address.`;
}

function invitationMail(by: CurrentMember, email: string, role: Role) {
  return {
    workshopId: by.workshopId,
    kind: "invitation",
    to: email,
    subject: `You are invited to ${by.workshopName} on Ramplight`,
    text: `${by.name} invited you to join ${by.workshopName} as ${role}.\n\nTo accept, open this link and ask for a sign-in code; we e-mail it to this address, and once you type it in you are in the workshop:\n${env().APP_URL}/sign-in/code?email=${encodeURIComponent(email)}\n\nNo other account is needed. The invitation is valid for ${INVITE_DAYS} days.`,
  };
}

export async function inviteMember(
  db: Db,
  by: CurrentMember,
  input: { email?: string; githubLogin?: string; role: Role },
) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(invitations)
      .values({
        workshopId: by.workshopId,
        email: input.email ?? null,
        githubLogin: input.githubLogin ?? null,
        role: input.role,
        invitedBy: by.memberId,
        expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
      })
      .returning({ id: invitations.id });
    await audit(tx, {
      workshopId: by.workshopId,
      actorUserId: by.userId,
      action: "member.invite",
      entity: "invitation",
      entityId: row.id,
      after: input,
    });
    if (input.email) await queueMail(tx, invitationMail(by, input.email, input.role));
    return row.id;
  });
}

export async function revokeInvitation(db: Db, by: CurrentMember, invitationId: string) {
  await db.transaction(async (tx) => {
    const gone = await tx
      .delete(invitations)
      .where(
        and(
          eq(invitations.id, invitationId),
          eq(invitations.workshopId, by.workshopId),
          isNull(invitations.acceptedAt),
        ),
      )
      .returning({ id: invitations.id });
    if (gone.length === 0)
      throw new Response("That invitation does not exist or was accepted already.", { status: 404 });
    await audit(tx, {
      workshopId: by.workshopId,
      actorUserId: by.userId,
      action: "member.invite_revoke",
      entity: "invitation",
      entityId: invitationId,
    });
  });
}

/** Role or status change. The workshop always keeps at least one active admin, so nobody locks it out. */
export async function updateMember(
  db: Db,
  by: CurrentMember,
  memberId: string,
  change: { role?: Role; status?: "active" | "suspended" },
) {
  await db.transaction(async (tx) => {
    const [target] = await tx
      .select()
      .from(members)
      .where(and(eq(members.id, memberId), eq(members.workshopId, by.workshopId)))
      .for("update");
    if (!target) throw new Response("No such member in this workshop.", { status: 404 });
    const losesAdmin =
      target.role === "admin" &&
      target.status === "active" &&
      ((change.role && change.role !== "admin") || change.status === "suspended");
    if (losesAdmin) {
      const [{ n }] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(members)
        .where(
          and(
            eq(members.workshopId, by.workshopId),
            eq(members.role, "admin"),
            eq(members.status, "active"),
            ne(members.id, memberId),
          ),
        );
      if (n === 0)
        throw new Response("This is the workshop's only active admin. Make someone else admin first.", {
          status: 409,
        });
    }
    const next = { role: change.role ?? target.role, status: change.status ?? target.status };
    await tx
      .update(members)
      .set({ ...next, skill: change.role ? skillForRole(change.role) : target.skill })
      .where(eq(members.id, memberId));
    await audit(tx, {
      workshopId: by.workshopId,
      actorUserId: by.userId,
      action: change.status
        ? `member.${change.status === "suspended" ? "suspend" : "reactivate"}`
        : "member.role",
      entity: "member",
      entityId: memberId,
      before: { role: target.role, status: target.status },
      after: next,
    });
  });
}
