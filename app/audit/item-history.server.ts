import { and, desc, eq, like, or, sql } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { auditLog, users } from "~/db/schema";
import { changesOf, type FieldChange } from "./changes";
import { describeAudit } from "./describe";

export type ItemHistoryLine = {
  id: number;
  at: Date;
  actor: string | null;
  text: string;
  changes: FieldChange[];
};

/**
 * Who changed one knowledge-base item and when, newest first, in words with each field's before
 * and after: its own edits, and the links, proposals and reviews that name it (audit entries list
 * the items they concern in after.items). One query, bounded.
 */
export async function itemHistory(db: Db, workshopId: string, itemId: string, limit = 30) {
  const rows = await db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      action: auditLog.action,
      before: auditLog.before,
      after: auditLog.after,
      actor: users.name,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .where(
      and(
        eq(auditLog.workshopId, workshopId),
        like(auditLog.action, "kb.%"),
        or(
          eq(auditLog.entityId, itemId),
          sql`${auditLog.after} @> ${JSON.stringify({ items: [itemId] })}::jsonb`,
        ),
      ),
    )
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(limit);
  return rows.map((r): ItemHistoryLine => ({
    id: r.id,
    at: r.at,
    actor: r.actor,
    text: describeAudit(r).text,
    changes: changesOf(r),
  }));
}
