import { OAuth2Client, type OAuth2Tokens } from "arctic";
import { GitHubStrategy } from "remix-auth-github";
import { z } from "zod";
import type { Env } from "~/config/env.server";

export type ProviderProfile = { providerUserId: string; login: string; name: string; email: string | null };

const UserSchema = z.object({
  id: z.union([z.number(), z.string()]),
  login: z.string(),
  name: z.string().nullable().optional(),
  email: z.string().nullable().optional(),
});
const EmailsSchema = z.array(z.object({ email: z.string(), primary: z.boolean(), verified: z.boolean() }));

/**
 * remix-auth-github's strategy with the provider's two OAuth URLs taken from configuration
 * instead of the hard-coded public ones, so the demo and the tests sign in against a local fake.
 */
class ConfigurableGitHubStrategy<U> extends GitHubStrategy<U> {
  constructor(
    options: GitHubStrategy.ConstructorOptions & { oauthBaseUrl: string },
    verify: (o: GitHubStrategy.VerifyOptions) => Promise<U>,
  ) {
    super(options, verify);
    const authorize = new URL("/login/oauth/authorize", options.oauthBaseUrl).toString();
    const token = new URL("/login/oauth/access_token", options.oauthBaseUrl).toString();
    const client = new OAuth2Client(options.clientId, options.clientSecret, options.redirectURI.toString());
    this.client = Object.assign(Object.create(Object.getPrototypeOf(this.client)), {
      createAuthorizationURL: (state: string, scopes: string[]) =>
        client.createAuthorizationURL(authorize, state, scopes),
      validateAuthorizationCode: (code: string) => client.validateAuthorizationCode(token, code, null),
      refreshAccessToken: (refresh: string) => client.refreshAccessToken(token, refresh, []),
    });
  }
}

async function fetchProfile(apiUrl: string, tokens: OAuth2Tokens): Promise<ProviderProfile> {
  const headers = { Authorization: `Bearer ${tokens.accessToken()}`, Accept: "application/json" };
  const userRes = await fetch(new URL("/user", apiUrl), { headers });
  if (!userRes.ok) throw new Error(`The sign-in provider refused the profile request (${userRes.status})`);
  const user = UserSchema.parse(await userRes.json());
  let email = user.email ?? null;
  if (!email) {
    const emailsRes = await fetch(new URL("/user/emails", apiUrl), { headers });
    if (emailsRes.ok)
      email = EmailsSchema.parse(await emailsRes.json()).find((e) => e.primary && e.verified)?.email ?? null;
  }
  return { providerUserId: String(user.id), login: user.login, name: user.name || user.login, email };
}

export function createGitHubStrategy(e: Env) {
  return new ConfigurableGitHubStrategy<ProviderProfile>(
    {
      clientId: e.GITHUB_CLIENT_ID,
      clientSecret: e.GITHUB_CLIENT_SECRET,
      redirectURI: new URL("/auth/github/callback", e.APP_URL).toString(),
      scopes: ["read:user", "user:email"],
      oauthBaseUrl: e.GITHUB_OAUTH_URL,
      cookie: {
        name: "rl_oauth",
        sameSite: "Lax",
        path: "/auth",
        ...(e.APP_URL.startsWith("https://") ? { secure: true as const } : {}),
      },
    },
    ({ tokens }) => fetchProfile(e.GITHUB_API_URL, tokens),
  );
}
