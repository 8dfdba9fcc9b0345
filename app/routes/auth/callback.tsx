import { data } from "react-router";
import { finishSignIn, SignInRefused } from "~/auth/sign-in.server";
import { clientAddressContext, dbContext } from "~/http/context";
import { SignInPanel } from "~/components/sign-in-panel";
import type { Route } from "./+types/callback";

export async function loader({ request, context }: Route.LoaderArgs) {
  try {
    return await finishSignIn(context.get(dbContext), request, context.get(clientAddressContext));
  } catch (error) {
    if (error instanceof SignInRefused) return data({ message: error.message }, { status: error.status });
    throw error;
  }
}

export default function Callback({ loaderData }: Route.ComponentProps) {
  return <SignInPanel message={loaderData.message} />;
}
