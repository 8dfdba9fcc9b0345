// The starter knowledge base: every system's part merged into one seed. Seeding copies it into a
// workshop's own tables (seeds/knowledge.ts), where the workshop's seniors curate it.
import { brakes } from "./brakes";
import { mergeParts } from "./build";
import { cooling } from "./cooling";
import { driveline } from "./driveline";
import { electricalBody } from "./electrical-body";
import { electricalPower } from "./electrical-power";
import { engineDieselMechanical } from "./engine-diesel-mechanical";
import { engineFuelEmissions } from "./engine-fuel-emissions";
import { exhaust } from "./exhaust";
import { suspensionSteering } from "./suspension-steering";
import type { KnowledgeBaseSeed } from "./types";
import { wheelsTyres } from "./wheels-tyres";

/** The parts in the order they are merged; exported so tools can report per file. */
export const starterKnowledgeBaseParts = {
  brakes,
  suspensionSteering,
  wheelsTyres,
  driveline,
  engineFuelEmissions,
  engineDieselMechanical,
  cooling,
  electricalPower,
  electricalBody,
  exhaust,
} satisfies Record<string, KnowledgeBaseSeed>;

export const starterKnowledgeBase: KnowledgeBaseSeed = mergeParts(...Object.values(starterKnowledgeBaseParts));

export type { KnowledgeBaseSeed } from "./types";
