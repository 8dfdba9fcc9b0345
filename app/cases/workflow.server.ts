import { and, eq, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import { mayConclude } from "~/domain/case-access";
import { can } from "~/domain/permissions";
import type { Db } from "~/db/client.server";
import { cases, causes } from "~/db/schema";
import { refuse } from "~/http/errors.server";
import type { CaseFields } from "./case.server";

/**
 * A shared text field is written only if nobody changed the case since the writer loaded it; the
 * loser is told what the case says now, instead of overwriting it.
 */
async function versionedUpdate(
  db: Pick<Db, "update" | "select">,
  c: CaseFields,
  expected: number,
  set: Partial<typeof cases.$inferInsert>,
) {
  const updated = await db
    .update(cases)
    .set({ ...set, version: sql`${cases.version} + 1` })
    .where(and(eq(cases.id, c.id), eq(cases.version, expected)))
    .returning({ version: cases.version });
  if (updated.length === 0) {
    const [now] = await db
      .select({
        complaint: cases.complaint,
        state: cases.state,
        conclusionNotes: cases.conclusionNotes,
        version: cases.version,
      })
      .from(cases)
      .where(eq(cases.id, c.id));
    const says = now
      ? ` It is now ${now.state === "open" ? "open" : now.state.replace("_", " ")}; the complaint reads “${now.complaint}”${now.conclusionNotes ? ` and the conclusion “${now.conclusionNotes}”` : ""}.`
      : "";
    refuse(
      409,
      `Someone else changed this case while you were editing.${says} Apply your change again if it still stands.`,
      { current: now },
    );
  }
  return updated[0].version;
}

export async function updateComplaint(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  complaint: string,
  expected: number,
) {
  if (!can(member.role, "case:open")) refuse(403, "Your role cannot edit the complaint.");
  if (c.state === "closed") refuse(409, "This case is closed.");
  return db.transaction(async (tx) => {
    const v = await versionedUpdate(tx, c, expected, { complaint });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.complaint",
      entity: "case",
      entityId: c.id,
      before: { complaint: c.complaint },
      after: { complaint },
    });
    return v;
  });
}

export async function askSenior(db: Db, member: CurrentMember, c: CaseFields, note: string) {
  if (!can(member.role, "case:ask-senior")) refuse(403, "Your role cannot ask for a senior on this case.");
  if (c.state === "closed") refuse(409, "This case is closed.");
  await db.transaction(async (tx) => {
    await tx.update(cases).set({ needsSenior: true }).where(eq(cases.id, c.id));
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.ask_senior",
      entity: "case",
      entityId: c.id,
      after: { note },
    });
  });
}

/** A technician's conclusion stands; an apprentice's waits for a senior's sign-off. */
export async function conclude(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  input: { causeId: string; notes: string; version: number },
) {
  if (!mayConclude(member, c)) refuse(403, "Your role cannot conclude this case.");
  if (c.state !== "open") refuse(409, "This case is concluded already.");
  const [cause] = await db
    .select({ id: causes.id, name: causes.name, level: causes.level })
    .from(causes)
    .where(and(eq(causes.id, input.causeId), eq(causes.workshopId, member.workshopId)));
  if (!cause || cause.level !== "failure_mode")
    refuse(400, "Conclude with one failure mode from the likely causes.");
  const state = member.role === "apprentice" ? "awaiting_signoff" : "concluded";
  await db.transaction(async (tx) => {
    await versionedUpdate(tx, c, input.version, {
      state,
      conclusionCauseId: cause.id,
      conclusionNotes: input.notes,
      concludedById: member.memberId,
      concludedAt: new Date(),
      needsSenior: state === "awaiting_signoff",
    });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.conclude",
      entity: "case",
      entityId: c.id,
      before: { state: c.state },
      after: { state, cause: cause.name, notes: input.notes },
    });
  });
  return state;
}

export async function signOff(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  input: { accept: boolean; note: string; version: number },
) {
  if (!can(member.role, "case:signoff")) refuse(403, "Only a senior technician signs off.");
  if (c.state !== "awaiting_signoff") refuse(409, "This case is not waiting for a sign-off.");
  const set = input.accept
    ? { state: "concluded" as const, signedOffById: member.memberId, needsSenior: false }
    : {
        state: "open" as const,
        conclusionCauseId: null,
        conclusionNotes: null,
        concludedById: null,
        concludedAt: null,
        needsSenior: false,
      };
  await db.transaction(async (tx) => {
    await versionedUpdate(tx, c, input.version, set);
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: input.accept ? "case.signoff" : "case.send_back",
      entity: "case",
      entityId: c.id,
      before: { state: c.state, cause: c.conclusionCause },
      after: { state: set.state, note: input.note },
    });
  });
}

/**
 * A senior reopens a concluded or closed case, with a reason: the conclusion is set aside (the
 * audit row keeps it) and the evidence can change again.
 */
export async function reopen(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  input: { reason: string; version: number },
) {
  if (!can(member.role, "case:reopen")) refuse(403, "Only a senior technician reopens a case.");
  if (c.state === "open") refuse(409, "This case is open already.");
  await db.transaction(async (tx) => {
    await versionedUpdate(tx, c, input.version, {
      state: "open",
      conclusionCauseId: null,
      conclusionNotes: null,
      concludedById: null,
      concludedAt: null,
      signedOffById: null,
      closedAt: null,
      needsSenior: false,
    });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.reopen",
      entity: "case",
      entityId: c.id,
      before: { state: c.state, cause: c.conclusionCause, notes: c.conclusionNotes },
      after: { state: "open", reason: input.reason },
    });
  });
}

/** A concluded case is closed when the work is done: its confirmed cause then feeds the outcome statistics. */
export async function close(db: Db, member: CurrentMember, c: CaseFields, input: { version: number }) {
  if (!can(member.role, "case:close")) refuse(403, "Your role cannot close cases.");
  if (c.state !== "concluded")
    refuse(
      409,
      c.state === "closed"
        ? "This case is closed already."
        : "Only a concluded case can be closed: conclude it (or sign it off) first.",
    );
  await db.transaction(async (tx) => {
    await versionedUpdate(tx, c, input.version, { state: "closed", closedAt: new Date() });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.close",
      entity: "case",
      entityId: c.id,
      before: { state: c.state },
      after: { state: "closed", cause: c.conclusionCause },
    });
  });
}
