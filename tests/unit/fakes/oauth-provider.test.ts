import { createHash } from "node:crypto";
import {
  CodeChallengeMethod,
  generateCodeVerifier,
  generateState,
  OAuth2Client,
  OAuth2RequestError,
} from "arctic";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { DEMO_PEOPLE } from "../../../seeds/demo/people";
import { startFakeOAuthProvider } from "../../fakes/oauth-provider";
import type { FakeOAuthProvider } from "../../fakes/oauth-provider";

const CLIENT = {
  clientId: "ramplight-test",
  clientSecret: "test-secret-1234",
  redirectUris: ["http://127.0.0.1:3999/auth/github/callback"],
};
const REDIRECT = CLIENT.redirectUris[0]!;
const basic = (id: string, secret: string) => `Basic ${Buffer.from(`${id}:${secret}`).toString("base64")}`;
const challengeOf = (verifier: string) => createHash("sha256").update(verifier).digest("base64url");

let clock = Date.now();
let fake: FakeOAuthProvider;

beforeEach(async () => {
  clock = Date.now();
  fake = await startFakeOAuthProvider({ port: 0, clients: [CLIENT], users: DEMO_PEOPLE, now: () => clock });
});
afterEach(() => fake.close());

function authorizeUrl(extra: Record<string, string> = {}): URL {
  const url = new URL(fake.endpoints.authorize);
  const params = {
    client_id: CLIENT.clientId,
    redirect_uri: REDIRECT,
    state: "st-123",
    scope: "read:user user:email",
    ...extra,
  };
  for (const [k, v] of Object.entries(params)) url.searchParams.set(k, v);
  return url;
}

async function codeFor(login: string, extra: Record<string, string> = {}): Promise<string> {
  const back = await fake.approve(authorizeUrl(extra), login);
  return back.searchParams.get("code")!;
}

function exchange(
  fields: Record<string, string>,
  auth: string | null = basic(CLIENT.clientId, CLIENT.clientSecret),
) {
  const headers: Record<string, string> = {
    "content-type": "application/x-www-form-urlencoded",
    accept: "application/json",
  };
  if (auth) headers.authorization = auth;
  return fetch(fake.endpoints.token, {
    method: "POST",
    headers,
    body: new URLSearchParams({ grant_type: "authorization_code", redirect_uri: REDIRECT, ...fields }),
  });
}

describe("fake OAuth provider: authorize page", () => {
  it("answers the health check", async () => {
    const res = await fetch(`${fake.url}/__health`);
    expect(res.status).toBe(200);
    expect(await res.text()).toBe("ok");
  });

  it("lists every demo person as a form with a button, plus Deny", async () => {
    const res = await fetch(authorizeUrl());
    const html = await res.text();
    expect(res.status).toBe(200);
    expect(html).toContain("Fake sign-in provider (local demo only)");
    for (const person of DEMO_PEOPLE) {
      expect(html).toContain(person.name);
      expect(html).toContain(`name="login" value="${person.login}"`);
    }
    expect(html).toContain("Bramblegate Motor Works");
    expect(html).toContain("no workshop yet"); // Sam Newcomer
    expect(html.match(/<form method="post"/g)).toHaveLength(DEMO_PEOPLE.length + 1);
    expect(html).toMatch(/<button type="submit">Deny<\/button>/);
  });

  it.each([
    ["an unknown client_id", { client_id: "someone-else" }, "Unknown client_id"],
    [
      "a redirect_uri that is not registered",
      { redirect_uri: "http://127.0.0.1:3999/evil" },
      "does not exactly match",
    ],
    [
      "a redirect_uri that only shares a prefix",
      { redirect_uri: `${REDIRECT}/extra` },
      "does not exactly match",
    ],
    ["no state", { state: "" }, "state is missing"],
  ])("refuses %s with an HTML 400 and no redirect", async (_label, extra, message) => {
    const res = await fetch(authorizeUrl(extra), { redirect: "manual" });
    expect(res.status).toBe(400);
    expect(res.headers.get("location")).toBeNull();
    expect(await res.text()).toContain(message);
  });

  it("escapes request values in the page", async () => {
    const html = await (await fetch(authorizeUrl({ state: '"><script>alert(1)</script>' }))).text();
    expect(html).not.toContain("<script>alert(1)");
    expect(html).toContain("&quot;&gt;&lt;script&gt;");
  });

  it("redirects a denial back with error=access_denied and the state", async () => {
    const back = await fake.deny(authorizeUrl());
    expect(back.origin + back.pathname).toBe(REDIRECT);
    expect(back.searchParams.get("error")).toBe("access_denied");
    expect(back.searchParams.get("state")).toBe("st-123");
    expect(back.searchParams.has("code")).toBe(false);
  });

  it("refuses to listen on a non-loopback address", async () => {
    await expect(
      startFakeOAuthProvider({ host: "0.0.0.0", clients: [CLIENT], users: DEMO_PEOPLE }),
    ).rejects.toThrow(/loopback/);
  });
});

