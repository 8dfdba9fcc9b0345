import { redirect } from "react-router";
import { getAccount } from "~/auth/guards.server";
import { ROLE_HOME } from "~/auth/permissions";
import { dbContext } from "~/context";
import { SignInPanel } from "./sign-in-panel";
import type { Route } from "./+types/sign-in";

export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await getAccount(request, context.get(dbContext));
  if (account?.role) throw redirect(ROLE_HOME[account.role]);
  if (account) throw redirect("/welcome");
  return null;
}

export function meta() {
  return [{ title: "Sign in — Ramplight" }];
}

export default function SignIn() {
  return <SignInPanel />;
}
