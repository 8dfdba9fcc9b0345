// Reads a workshop's knowledge-base rows into the shape the engine and the screens use. Retired
// causes, and everything under them, are left out with their links: they are no longer ranked.
import { eq } from "drizzle-orm";
import type { Db, Tx } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "~/db/schema";
import type { Knowledge } from "./model";

/**
 * The workshop's knowledge base as its rows are now, as the engine reads it. Rows come in id
 * order, so two reads of the same rows give the same document (a version's snapshot compares).
 */
export async function readLiveKnowledge(
  db: Db | Tx,
  workshopId: string,
  version: number,
): Promise<Knowledge> {
  const [s, c, k, sl, cl] = await Promise.all([
    db
      .select({
        id: symptoms.id,
        name: symptoms.name,
        leak: symptoms.leak,
        synonyms: symptoms.synonyms,
        conditions: symptoms.conditions,
        system: symptoms.system,
      })
      .from(symptoms)
      .where(eq(symptoms.workshopId, workshopId))
      .orderBy(symptoms.id),
    db
      .select({
        id: causes.id,
        parentId: causes.parentId,
        level: causes.level,
        name: causes.name,
        baseRate: causes.baseRate,
        applicability: causes.applicability,
        priority: causes.priority,
        repairMinutes: causes.repairMinutes,
        partsCost: causes.partsCost,
        retiredAt: causes.retiredAt,
      })
      .from(causes)
      .where(eq(causes.workshopId, workshopId))
      .orderBy(causes.id),
    db
      .select({
        id: checks.id,
        name: checks.name,
        minutes: checks.minutes,
        consumablesCost: checks.consumablesCost,
        access: checks.access,
        skill: checks.skill,
        falseAlarm: checks.falseAlarm,
        instructions: checks.instructions,
        tools: checks.tools,
        cautions: checks.cautions,
        resultKind: checks.resultKind,
        unit: checks.unit,
        rule: checks.rule,
        failMeans: checks.failMeans,
      })
      .from(checks)
      .where(eq(checks.workshopId, workshopId))
      .orderBy(checks.id),
    db
      .select({ symptomId: symptomLinks.symptomId, causeId: symptomLinks.causeId, p: symptomLinks.p })
      .from(symptomLinks)
      .where(eq(symptomLinks.workshopId, workshopId))
      .orderBy(symptomLinks.symptomId, symptomLinks.causeId),
    db
      .select({ checkId: checkLinks.checkId, causeId: checkLinks.causeId, pFail: checkLinks.pFail })
      .from(checkLinks)
      .where(eq(checkLinks.workshopId, workshopId))
      .orderBy(checkLinks.checkId, checkLinks.causeId),
  ]);
  // Retired causes, and everything under them, are not ranked: leave them and their links out.
  const retired = new Set(c.filter((x) => x.retiredAt).map((x) => x.id));
  for (let grew = true; grew;) {
    grew = false;
    for (const x of c)
      if (!retired.has(x.id) && x.parentId && retired.has(x.parentId)) grew = Boolean(retired.add(x.id));
  }
  const live = c.filter((x) => !retired.has(x.id)).map(({ retiredAt: _r, ...x }) => x);
  return {
    kbVersion: version,
    symptoms: s,
    causes: live,
    checks: k,
    symptomLinks: sl.filter((l) => !retired.has(l.causeId)),
    checkLinks: cl.filter((l) => !retired.has(l.causeId)),
  };
}
