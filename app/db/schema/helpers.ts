import { sql } from "drizzle-orm";
import { timestamp, uuid } from "drizzle-orm/pg-core";

// Shared column helpers: every table gets a UUID key and creation time the same way.
export const id = () =>
  uuid("id")
    .primaryKey()
    .default(sql`gen_random_uuid()`);
export const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
export const updatedAt = () =>
  timestamp("updated_at", { withTimezone: true })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date());
