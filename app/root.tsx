import "./fonts.css";
import "./app.css";
import plex400 from "@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff2?url";
import plex500 from "@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-500-normal.woff2?url";
import plex600 from "@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff2?url";
import plex700 from "@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-700-normal.woff2?url";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import type { Route } from "./+types/root";
import { RouteErrorPage } from "./components/error-page";
import { MarkSprite } from "./components/priority";
import { useNonce } from "./components/nonce";
import { dbContext } from "~/http/context";
import { serverDb } from "./db/pool.server";
import { appOrigin } from "~/config/env.server";
import { guardRequest, withResponseHeaders } from "./http/request-guard.server";

export const middleware: Route.MiddlewareFunction[] = [
  // Every request, page or resource route: origin of writes, body limits and kinds, NUL bytes;
  // then the headers every response carries.
  async ({ request }, next) => {
    try {
      await guardRequest(request, appOrigin());
    } catch (refused) {
      // The API answers the refusal as it is; a page throws it, so its error page shows the message.
      if (refused instanceof Response && new URL(request.url).pathname.startsWith("/api/"))
        return withResponseHeaders(refused);
      throw refused;
    }
    return withResponseHeaders((await next()) as Response);
  },
  async ({ context }, next) => {
    context.set(dbContext, serverDb());
    return next();
  },
];

// The Latin faces are fetched with the document rather than when the first text needs them, so
// they are usually there for the first layout (fonts.css says why the face never swaps later).
export const links: Route.LinksFunction = () =>
  [plex400, plex500, plex600, plex700].map((href) => ({
    rel: "preload",
    href,
    as: "font",
    type: "font/woff2",
    crossOrigin: "anonymous" as const,
  }));

// Every page has a title, an error page too; routes give their own.
export function meta() {
  return [{ title: "Ramplight" }];
}

export function Layout({ children }: { children: React.ReactNode }) {
  const nonce = useNonce();
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="color-scheme" content="light dark" />
        <link rel="icon" href="/favicon.ico" />
        <Meta />
        <Links />
      </head>
      <body>
        <MarkSprite />
        {children}
        <ScrollRestoration nonce={nonce} />
        <Scripts nonce={nonce} />
      </body>
    </html>
  );
}

export default function App() {
  // One client per browser tab (and per server render), never shared between requests.
  const [queryClient] = useState(
    () => new QueryClient({ defaultOptions: { queries: { retry: 1, refetchOnWindowFocus: true } } }),
  );
  // Marks the page as live (its keys answered): browser tests wait for it before typing.
  useEffect(() => {
    document.documentElement.dataset.hydrated = "true";
  }, []);
  return (
    <QueryClientProvider client={queryClient}>
      <Outlet />
    </QueryClientProvider>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  if (import.meta.env.DEV && error instanceof Error) console.error(error);
  return <RouteErrorPage error={error} />;
}