describe("fake OAuth provider: code, token and user", () => {
  it("completes authorize → code → token → /user with PKCE", async () => {
    const verifier = generateCodeVerifier();
    const back = await fake.approve(
      authorizeUrl({ code_challenge: challengeOf(verifier), code_challenge_method: "S256" }),
      "ines-okafor",
    );
    expect(back.searchParams.get("state")).toBe("st-123");
    const res = await exchange({ code: back.searchParams.get("code")!, code_verifier: verifier });
    expect(res.status).toBe(200);
    const token = (await res.json()) as { access_token: string; token_type: string; scope: string };
    expect(token).toEqual({
      access_token: expect.stringMatching(/^gho_/),
      token_type: "bearer",
      scope: "read:user,user:email",
    });

    const user = await fetch(fake.endpoints.user, {
      headers: { authorization: `Bearer ${token.access_token}` },
    });
    expect(user.status).toBe(200);
    expect(await user.json()).toEqual({
      id: 910001,
      login: "ines-okafor",
      name: "Ines Okafor",
      email: "ines@bramblegate.example",
      avatar_url: `${fake.url}/avatars/ines-okafor.svg`,
    });
    const emails = await fetch(fake.endpoints.emails, {
      headers: { authorization: `token ${token.access_token}` },
    });
    expect(await emails.json()).toEqual([
      { email: "ines@bramblegate.example", primary: true, verified: true, visibility: "private" },
    ]);
    const avatar = await fetch(`${fake.url}/avatars/ines-okafor.svg`);
    expect(avatar.headers.get("content-type")).toBe("image/svg+xml");
  });

  it("accepts client credentials in a form body or a JSON body as well as Basic", async () => {
    const form = await exchange(
      { code: await codeFor("tomas-varga"), client_id: CLIENT.clientId, client_secret: CLIENT.clientSecret },
      null,
    );
    expect(form.status).toBe(200);
    const json = await fetch(fake.endpoints.token, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        grant_type: "authorization_code",
        code: await codeFor("tomas-varga"),
        redirect_uri: REDIRECT,
        client_id: CLIENT.clientId,
        client_secret: CLIENT.clientSecret,
      }),
    });
    expect(json.status).toBe(200);
    expect(((await json.json()) as { token_type: string }).token_type).toBe("bearer");
  });

  it("refuses a bad client secret with 401 invalid_client (Basic and body)", async () => {
    const code = await codeFor("priya-hale");
    const viaBasic = await exchange({ code }, basic(CLIENT.clientId, "wrong-secret"));
    expect(viaBasic.status).toBe(401);
    expect(viaBasic.headers.get("www-authenticate")).toMatch(/^Basic/);
    expect(await viaBasic.json()).toMatchObject({ error: "invalid_client" });
    const viaBody = await exchange({ code, client_id: CLIENT.clientId, client_secret: "wrong-secret" }, null);
    expect(viaBody.status).toBe(401);
    expect(await viaBody.json()).toMatchObject({ error: "invalid_client" });
  });

  it("refuses a redirect_uri that differs from the authorize one", async () => {
    const res = await exchange({
      code: await codeFor("priya-hale"),
      redirect_uri: "http://127.0.0.1:3999/other",
    });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ error: "invalid_grant" });
  });

  it("refuses a reused code and revokes the token it issued", async () => {
    const code = await codeFor("dana-reyes");
    const first = await exchange({ code });
    const { access_token } = (await first.json()) as { access_token: string };
    const again = await exchange({ code });
    expect(again.status).toBe(400);
    expect(await again.json()).toMatchObject({ error: "invalid_grant" });
    const user = await fetch(fake.endpoints.user, { headers: { authorization: `Bearer ${access_token}` } });
    expect(user.status).toBe(401);
  });

  it("refuses an expired code (after 60 s by default)", async () => {
    const code = await codeFor("kit-arbuthnot");
    clock += 60_001;
    const res = await exchange({ code });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ error: "invalid_grant", error_description: "Code expired." });
  });

  it("refuses a wrong or missing PKCE verifier", async () => {
    const challenge = challengeOf(generateCodeVerifier());
    const wrong = await exchange({
      code: await codeFor("rowan-quill", { code_challenge: challenge, code_challenge_method: "S256" }),
      code_verifier: generateCodeVerifier(),
    });
    expect(wrong.status).toBe(400);
    expect(await wrong.json()).toMatchObject({
      error: "invalid_grant",
      error_description: "PKCE verification failed.",
    });
    const missing = await exchange({
      code: await codeFor("rowan-quill", { code_challenge: challenge, code_challenge_method: "S256" }),
    });
    expect(missing.status).toBe(400);
    expect(await missing.json()).toMatchObject({ error: "invalid_grant" });
  });

  it("refuses an unknown code and an unsupported grant type", async () => {
    const unknown = await exchange({ code: "not-a-code" });
    expect(unknown.status).toBe(400);
    expect(await unknown.json()).toMatchObject({ error: "invalid_grant" });
    const refresh = await exchange({ grant_type: "refresh_token", refresh_token: "x" });
    expect(refresh.status).toBe(400);
    expect(await refresh.json()).toMatchObject({ error: "unsupported_grant_type" });
  });

  it("answers /user with 401 without a token or with an unknown one", async () => {
    const none = await fetch(fake.endpoints.user);
    expect(none.status).toBe(401);
    const unknown = await fetch(fake.endpoints.user, { headers: { authorization: "Bearer gho_nope" } });
    expect(unknown.status).toBe(401);
    expect((await fetch(fake.endpoints.emails)).status).toBe(401);
  });
});

