import { clientAddressContext, dbContext } from "~/http/context";
import { startSignIn } from "~/auth/sign-in.server";
import type { Route } from "./+types/github";

// POST only: a sign-in starts from our own form, so a link elsewhere cannot start one.
export async function action({ request, context }: Route.ActionArgs) {
  return startSignIn(context.get(dbContext), request, context.get(clientAddressContext));
}

export function loader() {
  throw new Response("Start the sign-in from the sign-in page.", { status: 405 });
}
