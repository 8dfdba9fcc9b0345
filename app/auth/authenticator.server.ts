import { Authenticator } from "remix-auth";
import { env } from "~/config/env.server";
import { createGitHubStrategy, type ProviderProfile } from "./github.server";

let authenticator: Authenticator<ProviderProfile> | undefined;

/** Built on first use from the validated environment; remix-auth 4 holds only the strategy. */
export function getAuthenticator() {
  authenticator ??= new Authenticator<ProviderProfile>().use(createGitHubStrategy(env()));
  return authenticator;
}
