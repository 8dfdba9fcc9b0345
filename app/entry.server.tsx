import { randomBytes } from "node:crypto";
import { Writable } from "node:stream";
import { renderToPipeableStream } from "react-dom/server";
import {
  type EntryContext,
  type HandleDataRequestFunction,
  type HandleErrorFunction,
  ServerRouter,
} from "react-router";
import { NonceProvider } from "./components/nonce";
import { env, isSecure, paymentsPageOrigin } from "~/config/env.server";
import { securityHeaders } from "~/http/security-headers.server";

// Validate the environment as the server loads this module, so a missing secret stops the start
// with a clear message instead of failing the first request.
env();

export const streamTimeout = 5_000;

// The production server (scripts/serve.mjs) builds each request's context with this, so the
// caller's socket address reaches the sign-in rate limit.
export { requestContext } from "~/http/context";
// …and closes the database pool on its way out; tests running the build close it the same way.
export { closeServerDb } from "./db/pool.server";
// …and runs the outbox's delivery jobs beside the requests, stopping them before the pool closes.
export { startMailWorker, stopMailWorker } from "./mail/worker.server";

/**
 * Errors the framework reports. A write from another origin that React Router's own check refuses
 * (before our middleware sees it) is a refusal, not a fault: it answers 400 and is not logged as one.
 */
export const handleError: HandleErrorFunction = (error, { request }) => {
  if (request.signal.aborted) return;
  const foreign = request.method !== "GET" && request.headers.get("origin") !== new URL(env().APP_URL).origin;
  // Documents report the check's own message; data requests a plain "Bad Request".
  if (
    foreign &&
    error instanceof Error &&
    /origin does not match `origin` header|^Bad Request$/.test(error.message)
  )
    return;
  console.error(error);
};

export const handleDataRequest: HandleDataRequestFunction = (response) => {
  response.headers.set("X-Content-Type-Options", "nosniff");
  return response;
};

export default function handleRequest(
  request: Request,
  status: number,
  headers: Headers,
  routerContext: EntryContext,
) {
  const nonce = randomBytes(16).toString("base64");
  const e = env();
  securityHeaders(headers, {
    nonce,
    dev: import.meta.env.DEV,
    secure: isSecure(e),
    // The sign-in provider, and the payment service's page the owner's Pay form is sent on to
    // (form-action also governs where a form's redirect may go).
    formTargets: [new URL(e.GITHUB_OAUTH_URL).origin, paymentsPageOrigin()],
  });
  headers.set("Content-Type", "text/html; charset=utf-8");
  if (request.method.toUpperCase() === "HEAD") return new Response(null, { status, headers });

  // The whole document is rendered before it is sent, in one body. Our loaders defer nothing, so
  // streaming the shell early would win no time, while sending a page in React's small chunks
  // through Node and web streams cost more than rendering it: 10-20 % more case-page throughput
  // in an A/B run on a 2-core machine.
  return new Promise<Response>((resolve, reject) => {
    const chunks: Buffer[] = [];
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(
      () => abort(),
      streamTimeout + 1000,
    );
    const sink = new Writable({
      write(chunk: Buffer, _encoding, callback) {
        chunks.push(chunk);
        callback();
      },
      final(callback) {
        clearTimeout(timeoutId);
        timeoutId = undefined;
        resolve(new Response(Buffer.concat(chunks), { headers, status }));
        callback();
      },
    });
    // A caller who went away does not wait for a full render.
    request.signal.addEventListener("abort", () => abort(), { once: true });
    const { pipe, abort } = renderToPipeableStream(
      <NonceProvider value={nonce}>
        <ServerRouter context={routerContext} url={request.url} nonce={nonce} />
      </NonceProvider>,
      {
        nonce,
        onAllReady() {
          pipe(sink);
        },
        onShellError(error: unknown) {
          clearTimeout(timeoutId);
          reject(error);
        },
        // The framework's own template marks the response 500 for an error while rendering.
        onError(error: unknown) {
          status = 500;
          console.error(error);
        },
      },
    );
  });
}
