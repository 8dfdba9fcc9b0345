// Opening a case: the owner and vehicle found or added, the mileage recorded, the case assigned.
import { and, eq, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, mileageReadings, owners, vehicles, workshops } from "~/db/schema";
import type { Drivetrain, FuelType } from "~/domain/vehicles";
import { can } from "~/domain/permissions";
import { refuse } from "~/http/errors.server";

export type OpenCaseInput = {
  vehicleId?: string;
  newVehicle?: {
    ownerName: string;
    ownerPhone?: string;
    ownerEmail?: string;
    registration: string;
    vin?: string;
    make: string;
    model: string;
    year: number;
    fuelType: FuelType;
    drivetrain: Drivetrain;
  };
  mileageKm: number;
  complaint: string;
};

/** A new case: for a known vehicle, or with its owner and vehicle created in the same transaction. */
export async function openCase(db: Db, member: CurrentMember, input: OpenCaseInput) {
  if (!can(member.role, "case:open")) refuse(403, "Your role cannot open cases.");
  return db.transaction(async (tx) => {
    let vehicleId = input.vehicleId;
    if (vehicleId) {
      const [v] = await tx
        .select({ id: vehicles.id })
        .from(vehicles)
        .where(and(eq(vehicles.id, vehicleId), eq(vehicles.workshopId, member.workshopId)));
      if (!v) refuse(400, "That vehicle is not in this workshop.");
    } else if (input.newVehicle) {
      const nv = input.newVehicle;
      const [dupe] = await tx
        .select({ id: vehicles.id })
        .from(vehicles)
        .where(and(eq(vehicles.workshopId, member.workshopId), eq(vehicles.registration, nv.registration)));
      if (dupe)
        refuse(
          409,
          `A vehicle with registration ${nv.registration} is on file already; pick it from the list.`,
        );
      const [o] = await tx
        .insert(owners)
        .values({
          workshopId: member.workshopId,
          name: nv.ownerName,
          phone: nv.ownerPhone ?? null,
          email: nv.ownerEmail ?? null,
        })
        .returning({ id: owners.id });
      const [v] = await tx
        .insert(vehicles)
        .values({
          workshopId: member.workshopId,
          ownerId: o.id,
          registration: nv.registration,
          vin: nv.vin ?? null,
          make: nv.make,
          model: nv.model,
          year: nv.year,
          fuelType: nv.fuelType,
          drivetrain: nv.drivetrain,
        })
        .returning({ id: vehicles.id });
      vehicleId = v.id;
    } else refuse(400, "Pick a vehicle or enter a new one.");
    // The next running number of this workshop; the row lock keeps two openings from taking the same one.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${member.workshopId}))`);
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${cases.number}), 1000) + 1` })
      .from(cases)
      .where(eq(cases.workshopId, member.workshopId));
    const [created] = await tx
      .insert(cases)
      .values({
        workshopId: member.workshopId,
        number: next,
        vehicleId: vehicleId!,
        complaint: input.complaint,
        mileageKm: input.mileageKm,
        openedById: member.memberId,
        assignedMemberId: member.role === "advisor" ? null : member.memberId,
        // Ranked with the knowledge base as it is when the case opens.
        kbVersion: sql`(select ${workshops.kbVersion} from ${workshops} where ${workshops.id} = ${member.workshopId})`,
      })
      .returning({ id: cases.id, number: cases.number });
    await tx
      .insert(mileageReadings)
      .values({ workshopId: member.workshopId, vehicleId: vehicleId!, km: input.mileageKm });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.open",
      entity: "case",
      entityId: created.id,
      after: { number: created.number, complaint: input.complaint },
    });
    return created;
  });
}
