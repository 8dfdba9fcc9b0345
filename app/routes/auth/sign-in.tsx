import { data, href, redirect } from "react-router";
import { tryAgainAt } from "~/auth/rate-limit.server";
import { getAccount } from "~/auth/guards.server";
import { ROLE_HOME } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import { SignInPanel } from "~/components/sign-in-panel";
import type { Route } from "./+types/sign-in";

export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await getAccount(request, context.get(dbContext));
  if (account?.role) throw redirect(ROLE_HOME[account.role]);
  if (account) throw redirect(href("/welcome"));
  // A sign-in refused elsewhere (the landing page's button) arrives here with the time to wait.
  const retry = new Date(new URL(request.url).searchParams.get("retry") ?? "");
  if (!Number.isNaN(retry.getTime()) && retry.getTime() > Date.now())
    return data({ message: `Too many sign-ins from this network. ${tryAgainAt(retry)}` }, { status: 429 });
  return { message: undefined };
}

export function meta() {
  return [{ title: "Sign in — Ramplight" }];
}

export default function SignIn({ loaderData }: Route.ComponentProps) {
  return <SignInPanel message={loaderData.message} />;
}
