import { sql } from "drizzle-orm";
import { check, doublePrecision, index, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { PROPOSAL_KINDS, PROPOSAL_STATES } from "../../domain/proposals";
import { cases } from "./cases";
import { causes, symptoms } from "./knowledge";
import { members } from "./people";
import { workshops } from "./workshops";

export const proposalKindEnum = pgEnum("kb_proposal_kind", PROPOSAL_KINDS);
export const proposalStateEnum = pgEnum("kb_proposal_state", PROPOSAL_STATES);

// A change to the knowledge base a technician asks for, usually from the case where they met the
// gap; a senior accepts it (the change is made, with a new version) or rejects it, with a comment.
export const kbProposals = pgTable(
  "kb_proposals",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id").references(() => cases.id, { onDelete: "set null" }),
    kind: proposalKindEnum("kind").notNull(),
    // kinds "link" and "cause": the case's symptom; kind "symptom": none yet, its name instead.
    symptomId: uuid("symptom_id").references(() => symptoms.id, { onDelete: "cascade" }),
    symptomName: text("symptom_name"),
    // kind "link": the cause the symptom should point to; kind "cause": the component a new cause goes under.
    causeId: uuid("cause_id")
      .notNull()
      .references(() => causes.id, { onDelete: "cascade" }),
    causeName: text("cause_name"), // kind "cause": the new failure mode's name
    p: doublePrecision("p").notNull(), // how often the cause shows the symptom, as proposed
    note: text("note").notNull(),
    state: proposalStateEnum("state").notNull().default("open"),
    proposedById: uuid("proposed_by_id").references(() => members.id, { onDelete: "set null" }),
    reviewedById: uuid("reviewed_by_id").references(() => members.id, { onDelete: "set null" }),
    reviewComment: text("review_comment"),
    reviewedAt: timestamp("reviewed_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("kb_proposals_workshop_state_idx").on(t.workshopId, t.state),
    check("kb_proposals_p_range", sql`${t.p} > 0 and ${t.p} < 1`),
    check("kb_proposals_cause_named", sql`(${t.kind} = 'cause') = (${t.causeName} is not null)`),
    check("kb_proposals_symptom_named", sql`(${t.symptomId} is null) <> (${t.symptomName} is null)`),
  ],
);
