// Signing in without a browser, through the fake provider, for tests that speak HTTP directly.
import { expect, inject } from "vitest";

const base = () => inject("baseUrl");
const provider = () => inject("fakeOAuthUrl");

/** POST /auth/github as the sign-in page's form does (an empty form, from our own origin). */
export async function startSignIn() {
  const res = await fetch(`${base()}/auth/github`, {
    method: "POST",
    redirect: "manual",
    headers: { origin: base() },
    body: new URLSearchParams(),
  });
  expect(res.status).toBe(302);
  const authorize = new URL(res.headers.get("location")!);
  expect(authorize.origin).toBe(provider());
  const stateCookie = res.headers
    .getSetCookie()
    .find((c) => c.startsWith("rl_oauth="))!
    .split(";")[0];
  return { authorize, stateCookie, state: authorize.searchParams.get("state")! };
}

/** The person picks `login` on the provider's page; the provider sends the browser back. */
export async function approve(authorize: URL, login: string) {
  const form = new URLSearchParams(authorize.searchParams);
  form.set("login", login);
  const res = await fetch(`${provider()}/login/oauth/authorize`, {
    method: "POST",
    body: form,
    redirect: "manual",
  });
  expect(res.status).toBe(302);
  return new URL(res.headers.get("location")!);
}

export const callback = (url: URL, cookie?: string) =>
  fetch(`${base()}${url.pathname}${url.search}`, { redirect: "manual", headers: cookie ? { cookie } : {} });

/** A session cookie ("rl_session=…") for a demo login, through the whole OAuth round trip. */
export async function sessionCookie(login: string, existing?: string): Promise<string> {
  const { authorize, stateCookie } = await startSignIn();
  const back = await approve(authorize, login);
  const res = await callback(back, [stateCookie, existing].filter(Boolean).join("; "));
  expect(res.status).toBe(302);
  return res.headers
    .getSetCookie()
    .find((c) => c.startsWith("rl_session="))!
    .split(";")[0];
}
