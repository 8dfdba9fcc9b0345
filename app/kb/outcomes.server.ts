import { and, count, eq, isNotNull } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { cases, vehicles } from "~/db/schema";

/** How often each cause was confirmed on closed cases, by fuel: the priors the live ranking uses. */
export async function outcomesByFuel(db: Db, workshopId: string) {
  const rows = await db
    .select({ fuel: vehicles.fuelType, causeId: cases.conclusionCauseId, n: count() })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .where(
      and(eq(cases.workshopId, workshopId), eq(cases.state, "closed"), isNotNull(cases.conclusionCauseId)),
    )
    .groupBy(vehicles.fuelType, cases.conclusionCauseId);
  const out: Record<string, Record<string, number>> = {};
  for (const r of rows) (out[r.fuel] ??= {})[r.causeId!] = r.n;
  return out;
}
