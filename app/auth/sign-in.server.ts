import { redirect } from "react-router";
import { audit } from "~/audit/write.server";
import type { Db } from "~/db/client.server";
import { env, isSecure } from "~/config/env.server";
import { loadAccount, signInFromProfile } from "./accounts.server";
import { getAuthenticator } from "./authenticator.server";
import { ROLE_HOME } from "~/domain/permissions";
import { clientIp, countSignIn, tryAgainAt, type LimitAnswer } from "./rate-limit.server";
import { createSession, readSessionTokens, revokeSession, sessionCookie } from "./session.server";

/** Step one: send the browser to the provider (remix-auth throws the redirect with the state cookie). */
export async function startSignIn(db: Db, request: Request, socketAddress: string | null) {
  const e = env();
  const ip = await countSignIn(
    db,
    `ip:${clientIp(request, socketAddress)}`,
    e.SIGN_IN_LIMIT_PER_IP,
    e.SIGN_IN_WINDOW_S,
  );
  // The button may sit on any page (the landing page has one): the refusal goes to the sign-in
  // page, which says it and names the time, rather than to an error page or nowhere.
  if (!ip.ok) throw redirect(`/sign-in?retry=${encodeURIComponent(ip.retryAt.toISOString())}`);
  return getAuthenticator().authenticate("github", request);
}

export class SignInRefused extends Error {
  constructor(
    message: string,
    readonly status = 400,
  ) {
    super(message);
  }
}

function refuseWhenFull(answer: LimitAnswer) {
  if (!answer.ok) throw new SignInRefused(`Too many sign-in attempts. ${tryAgainAt(answer.retryAt)}`, 429);
}

/** Step two: the provider sent the browser back. Verify state and code, then open a fresh session. */
export async function finishSignIn(db: Db, request: Request, socketAddress: string | null) {
  const e = env();
  refuseWhenFull(
    await countSignIn(
      db,
      `ip:${clientIp(request, socketAddress)}`,
      e.SIGN_IN_LIMIT_PER_IP,
      e.SIGN_IN_WINDOW_S,
    ),
  );
  // The strategy would treat a callback without its code and state as the start of a new sign-in
  // and redirect to the provider; a return address opened by hand, or forged, is refused instead.
  const params = new URL(request.url).searchParams;
  if (params.get("error")) throw new SignInRefused(describe(new Error(params.get("error")!)));
  if (!params.get("code") || !params.get("state")) {
    throw new SignInRefused(
      "This sign-in return address is incomplete (no one-time code or state). Start the sign-in again from this page.",
    );
  }
  let profile;
  try {
    profile = await getAuthenticator().authenticate("github", request);
  } catch (error) {
    if (error instanceof Response) throw error;
    throw new SignInRefused(describe(error));
  }
  refuseWhenFull(
    await countSignIn(
      db,
      `account:github:${profile.providerUserId}`,
      e.SIGN_IN_LIMIT_PER_ACCOUNT,
      e.SIGN_IN_WINDOW_S,
    ),
  );
  const userId = await signInFromProfile(db, profile);
  // The one-time OAuth state cookie has done its job.
  const clear = `rl_oauth=; Path=/auth; Max-Age=0; HttpOnly; SameSite=Lax${isSecure(e) ? "; Secure" : ""}`;
  return openSession(db, request, userId, { login: profile.login }, [clear]);
}

/**
 * The end of every way of signing in: drop whatever session the browser had (the id always changes
 * at sign-in), open a fresh one, audit it, and send the person to their role's home.
 */
export async function openSession(
  db: Db,
  request: Request,
  userId: string,
  detail: Record<string, string>,
  extraCookies: string[] = [],
) {
  const e = env();
  const account = await loadAccount(db, userId);
  // Whatever session the browser had is dropped: the id always changes at sign-in.
  for (const old of readSessionTokens(request, isSecure(e))) await revokeSession(db, old);
  const token = await createSession(db, userId, request.headers.get("user-agent"));
  await audit(db, {
    workshopId: account?.workshopId ?? null,
    actorUserId: userId,
    action: "auth.sign_in",
    entity: "user",
    entityId: userId,
    after: detail,
  });
  const home = account?.role ? ROLE_HOME[account.role] : "/welcome";
  const headers = new Headers();
  headers.append("Set-Cookie", sessionCookie(token, isSecure(e)));
  for (const c of extraCookies) headers.append("Set-Cookie", c);
  return redirect(home, { headers });
}

function describe(error: unknown): string {
  const text = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
  if (/access_denied/i.test(text)) return "The sign-in was cancelled at the provider.";
  if (/state/i.test(text))
    return "The sign-in could not be matched to this browser (the security check on its state failed). Start the sign-in again from this page.";
  if (/code/i.test(text) || /invalid_grant|Unexpected/i.test(text))
    return "The provider did not accept this sign-in (the one-time code was missing, used already or expired). Start again.";
  return "The sign-in did not complete. Start again.";
}
