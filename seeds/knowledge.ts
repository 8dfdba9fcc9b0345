import type { Db, Tx } from "../app/db/client.server";
import { copyKnowledgeBase, saveTemplate, STARTER_TEMPLATE } from "../app/kb/copy.server";
import { toDocument } from "../app/domain/knowledge-document";
import { keepCurrentVersion } from "../app/kb/version.server";
import { seedId } from "./ids";
import { starterKnowledgeBase } from "./kb";
import type { KnowledgeBaseSeed } from "./kb/types";

export const kbId = (workshopSlug: string, kind: "symptom" | "cause" | "check", key: string) =>
  seedId(`${workshopSlug}:${kind}:${key}`);

/**
 * Copies a knowledge base into one demo workshop with ids derived from its keys, so re-seeding
 * finds the same rows and a senior's curation survives.
 */
export async function seedKnowledgeBase(
  tx: Tx,
  workshop: { id: string; slug: string },
  kb: KnowledgeBaseSeed,
) {
  await copyKnowledgeBase(tx, workshop.id, kb, (kind, key) => kbId(workshop.slug, kind, key));
  await keepCurrentVersion(tx, workshop.id, "Starter knowledge base, as seeded");
}

/** The starter base as the template every workshop created in the app starts from. */
export async function seedStarterTemplate(db: Pick<Db, "insert">) {
  await saveTemplate(
    db,
    STARTER_TEMPLATE,
    toDocument("Ramplight starter knowledge base", starterKnowledgeBase),
  );
}
