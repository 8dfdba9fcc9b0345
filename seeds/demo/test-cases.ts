// The demo workshops' knowledge-base test cases: each concluded or closed demo case kept with its
// evidence and confirmed cause, as a senior would keep it from the case page. Invented, like the
// cases they come from.
import type { Tx } from "../../app/db/client.server";
import { kbTestCases } from "../../app/db/schema";
import { seedId } from "../ids";
import { kbId } from "../knowledge";
import { DEMO_CASES } from "./cases";
import { DEMO_VEHICLES } from "./fleet";

export async function seedTestCases(tx: Tx) {
  const kept = DEMO_CASES.filter((c) => c.conclusion && (c.state === "concluded" || c.state === "closed"));
  if (kept.length === 0) return;
  await tx
    .insert(kbTestCases)
    .values(
      kept.map((c) => {
        const vehicle = DEMO_VEHICLES.find((v) => v.key === c.vehicle)!;
        return {
          id: seedId(`test-case:${c.key}`),
          workshopId: seedId(`workshop:${c.workshop}`),
          name: `Case #${c.number}: ${c.complaint.replace(/\.$/, "")}`,
          complaint: c.complaint,
          fuelType: vehicle.fuelType,
          drivetrain: vehicle.drivetrain,
          year: vehicle.year,
          mileageKm: vehicle.mileageKm.at(-1) ?? null,
          evidence: {
            observations: c.observations.map((o) => ({
              symptomId: kbId(c.workshop, "symptom", o.symptom),
              present: o.present,
              source: o.source,
            })),
            findings: c.findings.map((f) => ({
              checkId: kbId(c.workshop, "check", f.check),
              result: f.result,
            })),
          },
          answerCauseId: kbId(c.workshop, "cause", c.conclusion!.cause),
          fromCaseId: seedId(`case:${c.key}`),
          keptById: c.conclusion!.signedOffBy ? seedId(`member:${c.conclusion!.signedOffBy}`) : null,
        };
      }),
    )
    .onConflictDoNothing();
}
