import { methodNotAllowed } from "~/http/errors.server";
import { z } from "zod";
import { api } from "~/http/api.server";
import { kbVersion } from "~/kb/knowledge.server";
import { dbContext } from "~/http/context";
import { ENTRY_KINDS, search } from "~/quick-find";
import { quickFindIndexes } from "~/kb/quick-find.server";
import type { Route } from "./+types/search";

const Query = z.object({
  q: z.string().max(80, "Search at most 80 characters").default(""),
  kinds: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",") : undefined))
    .pipe(z.array(z.enum(ENTRY_KINDS)).optional()),
  limit: z.coerce.number().int().min(1).max(50).default(8),
});

// GET /api/search?q=…&kinds=symptom,check — Quick find on the server, grouped by kind.
export async function loader({ request, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    const q = Query.parse(Object.fromEntries(new URL(request.url).searchParams));
    const indexes = await quickFindIndexes(db, member.workshopId, await kbVersion(db, member.workshopId));
    return { query: q.q, groups: search(indexes, q.q, { kinds: q.kinds, limit: q.limit }) };
  });
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
