// The workshop's whole knowledge base as a file of our own format (docs/knowledge-format.md).
import { memberContext, requirePermission } from "~/auth/guards.server";
import { dbContext } from "~/http/context";
import { exportKnowledge } from "~/kb/transfer.server";
import type { Route } from "./+types/export";

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const doc = await exportKnowledge(context.get(dbContext), member.workshopId);
  const day = new Date().toISOString().slice(0, 10);
  return new Response(JSON.stringify(doc, null, 2), {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="knowledge-base-${day}.json"`,
      "Cache-Control": "no-store",
    },
  });
}
