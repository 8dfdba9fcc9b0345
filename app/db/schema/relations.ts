import { relations } from "drizzle-orm";
import { cases, findings, observations } from "./cases";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "./knowledge";
import { identities, members, users } from "./people";
import { owners, vehicles } from "./vehicles";
import { workshops } from "./workshops";

export const workshopRelations = relations(workshops, ({ many }) => ({ members: many(members) }));
export const userRelations = relations(users, ({ many, one }) => ({
  identities: many(identities),
  member: one(members, { fields: [users.id], references: [members.userId] }),
}));
export const memberRelations = relations(members, ({ one }) => ({
  user: one(users, { fields: [members.userId], references: [users.id] }),
  workshop: one(workshops, { fields: [members.workshopId], references: [workshops.id] }),
}));
export const identityRelations = relations(identities, ({ one }) => ({
  user: one(users, { fields: [identities.userId], references: [users.id] }),
}));
export const ownerRelations = relations(owners, ({ many }) => ({ vehicles: many(vehicles) }));
export const vehicleRelations = relations(vehicles, ({ one, many }) => ({
  owner: one(owners, { fields: [vehicles.ownerId], references: [owners.id] }),
  cases: many(cases),
}));
export const causeRelations = relations(causes, ({ one, many }) => ({
  parent: one(causes, { fields: [causes.parentId], references: [causes.id], relationName: "tree" }),
  children: many(causes, { relationName: "tree" }),
  symptomLinks: many(symptomLinks),
  checkLinks: many(checkLinks),
}));
export const symptomRelations = relations(symptoms, ({ many }) => ({ links: many(symptomLinks) }));
export const checkRelations = relations(checks, ({ many }) => ({ links: many(checkLinks) }));
export const symptomLinkRelations = relations(symptomLinks, ({ one }) => ({
  symptom: one(symptoms, { fields: [symptomLinks.symptomId], references: [symptoms.id] }),
  cause: one(causes, { fields: [symptomLinks.causeId], references: [causes.id] }),
}));
export const checkLinkRelations = relations(checkLinks, ({ one }) => ({
  check: one(checks, { fields: [checkLinks.checkId], references: [checks.id] }),
  cause: one(causes, { fields: [checkLinks.causeId], references: [causes.id] }),
}));
export const caseRelations = relations(cases, ({ one, many }) => ({
  vehicle: one(vehicles, { fields: [cases.vehicleId], references: [vehicles.id] }),
  observations: many(observations),
  findings: many(findings),
}));
export const observationRelations = relations(observations, ({ one }) => ({
  case: one(cases, { fields: [observations.caseId], references: [cases.id] }),
  symptom: one(symptoms, { fields: [observations.symptomId], references: [symptoms.id] }),
}));
export const findingRelations = relations(findings, ({ one }) => ({
  case: one(cases, { fields: [findings.caseId], references: [cases.id] }),
  check: one(checks, { fields: [findings.checkId], references: [checks.id] }),
}));
