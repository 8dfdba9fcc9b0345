import { dbContext } from "~/http/context";
import { methodNotAllowed } from "~/http/errors.server";
import { receiveWebhook } from "~/payments/webhook.server";
import type { Route } from "./+types/payments-webhook";

// POST /api/payments/webhook — events from the payments service, signed (app/payments/webhook.server.ts).
export async function action({ request, context }: Route.ActionArgs) {
  return receiveWebhook(context.get(dbContext), request);
}

export const loader = methodNotAllowed("POST", "The payments service POSTs its events here.");
