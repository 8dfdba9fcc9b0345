import { sql } from "drizzle-orm";
import type { Db } from "../app/db/client.server";
import {
  cases,
  findings,
  identities,
  members,
  mileageReadings,
  observations,
  owners,
  users,
  vehicles,
  workshops,
} from "../app/db/schema";
import { countryDefaults } from "../app/domain/countries";
import { DEMO_CASES } from "./demo/cases";
import { DEMO_OWNERS, DEMO_VEHICLES } from "./demo/fleet";
import { DEMO_PEOPLE, DEMO_WORKSHOPS } from "./demo/people";
import { seedTestCases } from "./demo/test-cases";
import { seedId } from "./ids";
import { starterKnowledgeBase } from "./kb";
import { kbId, seedKnowledgeBase, seedStarterTemplate } from "./knowledge";

const DAY = 86_400_000;

/** Seeds the demo workshops. Every row has a derived id and conflicts are skipped, so it is idempotent. */
export async function seedDemo(db: Db, now = new Date()) {
  await db.transaction(async (tx) => {
    // One seeder at a time: two `npm start`s racing would otherwise trip over each other's rows.
    await tx.execute(sql`select pg_advisory_xact_lock(4242)`);
    // Every workshop created in the app starts from this copy of the starter base.
    await seedStarterTemplate(tx);
    for (const w of Object.values(DEMO_WORKSHOPS)) {
      const c = countryDefaults(w.country)!;
      await tx
        .insert(workshops)
        .values({
          id: seedId(`workshop:${w.slug}`),
          slug: w.slug,
          name: w.name,
          country: c.code,
          currency: c.currency,
          taxRate: c.taxRate,
          units: c.units,
          labourRatePerHour: w.labourRatePerHour,
        })
        .onConflictDoNothing();
      await seedKnowledgeBase(tx, { id: seedId(`workshop:${w.slug}`), slug: w.slug }, starterKnowledgeBase);
    }

    for (const p of DEMO_PEOPLE) {
      const userId = seedId(`user:${p.login}`);
      await tx.insert(users).values({ id: userId, name: p.name, email: p.email }).onConflictDoNothing();
      await tx
        .insert(identities)
        .values({
          id: seedId(`identity:${p.login}`),
          userId,
          provider: "github",
          providerUserId: String(p.githubId),
          login: p.login,
        })
        .onConflictDoNothing();
      if (p.workshop && p.role) {
        await tx
          .insert(members)
          .values({
            id: seedId(`member:${p.login}`),
            workshopId: seedId(`workshop:${p.workshop}`),
            userId,
            role: p.role,
            skill: p.skill ?? "technician",
          })
          .onConflictDoNothing();
      }
    }

    for (const o of DEMO_OWNERS) {
      await tx
        .insert(owners)
        .values({
          id: seedId(`owner:${o.key}`),
          workshopId: seedId(`workshop:${o.workshop}`),
          name: o.name,
          email: o.email,
          phone: o.phone,
        })
        .onConflictDoNothing();
    }
    const ownerWorkshop = new Map(DEMO_OWNERS.map((o) => [o.key, o.workshop]));
    for (const v of DEMO_VEHICLES) {
      const workshopId = seedId(`workshop:${ownerWorkshop.get(v.owner)}`);
      const vehicleId = seedId(`vehicle:${v.key}`);
      const { key, owner, mileageKm, ...fields } = v;
      await tx
        .insert(vehicles)
        .values({ ...fields, id: vehicleId, workshopId, ownerId: seedId(`owner:${owner}`) })
        .onConflictDoNothing();
      await tx
        .insert(mileageReadings)
        .values(
          mileageKm.map((km, i) => ({
            id: seedId(`mileage:${key}:${i}`),
            workshopId,
            vehicleId,
            km,
            readAt: new Date(now.getTime() - (mileageKm.length - 1 - i) * 180 * DAY),
          })),
        )
        .onConflictDoNothing();
    }

    for (const c of DEMO_CASES) {
      const workshopId = seedId(`workshop:${c.workshop}`);
      const caseId = seedId(`case:${c.key}`);
      const member = (login?: string) => (login ? seedId(`member:${login}`) : null);
      const at = new Date(now.getTime() - c.daysAgo * DAY);
      const vehicle = DEMO_VEHICLES.find((v) => v.key === c.vehicle)!;
      await tx
        .insert(cases)
        .values({
          id: caseId,
          workshopId,
          number: c.number,
          vehicleId: seedId(`vehicle:${c.vehicle}`),
          kbVersion: sql`(select ${workshops.kbVersion} from ${workshops} where ${workshops.id} = ${workshopId})`,
          complaint: c.complaint,
          mileageKm: vehicle.mileageKm.at(-1),
          state: c.state,
          assignedMemberId: member(c.assignedTo),
          openedById: member(c.openedBy),
          conclusionCauseId: c.conclusion ? kbId(c.workshop, "cause", c.conclusion.cause) : null,
          conclusionNotes: c.conclusion?.notes ?? null,
          concludedById: member(c.conclusion?.by),
          signedOffById: member(c.conclusion?.signedOffBy),
          openedAt: at,
          concludedAt: c.conclusion ? new Date(at.getTime() + 3_600_000) : null,
          closedAt: c.state === "closed" ? new Date(at.getTime() + DAY) : null,
        })
        .onConflictDoNothing();
      if (c.observations.length) {
        await tx
          .insert(observations)
          .values(
            c.observations.map((o) => ({
              id: seedId(`obs:${c.key}:${o.symptom}`),
              workshopId,
              caseId,
              symptomId: kbId(c.workshop, "symptom", o.symptom),
              present: o.present,
              source: o.source,
              recordedById: member(c.assignedTo),
              recordedAt: at,
            })),
          )
          .onConflictDoNothing();
      }
      if (c.findings.length) {
        await tx
          .insert(findings)
          .values(
            c.findings.map((f) => {
              const m = f.reading?.match(/^([\d.]+)\s*(.+)$/);
              return {
                id: seedId(`finding:${c.key}:${f.check}`),
                workshopId,
                caseId,
                checkId: kbId(c.workshop, "check", f.check),
                result: f.result,
                reading: f.reading ?? null,
                value: m ? Number(m[1]) : null,
                unit: m ? m[2] : null,
                recordedById: member(c.assignedTo),
                recordedAt: at,
              };
            }),
          )
          .onConflictDoNothing();
      }
    }
    await seedTestCases(tx);
  });
}
