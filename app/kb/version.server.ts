// Versions of a workshop's knowledge base. Every change moves the base on to its next version and
// keeps that version whole (kb_versions), in the transaction of the change; a case ranked under
// an older version reads that version back, so it is ranked and explained exactly as it was.
import { isDeepStrictEqual } from "node:util";
import { and, desc, eq, sql } from "drizzle-orm";
import type { Db, Tx } from "~/db/client.server";
import { kbVersions, members, users, workshops } from "~/db/schema";
import type { Knowledge } from "./model";
import { readLiveKnowledge } from "./read-knowledge.server";

async function keep(tx: Tx, workshopId: string, version: number, summary: string, madeById: string | null) {
  const { kbVersion: _v, ...knowledge } = await readLiveKnowledge(tx, workshopId, version);
  await tx
    .insert(kbVersions)
    .values({ workshopId, version, summary, madeById, knowledge })
    .onConflictDoUpdate({
      target: [kbVersions.workshopId, kbVersions.version],
      set: { summary, madeById, knowledge },
    });
}

/**
 * Moves the workshop's knowledge base on to its next version, at the end of the transaction of the
 * change, and keeps the new version whole. Every cache keyed by version (compiled models, Quick
 * find's index) builds afresh on the next read; cases keep the version they were ranked with.
 */
export async function nextKbVersion(
  tx: Tx,
  workshopId: string,
  summary: string,
  madeById: string | null = null,
): Promise<number> {
  const [w] = await tx
    .update(workshops)
    .set({ kbVersion: sql`${workshops.kbVersion} + 1` })
    .where(eq(workshops.id, workshopId))
    .returning({ v: workshops.kbVersion });
  await keep(tx, workshopId, w.v, summary, madeById);
  return w.v;
}

/**
 * After the base was copied in by a seed or a new workshop: keeps the current version if it is not
 * kept yet, and makes a new version when the rows no longer match the kept one (a re-seed that
 * added starter items), so no case's version ever changes under it.
 */
export async function keepCurrentVersion(tx: Tx, workshopId: string, summary: string): Promise<number> {
  const [w] = await tx.select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, workshopId));
  const kept = await keptKnowledge(tx, workshopId, w.v);
  if (!kept) {
    await keep(tx, workshopId, w.v, summary, null);
    return w.v;
  }
  const { kbVersion: _v, ...live } = await readLiveKnowledge(tx, workshopId, w.v);
  const { kbVersion: _k, ...was } = kept;
  // jsonb keeps keys in its own order: compare as values, not as text.
  if (isDeepStrictEqual(live, was)) return w.v;
  return nextKbVersion(tx, workshopId, summary);
}

/** One kept version, as the engine reads it; null when that version was never kept. */
export async function keptKnowledge(
  db: Db | Tx,
  workshopId: string,
  version: number,
): Promise<Knowledge | null> {
  const [row] = await db
    .select({ knowledge: kbVersions.knowledge })
    .from(kbVersions)
    .where(and(eq(kbVersions.workshopId, workshopId), eq(kbVersions.version, version)));
  return row ? { kbVersion: version, ...row.knowledge } : null;
}

export type KbVersionRow = { version: number; summary: string; madeBy: string | null; createdAt: Date };

/** The newest versions first, with who made them and why. */
export function listVersions(db: Db, workshopId: string, limit = 20): Promise<KbVersionRow[]> {
  return db
    .select({
      version: kbVersions.version,
      summary: kbVersions.summary,
      madeBy: users.name,
      createdAt: kbVersions.createdAt,
    })
    .from(kbVersions)
    .leftJoin(members, eq(members.id, kbVersions.madeById))
    .leftJoin(users, eq(users.id, members.userId))
    .where(eq(kbVersions.workshopId, workshopId))
    .orderBy(desc(kbVersions.version))
    .limit(limit);
}
