// A fake GitHub-style OAuth 2.0 provider (authorization code grant, RFC 6749 §4.1, with optional
// PKCE, RFC 7636) for the offline demo and tests. Same paths as the real provider, so the app only
// swaps the base URL. It is stricter than necessary on purpose (state required, exact redirect
// URIs, single-use codes) so that a sloppy sign-in flow fails here rather than in production.
import { createHash, randomBytes } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import type { DemoPerson } from "../../seeds/demo/people";
import { listen, readParams, redirect, safeDecode, sendJson, sendText } from "./http-util";
import { avatarSvg, renderAuthorizeError, renderConsent } from "./oauth-pages";
import type { ConsentFields } from "./oauth-pages";

export type FakeOAuthClient = { clientId: string; clientSecret: string; redirectUris: string[] };

export type FakeOAuthOptions = {
  port?: number;
  host?: string; // loopback only; defaults to 127.0.0.1
  clients: FakeOAuthClient[];
  users: DemoPerson[];
  codeTtlMs?: number; // default 60 s, like the real provider's short-lived codes
  now?: () => number; // injectable clock so tests can expire codes without waiting
};

export type FakeOAuthProvider = {
  url: string;
  port: number;
  endpoints: { authorize: string; token: string; user: string; emails: string };
  close(): Promise<void>;
  // Drive the consent screen without a browser: returns the redirect the app would receive.
  approve(authorizeUrl: string | URL, login: string): Promise<URL>;
  deny(authorizeUrl: string | URL): Promise<URL>;
};

type CodeGrant = {
  clientId: string;
  redirectUri: string;
  login: string;
  scope: string;
  challenge?: string;
  challengeMethod?: "S256" | "plain";
  expiresAt: number;
  used: boolean;
  tokens: string[]; // issued from this code, revoked if the code is replayed (RFC 6749 §4.1.2)
};

type TokenGrant = { login: string; scope: string; clientId: string };

const random = (bytes: number) => randomBytes(bytes).toString("hex");
const VERIFIER_FORMAT = /^[A-Za-z0-9\-._~]{43,128}$/;

