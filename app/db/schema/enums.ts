import { pgEnum } from "drizzle-orm/pg-core";
import {
  CAUTIONS,
  DRIVETRAINS,
  FUEL_TYPES,
  PRIORITIES,
  SKILLS,
  SYMPTOM_KINDS,
  SYSTEMS,
} from "../../../seeds/kb/types";
import { ROLES } from "../../../seeds/demo/people";

// The lists live with the seed types so data and schema cannot drift apart.
export const roleEnum = pgEnum("member_role", ROLES);
export const skillEnum = pgEnum("skill_level", SKILLS);
export const memberStatusEnum = pgEnum("member_status", ["active", "suspended"]);
export const fuelTypeEnum = pgEnum("fuel_type", FUEL_TYPES);
export const drivetrainEnum = pgEnum("drivetrain", DRIVETRAINS);
export const unitSystemEnum = pgEnum("unit_system", ["metric", "imperial"]);
export const systemEnum = pgEnum("vehicle_system", SYSTEMS);
export const symptomKindEnum = pgEnum("symptom_kind", SYMPTOM_KINDS);
export const priorityEnum = pgEnum("priority_level", PRIORITIES);
export const causeLevelEnum = pgEnum("cause_level", ["system", "component", "failure_mode"]);
export const resultKindEnum = pgEnum("check_result_kind", ["pass_fail", "measurement"]);
export const caseStateEnum = pgEnum("case_state", ["open", "awaiting_signoff", "concluded", "closed"]);
export const observationSourceEnum = pgEnum("observation_source", ["owner", "technician"]);
export const findingResultEnum = pgEnum("finding_result", ["pass", "fail"]);

export const CAUTION_VALUES = CAUTIONS;
