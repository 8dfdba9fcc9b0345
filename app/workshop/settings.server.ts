import { eq } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { Db } from "~/db/client.server";
import { workshops } from "~/db/schema";

export async function getWorkshop(db: Db, workshopId: string) {
  const [w] = await db
    .select({
      id: workshops.id,
      name: workshops.name,
      country: workshops.country,
      currency: workshops.currency,
      taxRate: workshops.taxRate,
      units: workshops.units,
      labourRatePerHour: workshops.labourRatePerHour,
      pricesIncludeTax: workshops.pricesIncludeTax,
    })
    .from(workshops)
    .where(eq(workshops.id, workshopId));
  if (!w) throw new Response("Workshop not found", { status: 404 });
  return w;
}

export type WorkshopSettingsInput = {
  name: string;
  currency: string;
  taxRate: number;
  units: "metric" | "imperial";
  labourRatePerHour: number;
  pricesIncludeTax: boolean;
};

export async function updateWorkshop(
  db: Db,
  by: { workshopId: string; userId: string },
  input: WorkshopSettingsInput,
) {
  await db.transaction(async (tx) => {
    const before = await getWorkshop(tx as unknown as Db, by.workshopId);
    await tx.update(workshops).set(input).where(eq(workshops.id, by.workshopId));
    await audit(tx, {
      workshopId: by.workshopId,
      actorUserId: by.userId,
      action: "settings.update",
      entity: "workshop",
      entityId: by.workshopId,
      before,
      after: input,
    });
  });
}
