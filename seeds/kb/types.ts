// The starter knowledge base as plain data. Seeding copies it into a workshop's own tables,
// where seniors then curate it. Keys are stable slugs so re-seeding is idempotent.
// The vocabulary lists are the app's own (app/domain); the seed shapes are below.
export { CAUTIONS, CHECK_ACCESS as ACCESS, PRIORITIES, SYMPTOM_KINDS, SYSTEMS } from "../../app/domain/knowledge";
export type { Applicability, Caution, CheckAccess as Access, Priority, SymptomKind, System } from "../../app/domain/knowledge";
export { SKILLS } from "../../app/domain/people";
export type { Skill } from "../../app/domain/people";
export { DRIVETRAINS, FUEL_TYPES } from "../../app/domain/vehicles";
export type { Drivetrain, FuelType } from "../../app/domain/vehicles";

// The seed shapes are the knowledge-base document's items (app/domain/knowledge-document.ts).
export type {
  CauseItem as CauseSeed,
  CheckItem as CheckSeed,
  CheckLinkItem as CheckLinkSeed,
  CheckResult,
  KnowledgeItems as KnowledgeBaseSeed,
  SymptomItem as SymptomSeed,
  SymptomLinkItem as SymptomLinkSeed,
} from "../../app/domain/knowledge-document";
