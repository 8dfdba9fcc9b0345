import { describe, expect, it } from "vitest";
import { inject } from "vitest";
import { approve, callback, sessionCookie, startSignIn } from "./http-session";

// The sign-in's security checks against the running server and the fake provider, without a
// browser: every refusal must be a clear page with a 4xx, never a signed-in session.
const base = inject("baseUrl");
const provider = inject("fakeOAuthUrl");

describe("OAuth refusals (OWASP ASVS 5.0 V10.2.1)", () => {
  it("signs in when state and code are right, with HttpOnly SameSite cookies", async () => {
    const { authorize, stateCookie } = await startSignIn();
    const back = await approve(authorize, "priya-hale");
    const res = await callback(back, stateCookie);
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe("/board");
    const session = res.headers.getSetCookie().find((c) => c.startsWith("rl_session="))!;
    expect(session).toMatch(/HttpOnly/);
    expect(session).toMatch(/SameSite=Lax/);
  });

  it("refuses a callback with a forged state", async () => {
    const { authorize, stateCookie } = await startSignIn();
    const back = await approve(authorize, "priya-hale");
    back.searchParams.set("state", "forged-state-value");
    const res = await callback(back, stateCookie);
    expect(res.status).toBe(400);
    expect(await res.text()).toContain("security check on its state failed");
    expect(
      res.headers.getSetCookie().some((c) => c.startsWith("rl_session=") && !c.includes("Max-Age=0")),
    ).toBe(false);
  });

  it("refuses a callback whose state cookie is missing", async () => {
    const { authorize } = await startSignIn();
    const back = await approve(authorize, "priya-hale");
    const res = await callback(back);
    expect(res.status).toBe(400);
    expect(await res.text()).toContain("could not be matched to this browser");
  });

  it("refuses a return address without its code or state, instead of starting a new sign-in", async () => {
    for (const search of ["", "?code=abc", "?state=xyz"]) {
      const res = await callback(new URL(`${base}/auth/github/callback${search}`));
      expect(res.status, search).toBe(400);
      expect(res.headers.get("location"), search).toBeNull();
      expect(await res.text(), search).toContain("return address is incomplete");
      expect(
        res.headers.getSetCookie().some((c) => c.startsWith("rl_session=")),
        search,
      ).toBe(false);
    }
  });

  it("refuses a replayed code", async () => {
    const { authorize, stateCookie } = await startSignIn();
    const back = await approve(authorize, "tomas-varga");
    expect((await callback(back, stateCookie)).status).toBe(302);
    const replay = await callback(back, stateCookie);
    expect(replay.status).toBe(400);
    expect(await replay.text()).toContain("did not accept this sign-in");
  });

  it("shows the provider's refusal of a wrong redirect URI, with no redirect", async () => {
    const { authorize } = await startSignIn();
    authorize.searchParams.set("redirect_uri", "http://evil.example/steal");
    const res = await fetch(authorize, { redirect: "manual" });
    expect(res.status).toBe(400);
    expect(res.headers.get("location")).toBeNull();
  });

  it("tells the person when they cancelled at the provider", async () => {
    const { authorize, stateCookie } = await startSignIn();
    const form = new URLSearchParams(authorize.searchParams);
    form.set("decision", "deny");
    const denied = await fetch(`${provider}/login/oauth/authorize`, {
      method: "POST",
      body: form,
      redirect: "manual",
    });
    const res = await callback(new URL(denied.headers.get("location")!), stateCookie);
    expect(res.status).toBe(400);
    expect(await res.text()).toContain("cancelled");
  });
});

describe("session cookie at the server (OWASP ASVS 5.0 V7.2.4)", () => {
  const signIn = sessionCookie;
  const board = (cookie: string) => fetch(`${base}/board`, { redirect: "manual", headers: { cookie } });

  it("replaces whatever session the browser brought to sign-in, and revokes it (fixation)", async () => {
    const first = await signIn("priya-hale");
    expect((await board(first)).status).toBe(200);
    const second = await signIn("priya-hale", first);
    expect(second).not.toBe(first);
    expect((await board(second)).status).toBe(200);
    const stale = await board(first);
    expect(stale.status).toBe(302);
    expect(stale.headers.get("location")).toMatch(/^\/sign-in/);
  });

  it("treats a tampered cookie as signed out", async () => {
    const cookie = await signIn("priya-hale");
    const last = cookie.at(-1) === "A" ? "B" : "A";
    const res = await board(cookie.slice(0, -1) + last);
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toMatch(/^\/sign-in/);
  });

  it("signs out everywhere: every session of the person stops working", async () => {
    const a = await signIn("tomas-varga");
    const b = await signIn("tomas-varga");
    const out = await fetch(`${base}/sign-out`, {
      method: "POST",
      redirect: "manual",
      headers: { cookie: a, origin: base, "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ scope: "everywhere" }),
    });
    expect(out.status).toBe(302);
    expect((await board(a)).status).toBe(302);
    expect((await board(b)).status).toBe(302);
  });
});
