import { randomBytes } from "node:crypto";
import { PassThrough } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { isbot } from "isbot";
import type { RenderToPipeableStreamOptions } from "react-dom/server";
import { renderToPipeableStream } from "react-dom/server";
import { type EntryContext, type HandleDataRequestFunction, ServerRouter } from "react-router";
import { NonceProvider } from "./components/nonce";
import { env, isSecure } from "./env.server";
import { securityHeaders } from "./security-headers.server";

// Validate the environment as the server loads this module, so a missing secret stops the start
// with a clear message instead of failing the first request.
env();

export const streamTimeout = 5_000;

export const handleDataRequest: HandleDataRequestFunction = (response) => {
  response.headers.set("X-Content-Type-Options", "nosniff");
  return response;
};

export default function handleRequest(request: Request, status: number, headers: Headers, routerContext: EntryContext) {
  const nonce = randomBytes(16).toString("base64");
  const e = env();
  securityHeaders(headers, {
    nonce,
    dev: import.meta.env.DEV,
    secure: isSecure(e),
    formTargets: [new URL(e.GITHUB_OAUTH_URL).origin],
  });
  if (request.method.toUpperCase() === "HEAD") return new Response(null, { status, headers });

  return new Promise<Response>((resolve, reject) => {
    let shellRendered = false;
    const userAgent = request.headers.get("user-agent");
    // Crawlers get the whole page at once; people get the shell as soon as it is ready.
    const readyOption: keyof RenderToPipeableStreamOptions =
      (userAgent && isbot(userAgent)) || routerContext.isSpaMode ? "onAllReady" : "onShellReady";
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(() => abort(), streamTimeout + 1000);

    const { pipe, abort } = renderToPipeableStream(
      <NonceProvider value={nonce}>
        <ServerRouter context={routerContext} url={request.url} nonce={nonce} />
      </NonceProvider>,
      {
        nonce,
        [readyOption]() {
          shellRendered = true;
          const body = new PassThrough({
            final(callback) {
              clearTimeout(timeoutId);
              timeoutId = undefined;
              callback();
            },
          });
          headers.set("Content-Type", "text/html; charset=utf-8");
          pipe(body);
          resolve(new Response(createReadableStreamFromReadable(body), { headers, status }));
        },
        onShellError: reject,
        onError(error: unknown) {
          status = 500;
          if (shellRendered) console.error(error);
        },
      },
    );
  });
}
