import { and, eq, lt, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, workshops } from "~/db/schema";
import { mayWorkOn } from "~/domain/case-access";
import { refuse } from "~/http/errors.server";
import type { CaseFields } from "./case.server";

/**
 * Ranks an open case with the newest knowledge-base version from now on. A case keeps the version
 * it was opened under until someone working on it asks for this, so a change to the base never
 * moves a ranking a technician is looking at; the history says when it was moved, from which version.
 */
export async function moveToNewestKnowledge(
  db: Db,
  member: CurrentMember,
  c: Pick<CaseFields, "id" | "state" | "assignedMemberId" | "kbVersion">,
) {
  if (!mayWorkOn(member, c)) refuse(403, `Your role (${member.role}) cannot work on this case.`);
  if (c.state !== "open") refuse(409, "Only an open case is ranked again: reopen it first.");
  return db.transaction(async (tx) => {
    const newest = sql<number>`(select ${workshops.kbVersion} from ${workshops} where ${workshops.id} = ${cases.workshopId})`;
    const [moved] = await tx
      .update(cases)
      .set({ kbVersion: newest })
      .where(and(eq(cases.id, c.id), lt(cases.kbVersion, newest)))
      .returning({ kbVersion: cases.kbVersion });
    if (!moved) return { from: c.kbVersion, to: c.kbVersion, moved: false };
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.kb_version",
      entity: "case",
      entityId: c.id,
      before: { kbVersion: c.kbVersion },
      after: { kbVersion: moved.kbVersion },
    });
    return { from: c.kbVersion, to: moved.kbVersion, moved: true };
  });
}
