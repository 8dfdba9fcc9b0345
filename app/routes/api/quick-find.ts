import { z } from "zod";
import { api } from "~/http/api.server";
import { kbVersion } from "~/kb/knowledge.server";
import { dbContext } from "~/http/context";
import { methodNotAllowed } from "~/http/errors.server";
import { ENTRY_KINDS } from "~/quick-find";
import { fleetEntries, knowledgeEntries } from "~/kb/quick-find.server";
import type { Route } from "./+types/quick-find";

const Query = z.object({
  kinds: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",") : [...ENTRY_KINDS]))
    .pipe(z.array(z.enum(ENTRY_KINDS))),
});

// GET /api/quick-find?kinds=symptom — the palette's entries, fetched the first time it opens, so
// pages do not carry them. The browser builds its own index from them (app/quick-find).
export async function loader({ request, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    const { kinds } = Query.parse(Object.fromEntries(new URL(request.url).searchParams));
    const version = await kbVersion(db, member.workshopId);
    const kb = kinds.some((k) => k === "symptom" || k === "cause" || k === "check")
      ? await knowledgeEntries(db, member.workshopId, version)
      : [];
    const fleet = kinds.some((k) => k === "vehicle" || k === "case")
      ? await fleetEntries(db, member.workshopId)
      : [];
    return { kbVersion: version, entries: [...kb, ...fleet].filter((e) => kinds.includes(e.kind)) };
  });
}

export const action = methodNotAllowed("GET", "Quick find entries are read with GET.");
