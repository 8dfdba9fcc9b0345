import { eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms, workshops } from "~/db/schema";
import { refuse, requireId } from "~/http/errors.server";
import { speedsIn } from "~/measure";
import { kbCache } from "./cache";
import type { Knowledge } from "./model";

// The knowledge base changes rarely and is read on every re-rank: keep one copy per workshop and
// version. A change bumps workshops.kb_version, so the next read reloads.
const cache = kbCache<Knowledge>("knowledge", 100);

export async function kbVersion(db: Db, workshopId: string): Promise<number> {
  const [w] = await db.select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, workshopId));
  return w?.v ?? 0;
}

export function loadKnowledge(db: Db, workshopId: string, version: number): Promise<Knowledge> {
  return cache.get(workshopId, version, "", () => readKnowledge(db, workshopId, version));
}

async function readKnowledge(db: Db, workshopId: string, version: number): Promise<Knowledge> {
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
      .where(eq(symptoms.workshopId, workshopId)),
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
      .where(eq(causes.workshopId, workshopId)),
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
      .where(eq(checks.workshopId, workshopId)),
    db
      .select({ symptomId: symptomLinks.symptomId, causeId: symptomLinks.causeId, p: symptomLinks.p })
      .from(symptomLinks)
      .where(eq(symptomLinks.workshopId, workshopId)),
    db
      .select({ checkId: checkLinks.checkId, causeId: checkLinks.causeId, pFail: checkLinks.pFail })
      .from(checkLinks)
      .where(eq(checkLinks.workshopId, workshopId)),
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

/** One check as the plan shows it, from the cached knowledge base; another workshop's is "not found". */
export async function checkDetails(db: Db, workshopId: string, checkId: string) {
  requireId(checkId, "No such check in this workshop's knowledge base.");
  const [w] = await db
    .select({ v: workshops.kbVersion, units: workshops.units })
    .from(workshops)
    .where(eq(workshops.id, workshopId));
  const kb = await loadKnowledge(db, workshopId, w?.v ?? 0);
  const k = kb.checks.find((c) => c.id === checkId);
  if (!k) refuse(404, "No such check in this workshop's knowledge base.");
  return {
    id: k.id,
    name: k.name,
    // Road speeds in the steps are read in the workshop's units.
    instructions: (k.instructions ?? []).map((line) => speedsIn(line, w.units)),
    tools: k.tools,
    cautions: k.cautions,
    failMeans: speedsIn(k.failMeans ?? "", w.units),
  };
}
