import { eq, sql } from "drizzle-orm";
import type { Tx } from "~/db/client.server";
import { workshops } from "~/db/schema";

/**
 * Moves the workshop's knowledge base on to its next version, in the transaction of the change:
 * every cache keyed by version (compiled models, Quick find's index) rebuilds on the next read.
 */
export async function nextKbVersion(tx: Tx, workshopId: string): Promise<number> {
  const [w] = await tx
    .update(workshops)
    .set({ kbVersion: sql`${workshops.kbVersion} + 1` })
    .where(eq(workshops.id, workshopId))
    .returning({ v: workshops.kbVersion });
  return w.v;
}
