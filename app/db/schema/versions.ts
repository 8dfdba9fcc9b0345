import { integer, jsonb, pgTable, primaryKey, text, uuid } from "drizzle-orm/pg-core";
import type { Knowledge } from "../../kb/model";
import { createdAt } from "./helpers";
import { members } from "./people";
import { workshops } from "./workshops";

// Every version of a workshop's knowledge base, kept whole as the engine reads it: a case ranked
// under version N is ranked (and explained) the same way after N+1 is made, until someone asks for
// the newer one. Written in the transaction of the change that made the version.
export const kbVersions = pgTable(
  "kb_versions",
  {
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    summary: text("summary").notNull(), // what made this version, in words
    madeById: uuid("made_by_id").references(() => members.id, { onDelete: "set null" }),
    knowledge: jsonb("knowledge").$type<Omit<Knowledge, "kbVersion">>().notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.workshopId, t.version] })],
);
