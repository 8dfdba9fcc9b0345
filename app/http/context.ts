import { createContext, RouterContextProvider } from "react-router";
import type { Db } from "~/db/client.server";

// What every loader and action can reach through the router context.
export const dbContext = createContext<Db>();

// The caller's address as the server's socket saw it (null when the server does not say, as under
// the dev server). Set by scripts/serve.mjs through requestContext below.
export const clientAddressContext = createContext<string | null>(null);

/** The context a request starts with: what the server knows about the connection. */
export function requestContext(clientAddress: string | null): RouterContextProvider {
  const context = new RouterContextProvider();
  context.set(clientAddressContext, clientAddress);
  return context;
}
