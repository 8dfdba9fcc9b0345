import { audit } from "~/audit/write.server";
import type { Db } from "~/db/client.server";
import { members, workshops } from "~/db/schema";
import { countryDefaults } from "~/domain/countries";
import { copyKnowledgeBase, loadTemplate, STARTER_TEMPLATE } from "~/kb/copy.server";
import { keepCurrentVersion } from "~/kb/version.server";

export type NewWorkshopInput = { name: string; country: string; labourRatePerHour: number };

export function slugify(name: string) {
  const base = name
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "") // drop the accents NFKD split off
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 40);
  return base || "workshop";
}

/**
 * A newcomer's own workshop: the country sets tax, units and currency; the creator becomes its
 * admin; the starter knowledge base is copied in. All in one transaction, so a failure leaves nothing.
 */
export async function createWorkshop(db: Db, userId: string, input: NewWorkshopInput) {
  const country = countryDefaults(input.country);
  if (!country) throw new Response(`We do not know the country code ${input.country}.`, { status: 400 });
  return db.transaction(async (tx) => {
    const slug = `${slugify(input.name)}-${crypto.randomUUID().slice(0, 6)}`;
    const [w] = await tx
      .insert(workshops)
      .values({
        slug,
        name: input.name,
        country: country.code,
        currency: country.currency,
        taxRate: country.taxRate,
        units: country.units,
        labourRatePerHour: input.labourRatePerHour,
      })
      .returning({ id: workshops.id, slug: workshops.slug });
    await tx.insert(members).values({ workshopId: w.id, userId, role: "admin", skill: "technician" });
    await copyKnowledgeBase(tx, w.id, await loadTemplate(tx, STARTER_TEMPLATE));
    await keepCurrentVersion(tx, w.id, "Starter knowledge base");
    await audit(tx, {
      workshopId: w.id,
      actorUserId: userId,
      action: "workshop.create",
      entity: "workshop",
      entityId: w.id,
      after: { ...input, slug },
    });
    return w;
  });
}
