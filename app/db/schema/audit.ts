import { bigint, index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users } from "./people";
import { workshops } from "./workshops";

// Who changed what: before/after snapshots of the changed fields.
export const auditLog = pgTable(
  "audit_log",
  {
    id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    workshopId: uuid("workshop_id").references(() => workshops.id, { onDelete: "cascade" }),
    actorUserId: uuid("actor_user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(), // "case.conclude", "kb.link.update", "auth.sign_in"
    entity: text("entity").notNull(),
    entityId: text("entity_id"),
    before: jsonb("before"),
    after: jsonb("after"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("audit_workshop_at_idx").on(t.workshopId, t.at),
    index("audit_entity_idx").on(t.entity, t.entityId),
  ],
);

export type AuditEntry = typeof auditLog.$inferSelect;
