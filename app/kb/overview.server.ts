import { asc, count, eq, sql } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms, workshops } from "~/db/schema";

/** The knowledge base at a glance: counts, and the systems with their failure-mode counts. */
export async function kbOverview(db: Db, workshopId: string) {
  // Symptoms and causes are listed in full anyway, so only checks and links need counting.
  const [[k], [sl], [cl]] = await Promise.all([
    db.select({ n: count() }).from(checks).where(eq(checks.workshopId, workshopId)),
    db.select({ n: count() }).from(symptomLinks).where(eq(symptomLinks.workshopId, workshopId)),
    db.select({ n: count() }).from(checkLinks).where(eq(checkLinks.workshopId, workshopId)),
  ]);
  const tree = await db
    .select({
      id: causes.id,
      parentId: causes.parentId,
      level: causes.level,
      name: causes.name,
      system: causes.system,
      priority: causes.priority,
      retired: sql<boolean>`${causes.retiredAt} is not null`,
    })
    .from(causes)
    .where(eq(causes.workshopId, workshopId))
    .orderBy(asc(causes.system), asc(causes.name));
  const symptomList = await db
    .select({ id: symptoms.id, name: symptoms.name, system: symptoms.system, synonyms: symptoms.synonyms })
    .from(symptoms)
    .where(eq(symptoms.workshopId, workshopId))
    .orderBy(asc(symptoms.system), asc(symptoms.name));
  return {
    counts: {
      symptoms: symptomList.length,
      causes: tree.length,
      checks: k.n,
      symptomLinks: sl.n,
      checkLinks: cl.n,
    },
    tree,
    symptoms: symptomList,
  };
}

/** How many items of each kind the workshop's knowledge base holds, and its version. */
export async function kbCounts(db: Db, workshopId: string) {
  const n = (t: typeof symptoms | typeof causes | typeof checks | typeof symptomLinks | typeof checkLinks) =>
    db
      .select({ n: count() })
      .from(t)
      .where(eq(t.workshopId, workshopId))
      .then(([r]) => r.n);
  const [s, c, k, sl, cl, [w]] = await Promise.all([
    n(symptoms),
    n(causes),
    n(checks),
    n(symptomLinks),
    n(checkLinks),
    db.select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, workshopId)),
  ]);
  return { symptoms: s, causes: c, checks: k, symptomLinks: sl, checkLinks: cl, kbVersion: w?.v ?? 0 };
}