export async function startFakeOAuthProvider(opts: FakeOAuthOptions): Promise<FakeOAuthProvider> {
  const now = opts.now ?? Date.now;
  const codeTtlMs = opts.codeTtlMs ?? 60_000;
  const codes = new Map<string, CodeGrant>();
  const tokens = new Map<string, TokenGrant>();
  const clientById = (id: string | undefined) => opts.clients.find((c) => c.clientId === id);
  const userByLogin = (login: string | undefined) => opts.users.find((u) => u.login === login);

  // Shared by GET (render) and POST (decide), because the POSTed hidden fields can be edited.
  type Checked =
    { ok: true; fields: ConsentFields } | { ok: false; page: string } | { ok: false; redirectTo: URL };
  function checkAuthorize(p: Record<string, string | undefined>): Checked {
    const client = clientById(p.client_id);
    if (!client) return { ok: false, page: `Unknown client_id "${p.client_id ?? ""}".` };
    if (!p.redirect_uri) return { ok: false, page: "redirect_uri is missing; this fake requires it." };
    if (!client.redirectUris.includes(p.redirect_uri)) {
      return {
        ok: false,
        page: `redirect_uri "${p.redirect_uri}" does not exactly match a URI registered for this client.`,
      };
    }
    // From here on the redirect URI is trusted, so protocol errors go back to the app (§4.1.2.1).
    const back = (error: string) => {
      const to = new URL(p.redirect_uri!);
      to.searchParams.set("error", error);
      if (p.state) to.searchParams.set("state", p.state);
      return { ok: false as const, redirectTo: to };
    };
    if (!p.state)
      return { ok: false, page: "state is missing: the app must send one to protect sign-in against CSRF." };
    if (p.response_type !== undefined && p.response_type !== "code") return back("unsupported_response_type");
    let method = p.code_challenge_method;
    if (p.code_challenge)
      method ??= "plain"; // RFC 7636 §4.3 default
    else if (method) return back("invalid_request");
    if (method !== undefined && method !== "S256" && method !== "plain") return back("invalid_request");
    const fields: ConsentFields = {
      client_id: client.clientId,
      redirect_uri: p.redirect_uri,
      state: p.state,
    };
    if (p.scope) fields.scope = p.scope;
    if (p.code_challenge)
      Object.assign(fields, { code_challenge: p.code_challenge, code_challenge_method: method });
    return { ok: true, fields };
  }

  function authorizePage(res: ServerResponse, url: URL): void {
    const checked = checkAuthorize(Object.fromEntries(url.searchParams));
    if (checked.ok) return renderConsent(res, checked.fields, opts.users);
    if ("page" in checked) return renderAuthorizeError(res, checked.page);
    redirect(res, checked.redirectTo.href);
  }

  async function authorizeDecision(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const form = await readParams(req);
    const checked = checkAuthorize(form);
    if (!checked.ok) {
      if ("page" in checked) return renderAuthorizeError(res, checked.page);
      return redirect(res, checked.redirectTo.href);
    }
    const f = checked.fields;
    const back = new URL(f.redirect_uri);
    if (form.decision === "deny") {
      back.searchParams.set("error", "access_denied");
    } else {
      const user = userByLogin(form.login);
      if (!user) return renderAuthorizeError(res, `Unknown demo person "${form.login ?? ""}".`);
      const code = random(20);
      codes.set(code, {
        clientId: f.client_id,
        redirectUri: f.redirect_uri,
        login: user.login,
        scope: f.scope ?? "",
        challenge: f.code_challenge,
        challengeMethod: f.code_challenge_method as CodeGrant["challengeMethod"],
        expiresAt: now() + codeTtlMs,
        used: false,
        tokens: [],
      });
      back.searchParams.set("code", code);
    }
    back.searchParams.set("state", f.state);
    redirect(res, back.href);
  }

  // Client authentication per RFC 6749 §2.3.1: HTTP Basic (what arctic sends) or body fields.
  function authenticateClient(req: IncomingMessage, body: Record<string, string>) {
    const header = req.headers.authorization ?? "";
    const basic = /^Basic\s+(\S+)$/i.exec(header);
    if (basic) {
      const decoded = Buffer.from(basic[1]!, "base64").toString("utf8");
      const colon = decoded.indexOf(":");
      const id = decoded.slice(0, colon);
      const secret = decoded.slice(colon + 1);
      const client = clientById(id) ?? clientById(safeDecode(id));
      const ok =
        colon > 0 && client && (client.clientSecret === secret || client.clientSecret === safeDecode(secret));
      return { client: ok ? client : undefined, usedBasic: true };
    }
    const client = clientById(body.client_id);
    return {
      client: client && client.clientSecret === body.client_secret ? client : undefined,
      usedBasic: false,
    };
  }

  async function accessToken(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const body = await readParams(req);
    const { client, usedBasic } = authenticateClient(req, body);
    if (!client) {
      const headers: Record<string, string> = usedBasic
        ? { "www-authenticate": 'Basic realm="fake-oauth"' }
        : {};
      return sendJson(
        res,
        401,
        { error: "invalid_client", error_description: "Unknown client or wrong secret." },
        headers,
      );
    }
    if (body.grant_type !== "authorization_code") {
      return sendJson(res, 400, {
        error: "unsupported_grant_type",
        error_description: "Only authorization_code is supported.",
      });
    }
    const grant = body.code ? codes.get(body.code) : undefined;
    const refuse = (why: string) => sendJson(res, 400, { error: "invalid_grant", error_description: why });
    if (!grant || grant.clientId !== client.clientId) return refuse("Unknown code.");
    if (grant.used) {
      for (const t of grant.tokens) tokens.delete(t);
      return refuse("Code already used; tokens issued from it are revoked.");
    }
    // Burn the code on the first attempt, even a failed one, so a verifier cannot be guessed.
    grant.used = true;
    if (now() >= grant.expiresAt) return refuse("Code expired.");
    if (body.redirect_uri !== grant.redirectUri)
      return refuse("redirect_uri differs from the one used to authorize.");
    if (grant.challenge !== undefined) {
      const verifier = body.code_verifier ?? "";
      if (!VERIFIER_FORMAT.test(verifier)) return refuse("code_verifier missing or malformed.");
      const computed =
        grant.challengeMethod === "S256"
          ? createHash("sha256").update(verifier).digest("base64url")
          : verifier;
      if (computed !== grant.challenge) return refuse("PKCE verification failed.");
    } else if (body.code_verifier !== undefined) {
      return refuse("code_verifier sent, but no code_challenge was sent to authorize.");
    }
    const token = `gho_${random(18)}`;
    tokens.set(token, { login: grant.login, scope: grant.scope, clientId: client.clientId });
    grant.tokens.push(token);
    // GitHub reports granted scopes comma-separated; mirror it so the app handles the real format.
    const scope = grant.scope
      .split(/[\s,]+/)
      .filter(Boolean)
      .join(",");
    sendJson(res, 200, { access_token: token, token_type: "bearer", scope });
  }

  function userFor(req: IncomingMessage, res: ServerResponse): DemoPerson | undefined {
    const match = /^(?:Bearer|token)\s+(\S+)$/i.exec(req.headers.authorization ?? "");
    if (!match) {
      sendJson(res, 401, { message: "Requires authentication" });
      return undefined;
    }
    const grant = tokens.get(match[1]!);
    const user = grant && userByLogin(grant.login);
    if (!user) sendJson(res, 401, { message: "Bad credentials" });
    return user;
  }

  const handle = async (req: IncomingMessage, res: ServerResponse): Promise<void> => {
    const url = new URL(req.url ?? "/", base);
    const route = `${req.method} ${url.pathname}`;
    if (route === "GET /__health") return sendText(res, 200, "ok");
    // Browsers ask every origin for an icon; answer so the sign-in page logs no 404.
    if (route === "GET /favicon.ico") {
      res.writeHead(204).end();
      return;
    }
    if (route === "GET /login/oauth/authorize") return authorizePage(res, url);
    if (route === "POST /login/oauth/authorize") return authorizeDecision(req, res);
    if (route === "POST /login/oauth/access_token") return accessToken(req, res);
    if (route === "GET /user") {
      const u = userFor(req, res);
      if (u)
        sendJson(res, 200, {
          id: u.githubId,
          login: u.login,
          name: u.name,
          email: u.email,
          avatar_url: `${base}/avatars/${u.login}.svg`,
        });
      return;
    }
    if (route === "GET /user/emails") {
      const u = userFor(req, res);
      if (u) sendJson(res, 200, [{ email: u.email, primary: true, verified: true, visibility: "private" }]);
      return;
    }
    const avatar = /^GET \/avatars\/([^/]+)\.svg$/.exec(route);
    const person = avatar && userByLogin(avatar[1]);
    if (person) {
      res.writeHead(200, { "content-type": "image/svg+xml" });
      return void res.end(avatarSvg(person));
    }
    sendJson(res, 404, { message: "Not Found" });
  };

  let base = "http://127.0.0.1";
  const server = await listen(handle, opts.port, opts.host);
  base = server.url;
  const endpoints = {
    authorize: `${base}/login/oauth/authorize`,
    token: `${base}/login/oauth/access_token`,
    user: `${base}/user`,
    emails: `${base}/user/emails`,
  };

  async function decide(authorizeUrl: string | URL, extra: Record<string, string>): Promise<URL> {
    const form = new URLSearchParams(new URL(authorizeUrl).searchParams);
    for (const [k, v] of Object.entries(extra)) form.set(k, v);
    const res = await fetch(endpoints.authorize, { method: "POST", body: form, redirect: "manual" });
    const location = res.headers.get("location");
    if (res.status !== 302 || !location)
      throw new Error(`fake provider refused (${res.status}): ${await res.text()}`);
    return new URL(location);
  }

  return {
    url: base,
    port: server.port,
    endpoints,
    close: server.close,
    approve: (authorizeUrl, login) => decide(authorizeUrl, { login }),
    deny: (authorizeUrl) => decide(authorizeUrl, { decision: "deny" }),
  };
}
