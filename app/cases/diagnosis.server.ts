import type { Member } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { diagnose, type Skill } from "~/reasoning";
import { buildModel, vehicleFacts } from "./build-model";
import { evidenceOf, type CaseBundle } from "./case.server";
import { presentDiagnosis } from "./present-diagnosis";
import { loadKnowledge, outcomeCounts } from "./knowledge.server";

/** The likely causes, check plan and next-step what-if for a case, as the member may act on it. */
export async function diagnoseCase(db: Db, member: Pick<Member, "role" | "skill" | "workshopId">, bundle: CaseBundle) {
  const [kb, outcomes] = await Promise.all([
    loadKnowledge(db, bundle.workshop.id, bundle.workshop.kbVersion),
    outcomeCounts(db, bundle.workshop.id, bundle.vehicle.fuelType),
  ]);
  const model = buildModel(kb, vehicleFacts({ ...bundle.vehicle, mileageKm: bundle.mileageKm }), bundle.workshop.labourRatePerHour, outcomes);
  const evidence = evidenceOf(bundle);
  // An apprentice's plan holds only what they may do; everyone else sees every check.
  const maxSkill: Skill = member.role === "apprentice" ? "apprentice" : "senior";
  const { ranking, plan } = diagnose(model, evidence, { maxSkill });
  return { ...presentDiagnosis(kb, ranking, plan), model, evidence };
}
