import type { Db } from "~/db/client.server";
import { auditLog } from "~/db/schema";

type Executor = Pick<Db, "insert">;

export type AuditEntryInput = {
  workshopId: string | null;
  actorUserId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  before?: unknown;
  after?: unknown;
};

/** Writes one audit row; pass the transaction that makes the change so both land or neither. */
export async function audit(db: Executor, entry: AuditEntryInput) {
  await db.insert(auditLog).values({
    workshopId: entry.workshopId,
    actorUserId: entry.actorUserId,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId ?? null,
    before: entry.before ?? null,
    after: entry.after ?? null,
  });
}
