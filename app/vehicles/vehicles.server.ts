import { asc, eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { owners, vehicles } from "~/db/schema";

/** The workshop's vehicles with their owners, by registration: the list a case is opened from. */
export async function listVehicles(db: Db, workshopId: string) {
  return db
    .select({
      id: vehicles.id,
      registration: vehicles.registration,
      make: vehicles.make,
      model: vehicles.model,
      owner: owners.name,
    })
    .from(vehicles)
    .innerJoin(owners, eq(owners.id, vehicles.ownerId))
    .where(eq(vehicles.workshopId, workshopId))
    .orderBy(asc(vehicles.registration));
}
