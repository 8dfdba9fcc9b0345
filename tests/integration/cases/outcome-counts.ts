// The outcome counts written as a plain grouped query, the way they were first read: the
// reference the case read's JSON aggregate (app/cases/case.server.ts) is checked against.
import { and, count, eq, isNotNull } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { cases, vehicles } from "~/db/schema";

/** Confirmed causes of the workshop's closed cases for vehicles of this fuel type. */
export async function outcomeCounts(
  db: Db,
  workshopId: string,
  fuelType: string,
): Promise<Record<string, number>> {
  const rows = await db
    .select({ causeId: cases.conclusionCauseId, n: count() })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .where(
      and(
        eq(cases.workshopId, workshopId),
        eq(cases.state, "closed"),
        isNotNull(cases.conclusionCauseId),
        eq(vehicles.fuelType, fuelType as typeof vehicles.$inferSelect.fuelType),
      ),
    )
    .groupBy(cases.conclusionCauseId);
  return Object.fromEntries(rows.map((r) => [r.causeId!, r.n]));
}
