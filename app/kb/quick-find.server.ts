import { desc, eq, sql } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { cases, owners, vehicles } from "~/db/schema";
import { kbCache } from "./cache";
import { loadKnowledge } from "./knowledge.server";
import {
  caseEntry,
  entriesFromKnowledgeBase,
  getIndex,
  quickFindKey,
  vehicleEntry,
  type Entry,
  type QuickFindIndex,
} from "~/quick-find";

const entryCache = kbCache<Entry[]>("quick-find-entries", 100);

/** The knowledge-base entries, built once per workshop and knowledge-base version. */
export function knowledgeEntries(db: Db, workshopId: string, kbVersion: number): Promise<Entry[]> {
  return entryCache.get(workshopId, kbVersion, "", async () => {
    const kb = await loadKnowledge(db, workshopId, kbVersion);
    return entriesFromKnowledgeBase({ symptoms: kb.symptoms, causes: kb.causes, checks: kb.checks });
  });
}

/** Vehicles and the latest cases: they change all day, so they are read fresh (one query each). */
export async function fleetEntries(db: Db, workshopId: string): Promise<Entry[]> {
  const [v, c] = await Promise.all([
    db
      .select({
        id: vehicles.id,
        registration: vehicles.registration,
        vin: vehicles.vin,
        make: vehicles.make,
        model: vehicles.model,
        year: vehicles.year,
        ownerName: owners.name,
      })
      .from(vehicles)
      .innerJoin(owners, eq(owners.id, vehicles.ownerId))
      .where(eq(vehicles.workshopId, workshopId)),
    db
      .select({
        id: cases.id,
        number: cases.number,
        registration: vehicles.registration,
        vehicle: sql<string>`${vehicles.make} || ' ' || ${vehicles.model}`,
        complaint: cases.complaint,
      })
      .from(cases)
      .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
      .where(eq(cases.workshopId, workshopId))
      .orderBy(desc(cases.openedAt))
      .limit(500),
  ]);
  return [...v.map(vehicleEntry), ...c.map(caseEntry)];
}

export async function quickFindIndexes(
  db: Db,
  workshopId: string,
  kbVersion: number,
): Promise<QuickFindIndex[]> {
  const kbEntries = await knowledgeEntries(db, workshopId, kbVersion);
  const kb = getIndex(quickFindKey(workshopId, kbVersion), () => kbEntries);
  const fleet = await fleetEntries(db, workshopId);
  // Keyed by content size and newest ids so a new vehicle or case rebuilds only this small index.
  const stamp = `${fleet.length}:${fleet.at(-1)?.id ?? ""}:${fleet[0]?.id ?? ""}`;
  return [kb, getIndex(quickFindKey(workshopId, stamp, "fleet"), () => fleet)];
}
