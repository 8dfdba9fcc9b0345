import { pgEnum } from "drizzle-orm/pg-core";
import { CASE_STATES, FINDING_RESULTS, OBSERVATION_SOURCES } from "../../domain/cases";
import { CAUSE_LEVELS, PRIORITIES, RESULT_KINDS, SYMPTOM_KINDS, SYSTEMS } from "../../domain/knowledge";
import { ROLES, SKILLS } from "../../domain/people";
import { DRIVETRAINS, FUEL_TYPES, UNIT_SYSTEMS } from "../../domain/vehicles";

// The database's enums are the domain's lists (app/domain): one definition, so data, schema and
// screens cannot drift apart.
export const roleEnum = pgEnum("member_role", ROLES);
export const skillEnum = pgEnum("skill_level", SKILLS);
export const memberStatusEnum = pgEnum("member_status", ["active", "suspended"]);
export const fuelTypeEnum = pgEnum("fuel_type", FUEL_TYPES);
export const drivetrainEnum = pgEnum("drivetrain", DRIVETRAINS);
export const unitSystemEnum = pgEnum("unit_system", UNIT_SYSTEMS);
export const systemEnum = pgEnum("vehicle_system", SYSTEMS);
export const symptomKindEnum = pgEnum("symptom_kind", SYMPTOM_KINDS);
export const priorityEnum = pgEnum("priority_level", PRIORITIES);
export const causeLevelEnum = pgEnum("cause_level", CAUSE_LEVELS);
export const resultKindEnum = pgEnum("check_result_kind", RESULT_KINDS);
export const caseStateEnum = pgEnum("case_state", CASE_STATES);
export const observationSourceEnum = pgEnum("observation_source", OBSERVATION_SOURCES);
export const findingResultEnum = pgEnum("finding_result", FINDING_RESULTS);
