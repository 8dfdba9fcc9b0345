import { createContext, redirect } from "react-router";
import type { Db } from "~/db/client.server";
import { env, isSecure } from "~/env.server";
import { accountForSession, type Account } from "./accounts.server";
import { can, type Permission } from "./permissions";
import { readSessionTokens } from "./session.server";
import type { Role } from "../../seeds/demo/people";

export type Member = Account & { memberId: string; workshopId: string; role: Role; skill: "apprentice" | "technician" | "senior"; workshopName: string };

// Set by the signed-in layout's middleware, read by every loader and action below it.
export const memberContext = createContext<Member>();

export async function getAccount(request: Request, db: Db): Promise<Account | null> {
  return (await getSession(request, db))?.account ?? null;
}

/** The account and the token that found it: the first of the request's session cookies that is live. */
export async function getSession(request: Request, db: Db): Promise<{ account: Account; token: string } | null> {
  for (const token of readSessionTokens(request, isSecure(env()))) {
    const account = await accountForSession(db, token);
    if (account) return { account, token };
  }
  return null;
}

function signInRedirect(request: Request) {
  const url = new URL(request.url);
  return redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
}

export async function requireAccount(request: Request, db: Db): Promise<Account> {
  const account = await getAccount(request, db);
  if (!account) throw signInRedirect(request);
  return account;
}

export function asMember(account: Account): Member {
  if (!account.memberId || !account.workshopId || !account.role) throw redirect("/welcome");
  if (account.status === "suspended") throw new Response("Your membership of this workshop is suspended.", { status: 403 });
  return account as Member;
}

export async function requireMember(request: Request, db: Db): Promise<Member> {
  return asMember(await requireAccount(request, db));
}

export function requirePermission(member: Member, permission: Permission): Member {
  if (!can(member.role, permission)) throw new Response(`Your role (${member.role}) cannot do this.`, { status: 403 });
  return member;
}
