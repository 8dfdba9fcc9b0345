import { eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { workshops } from "~/db/schema";
import { refuse, requireId } from "~/http/errors.server";
import { speedsIn } from "~/measure";
import { kbCache } from "./cache";
import type { Knowledge } from "./model";
import { readLiveKnowledge } from "./read-knowledge.server";
import { keptKnowledge } from "./version.server";

// The knowledge base changes rarely and is read on every re-rank: keep one copy per workshop and
// version. Cases of one workshop may be ranked under a few versions at once; each is its own entry.
const cache = kbCache<Knowledge>("knowledge", 40);

export async function kbVersion(db: Db, workshopId: string): Promise<number> {
  const [w] = await db.select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, workshopId));
  return w?.v ?? 0;
}

/**
 * One version of the workshop's knowledge base, as kept when it was made. A version that was never
 * kept (a base from before versions were kept) is stood in for by the rows as they are now, and
 * the answer's kbVersion says which version it really is.
 */
export function loadKnowledge(db: Db, workshopId: string, version: number): Promise<Knowledge> {
  return cache.get(workshopId, version, "", async () => {
    const kept = await keptKnowledge(db, workshopId, version);
    return kept ?? readLiveKnowledge(db, workshopId, await kbVersion(db, workshopId));
  });
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