describe("fake OAuth provider with arctic's real OAuth2Client", () => {
  it("signs in with PKCE (S256) the way a production client would", async () => {
    const client = new OAuth2Client(CLIENT.clientId, CLIENT.clientSecret, REDIRECT);
    const state = generateState();
    const verifier = generateCodeVerifier();
    const url = client.createAuthorizationURLWithPKCE(
      fake.endpoints.authorize,
      state,
      CodeChallengeMethod.S256,
      verifier,
      ["read:user", "user:email"],
    );
    const back = await fake.approve(url, "sam-newcomer");
    expect(back.searchParams.get("state")).toBe(state);
    const tokens = await client.validateAuthorizationCode(
      fake.endpoints.token,
      back.searchParams.get("code")!,
      verifier,
    );
    expect(tokens.tokenType()).toBe("bearer");
    const user = await fetch(fake.endpoints.user, {
      headers: { authorization: `Bearer ${tokens.accessToken()}` },
    });
    expect(((await user.json()) as { login: string }).login).toBe("sam-newcomer");
  });

  it("signs in without PKCE, as app/auth/github.server.ts does", async () => {
    const client = new OAuth2Client(CLIENT.clientId, CLIENT.clientSecret, REDIRECT);
    const url = client.createAuthorizationURL(fake.endpoints.authorize, generateState(), [
      "read:user",
      "user:email",
    ]);
    const back = await fake.approve(url, "ollie-mbeki");
    const tokens = await client.validateAuthorizationCode(
      fake.endpoints.token,
      back.searchParams.get("code")!,
      null,
    );
    expect(tokens.accessToken()).toMatch(/^gho_/);
  });

  it("surfaces a wrong secret as arctic's OAuth2RequestError invalid_client", async () => {
    const good = new OAuth2Client(CLIENT.clientId, CLIENT.clientSecret, REDIRECT);
    const bad = new OAuth2Client(CLIENT.clientId, "not-the-secret", REDIRECT);
    const back = await fake.approve(
      good.createAuthorizationURL(fake.endpoints.authorize, generateState(), []),
      "ines-okafor",
    );
    const error = await bad
      .validateAuthorizationCode(fake.endpoints.token, back.searchParams.get("code")!, null)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(OAuth2RequestError);
    expect((error as OAuth2RequestError).code).toBe("invalid_client");
  });
});
