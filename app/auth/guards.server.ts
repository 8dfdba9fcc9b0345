import { createContext, href, redirect } from "react-router";
import type { Db } from "~/db/client.server";
import { env, isSecure } from "~/config/env.server";
import { accountForSession, type Account } from "./accounts.server";
import { can, type Permission } from "~/domain/permissions";
import { readSessionTokens } from "./session.server";
import type { Role, Skill } from "~/domain/people";

export type CurrentMember = Account & {
  memberId: string;
  workshopId: string;
  role: Role;
  skill: Skill;
  workshopName: string;
};

// Set by the signed-in layout's middleware, read by every loader and action below it.
export const memberContext = createContext<CurrentMember>();

export async function getAccount(request: Request, db: Db): Promise<Account | null> {
  return (await getSession(request, db))?.account ?? null;
}

/** The account and the token that found it: the first of the request's session cookies that is live. */
export async function getSession(
  request: Request,
  db: Db,
): Promise<{ account: Account; token: string } | null> {
  for (const token of readSessionTokens(request, isSecure(env()))) {
    const account = await accountForSession(db, token);
    if (account) return { account, token };
  }
  return null;
}

function signInRedirect(request: Request) {
  const url = new URL(request.url);
  return redirect(`${href("/sign-in")}?next=${encodeURIComponent(url.pathname + url.search)}`);
}

export async function requireAccount(request: Request, db: Db): Promise<Account> {
  const account = await getAccount(request, db);
  if (!account) throw signInRedirect(request);
  return account;
}

export function asMember(account: Account): CurrentMember {
  if (!account.memberId || !account.workshopId || !account.role) throw redirect(href("/welcome"));
  if (account.status === "suspended")
    throw new Response("Your membership of this workshop is suspended.", { status: 403 });
  return account as CurrentMember;
}

export async function requireMember(request: Request, db: Db): Promise<CurrentMember> {
  return asMember(await requireAccount(request, db));
}

export function requirePermission(member: CurrentMember, permission: Permission): CurrentMember {
  if (!can(member.role, permission))
    throw new Response(`Your role (${member.role}) cannot do this.`, { status: 403 });
  return member;
}
