import { href, redirect } from "react-router";
import { getAccount } from "~/auth/guards.server";
import { ROLE_HOME } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import { SignInPanel } from "./sign-in-panel";
import type { Route } from "./+types/sign-in";

export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await getAccount(request, context.get(dbContext));
  if (account?.role) throw redirect(ROLE_HOME[account.role]);
  if (account) throw redirect(href("/welcome"));
  return null;
}

export function meta() {
  return [{ title: "Sign in — Ramplight" }];
}

export default function SignIn() {
  return <SignInPanel />;
}
