import { eq } from "drizzle-orm";
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
    })
    .from(workshops)
    .where(eq(workshops.id, workshopId));
  if (!w) throw new Response("Workshop not found", { status: 404 });
  return w;
}
