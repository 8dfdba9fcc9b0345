// The starter knowledge base: every system's part merged into one seed. Seeding copies it into a
// workshop's own tables (seeds/knowledge.ts), where the workshop's seniors curate it.
import { body } from "./body";
import { bodyStructure } from "./body-structure";
import { brakes } from "./brakes";
import { brakesHydraulics } from "./brakes-hydraulics";
import { mergeParts } from "./build";
import { LINK_CONDITIONS } from "./link-conditions";
import { cooling } from "./cooling";
import { coolingCircuit } from "./cooling-circuit";
import { driveline } from "./driveline";
import { drivelineClutchGearbox } from "./driveline-clutch-gearbox";
import { electricalBody } from "./electrical-body";
import { electricalComfort } from "./electrical-comfort";
import { electricalPower } from "./electrical-power";
import { engineDieselTurbo } from "./engine-diesel-turbo";
import { engineFuelDelivery } from "./engine-fuel-delivery";
import { engineFuelEmissions } from "./engine-fuel-emissions";
import { engineMechanical } from "./engine-mechanical";
import { engineSensors } from "./engine-sensors";
import { engineTimingLubrication } from "./engine-timing-lubrication";
import { exhaust } from "./exhaust";
import { steering } from "./steering";
import { suspensionSteering } from "./suspension-steering";
import { troubleCodesEngine } from "./trouble-codes-engine";
import { troubleCodesOther } from "./trouble-codes-other";
import type { KnowledgeBaseSeed } from "./types";
import { wheelsTyres } from "./wheels-tyres";

/**
 * The parts in the order they are merged (each system's node comes with its first part, so parents
 * precede children); exported so tools can report per file.
 */
export const starterKnowledgeBaseParts = {
  brakes,
  brakesHydraulics,
  suspensionSteering,
  steering,
  wheelsTyres,
  driveline,
  drivelineClutchGearbox,
  engineFuelEmissions,
  engineSensors,
  engineFuelDelivery,
  engineDieselTurbo,
  engineMechanical,
  engineTimingLubrication,
  cooling,
  coolingCircuit,
  electricalPower,
  electricalBody,
  electricalComfort,
  exhaust,
  body,
  bodyStructure,
  troubleCodesEngine,
  troubleCodesOther,
} satisfies Record<string, KnowledgeBaseSeed>;

const merged = mergeParts(...Object.values(starterKnowledgeBaseParts));

/** Every part merged, with the links' conditions (link-conditions.ts) attached. */
export const starterKnowledgeBase: KnowledgeBaseSeed = {
  ...merged,
  symptomLinks: merged.symptomLinks.map((l) => {
    const when = LINK_CONDITIONS[`${l.symptom}|${l.cause}`];
    return when ? { ...l, when } : l;
  }),
};

export type { KnowledgeBaseSeed } from "./types";
