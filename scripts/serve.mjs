// The production server: Node's own http server in front of the React Router build.
//   node scripts/serve.mjs            (PORT, HOST from the environment; npm start runs it)
// Hashed build assets are served with a year's immutable caching, the other public files for an
// hour; everything else goes straight to React Router. Compression follows the client's
// Accept-Encoding. Compared with a general-purpose framework server, a page request here does no
// file-system look-up and no middleware chain of its own: `npm run bench` prints what that buys.
import http from "node:http";
import path from "node:path";
import { createRequestListener } from "@react-router/node";
import compression from "compression";
import morgan from "morgan";
import serveStatic from "serve-static";

const root = process.cwd();
const build = await import(path.join(root, "build/server/index.js"));
const client = path.join(root, "build/client");
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? "127.0.0.1";

// serve-static maps the whole URL path under its root, so both read from build/client.
const assets = serveStatic(client, { immutable: true, maxAge: "1y", index: false, fallthrough: false });
const files = serveStatic(client, { maxAge: "1h", index: false });
const compress = compression();
const log = process.env.RL_ACCESS_LOG === "0" ? (_req, _res, next) => next() : morgan("tiny");
// Each request's context carries the socket's address (for the sign-in rate limit, app/context.ts).
const app = createRequestListener({
  build,
  mode: process.env.NODE_ENV ?? "production",
  getLoadContext: (_request, client) => build.entry.module.requestContext(client.address ?? null),
});

// Only a path with a file extension can be a public file; pages and the API never touch the disk.
const looksLikeFile = (url) => /\.[a-z0-9]+$/i.test(url.split("?")[0]);

const server = http.createServer((req, res) => {
  log(req, res, () =>
    compress(req, res, () => {
      const url = req.url ?? "/";
      if (url.startsWith("/assets/")) return assets(req, res, (error) => notFound(res, error));
      if (looksLikeFile(url)) return files(req, res, () => app(req, res));
      return app(req, res);
    }),
  );
});

function notFound(res, error) {
  res.statusCode = error?.statusCode ?? 404;
  res.setHeader("content-type", "text/plain; charset=utf-8");
  res.end("Not found");
}

server.keepAliveTimeout = 65_000; // longer than common proxies' idle timeouts, so they close first
server.listen(port, host, () => console.log(`[ramplight] serving on http://${host}:${port}`));

let closing = false;
for (const signal of ["SIGTERM", "SIGINT"]) {
  process.on(signal, () => {
    if (closing) return;
    closing = true;
    // Finish what is in flight, then leave; a stuck connection does not hold the exit for long.
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5_000).unref();
  });
}
