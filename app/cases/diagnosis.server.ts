import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { compileModel, diagnose, type CompiledModel, type Model, type Skill } from "~/reasoning";
import { buildModel, vehicleFacts } from "~/kb/model";
import { caseFields, evidenceOf, type CaseBundle } from "./case.server";
import { presentDiagnosis } from "./present-diagnosis";
import { knownEvidence, type KnowledgeUsed } from "./known-evidence";
import { SHOWN_FINDINGS } from "./shown";
import { kbCache } from "~/kb/cache";
import { loadKnowledge } from "~/kb/knowledge.server";

// The model depends on the knowledge base, the vehicle's facts, the labour rate and the outcome
// counts; everything else is the case's evidence. Vehicles of the same kind share a compiled model,
// so a re-rank only redoes the arithmetic.
const compiled = kbCache<{ model: Model; compiled: CompiledModel }>("compiled-model", 200);

/** The likely causes, check plan and next-step what-if for a case, as the member may act on it. */
export async function diagnoseCase(
  db: Db,
  member: Pick<CurrentMember, "role" | "skill" | "workshopId">,
  bundle: CaseBundle,
) {
  // The version the case is ranked with, not the newest: a change to the base re-ranks a case
  // only when someone asks (moveCaseToNewestKnowledge).
  const kb = await loadKnowledge(db, bundle.workshop.id, bundle.kbVersion);
  // Read with the case (loadCase), so the page costs no extra query for them.
  const outcomes = bundle.outcomes;
  const facts = vehicleFacts({ ...bundle.vehicle, mileageKm: bundle.mileageKm });
  const entry = await compiled.get(
    bundle.workshop.id,
    kb.kbVersion,
    JSON.stringify([facts, bundle.workshop.labourRatePerHour, outcomes]),
    () => {
      const model = buildModel(kb, facts, bundle.workshop.labourRatePerHour, outcomes);
      return { model, compiled: compileModel(model) };
    },
  );
  const { model } = entry;
  const { evidence, setAside } = knownEvidence(kb, evidenceOf(bundle));
  // An apprentice's plan holds only what they may do; everyone else sees every check.
  const maxSkill: Skill = member.role === "apprentice" ? "apprentice" : "senior";
  const { ranking, plan } = diagnose(entry.compiled, evidence, { maxSkill });
  // The tree's node shares are for the API's diagnosis; the case screens do not draw them.
  return {
    ...presentDiagnosis(kb, ranking, plan, bundle, bundle.workshop.units),
    knowledge: { version: kb.kbVersion, setAside } satisfies KnowledgeUsed,
    nodes: ranking.nodes,
    model,
    evidence,
  };
}

/**
 * The case as its screens and GET /api/cases/:caseId show it: its fields, its latest findings with
 * their total (a checklist can record dozens; GET …/findings lists them all), and its diagnosis,
 * which is ranked on every finding.
 */
export async function caseView(
  db: Db,
  member: Pick<CurrentMember, "role" | "skill" | "workshopId">,
  bundle: CaseBundle,
) {
  const { model: _m, evidence: _e, nodes: _n, ...diagnosis } = await diagnoseCase(db, member, bundle);
  const fields = caseFields(bundle);
  return {
    case: {
      ...fields,
      findings: fields.findings.slice(-SHOWN_FINDINGS),
      findingCount: fields.findings.length,
    },
    diagnosis,
  };
}
