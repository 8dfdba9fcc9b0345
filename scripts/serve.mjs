// The production server: Node's own http server in front of the React Router build.
//   node scripts/serve.mjs                      PORT and HOST from the environment; npm start runs it
//   WEB_CONCURRENCY=4 node scripts/serve.mjs    four worker processes sharing the port (node:cluster);
//                                               they keep no state of their own (docs/architecture.md)
// Hashed build assets are served with a year's immutable caching, the other public files for an
// hour; everything else goes straight to React Router. Compression follows the client's
// Accept-Encoding. Compared with a general-purpose framework server, a page request here does no
// file-system look-up and no middleware chain of its own: `npm run bench` prints what that buys.
import cluster from "node:cluster";
import { readdirSync, readFileSync } from "node:fs";
import http from "node:http";
import path from "node:path";
import zlib from "node:zlib";
import { createRequestListener } from "@react-router/node";
import compression from "compression";
import morgan from "morgan";
import serveStatic from "serve-static";

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? "127.0.0.1"; // loopback unless told: set HOST=0.0.0.0 in a container
const workers = Math.max(1, Number(process.env.WEB_CONCURRENCY ?? 1) || 1);

if (workers > 1 && cluster.isPrimary) supervise();
else await serve();

/**
 * Starts the workers and replaces one that dies, waiting longer after each recent death; when they
 * keep dying (a missing secret or build stops every start), it gives up with an error instead of
 * looping. SIGTERM or SIGINT stops them all.
 */
function supervise() {
  let stopping = false;
  let alive = 0;
  const deaths = [];
  for (let i = 0; i < workers; i++) cluster.fork();
  cluster.on(
    "online",
    () =>
      ++alive === workers &&
      console.log(`[ramplight] serving on http://${host}:${port} with ${workers} worker processes`),
  );
  cluster.on("exit", (worker, code, signal) => {
    if (stopping) return;
    const now = Date.now();
    deaths.push(now);
    while (deaths[0] < now - 60_000) deaths.shift();
    if (deaths.length > workers * 3) {
      console.error(`[ramplight] ${deaths.length} worker processes died within a minute; stopping`);
      process.exit(1);
    }
    const wait = Math.min(30_000, 250 * 2 ** (deaths.length - 1));
    console.error(
      `[ramplight] worker ${worker.process.pid} exited (${signal ?? code}); another starts in ${wait} ms`,
    );
    setTimeout(() => !stopping && cluster.fork(), wait);
  });
  for (const signal of ["SIGTERM", "SIGINT"]) {
    process.on(signal, () => {
      if (stopping) return;
      stopping = true;
      const running = Object.values(cluster.workers ?? {}).filter(Boolean);
      let left = running.length;
      if (left === 0) process.exit(0);
      for (const worker of running) {
        worker.once("exit", () => --left === 0 && process.exit(0));
        worker.kill("SIGTERM");
      }
      // Workers finish in-flight requests within 5 s; past 6 s the stop was forced.
      setTimeout(() => process.exit(1), 6_000).unref();
    });
  }
}

async function serve() {
  const root = process.cwd();
  const dir = path.resolve(root, process.env.RL_BUILD_DIR ?? "build");
  const build = await import(path.join(dir, "server/index.js"));
  const client = path.join(dir, "client");

  // serve-static maps the whole URL path under its root, so both read from the client build.
  const assets = serveStatic(client, { immutable: true, maxAge: "1y", index: false, fallthrough: false });
  const files = serveStatic(client, { maxAge: "1h", index: false });
  const compress = compression();
  const brotli = precompressAssets(path.join(client, "assets"));
  // The path without its query: sign-in callbacks carry one-time codes there.
  morgan.token("path", (req) => (req.url ?? "/").split("?")[0]);
  const log =
    process.env.RL_ACCESS_LOG === "0"
      ? (_req, _res, next) => next()
      : morgan(":method :path :status :res[content-length] - :response-time ms");
  // Each request's context carries the socket's address (for the sign-in rate limit, app/context.ts).
  const app = createRequestListener({
    build,
    mode: process.env.NODE_ENV ?? "production",
    getLoadContext: (_request, client) => build.entry.module.requestContext(client.address ?? null),
  });
  // Only a path with a file extension can be a public file; pages, their data requests (".data")
  // and the API never touch the disk.
  const looksLikeFile = (url) => {
    const p = url.split("?")[0];
    return !p.endsWith(".data") && /\.[a-z0-9]+$/i.test(p);
  };

  const server = http.createServer((req, res) => {
    log(req, res, () =>
      compress(req, res, () => {
        const url = req.url ?? "/";
        // A path that starts with two slashes (or a backslash, which URL parsing treats as one)
        // would be read as //host/path: the router would see a request URL on a host of the
        // caller's choosing. Pages move to the one-slash path; writes are refused.
        if (/^[/\\]{2}/.test(url)) return doubleSlash(req, res, url);
        if (url.startsWith("/assets/")) {
          const br = brotli.get(url.split("?")[0]);
          if (br && /\bbr\b/.test(String(req.headers["accept-encoding"] ?? "")))
            return sendPrecompressed(res, br);
          return assets(req, res, (error) => notFound(res, error));
        }
        if (looksLikeFile(url)) return files(req, res, () => app(req, res));
        return app(req, res);
      }),
    );
  });
  server.keepAliveTimeout = 65_000; // longer than common proxies' idle timeouts, so they close first
  server.listen(port, host, () => {
    if (cluster.isPrimary) console.log(`[ramplight] serving on http://${host}:${port}`);
  });
  // The outbox's deliveries run in every server process (pg-boss shares the jobs out). A worker
  // that cannot start leaves the pages working and says why; queued mail waits for the next start.
  const mailWorker = build.entry.module
    .startMailWorker()
    .catch((error) => console.error(`[ramplight] mail delivery did not start: ${error.message}`));

  let closing = false;
  for (const signal of ["SIGTERM", "SIGINT"]) {
    process.on(signal, () => {
      if (closing) return;
      closing = true;
      // Finish what is in flight, let the mail job in hand finish, close the database pool, then
      // leave; a stuck connection does not hold the exit for long.
      server.close(
        () =>
          void mailWorker
            .then(() => build.entry.module.stopMailWorker())
            .catch((error) =>
              console.error(`[ramplight] mail delivery did not stop cleanly: ${error.message}`),
            )
            .then(() => build.entry.module.closeServerDb())
            .finally(() => process.exit(0)),
      );
      server.closeIdleConnections();
      setTimeout(() => process.exit(0), 5_000).unref();
    });
  }
}

// Hashed scripts and styles never change, so each is compressed once, at start, with Brotli's
// best setting (about a fifth smaller than on-the-fly compression); other clients get gzip per request.
function precompressAssets(dir) {
  const TYPES = {
    ".js": "text/javascript; charset=utf-8",
    ".css": "text/css; charset=utf-8",
    ".svg": "image/svg+xml",
    ".json": "application/json",
  };
  const out = new Map();
  let files = [];
  try {
    files = readdirSync(dir);
  } catch {
    return out;
  }
  for (const name of files) {
    const type = TYPES[path.extname(name)];
    if (!type) continue;
    const body = zlib.brotliCompressSync(readFileSync(path.join(dir, name)), {
      params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11 },
    });
    out.set(`/assets/${name}`, { body, type });
  }
  return out;
}

function sendPrecompressed(res, { body, type }) {
  res.statusCode = 200;
  res.setHeader("content-type", type);
  res.setHeader("content-encoding", "br");
  res.setHeader("content-length", body.length);
  res.setHeader("cache-control", "public, max-age=31536000, immutable");
  res.setHeader("vary", "Accept-Encoding");
  res.end(body);
}

function doubleSlash(req, res, url) {
  const method = (req.method ?? "GET").toUpperCase();
  res.setHeader("cache-control", "no-store");
  if (method === "GET" || method === "HEAD") {
    res.statusCode = 308;
    res.setHeader("location", `/${url.replace(/^[/\\]+/, "")}`);
    return res.end();
  }
  res.statusCode = 400;
  res.setHeader("content-type", "application/json; charset=utf-8");
  res.end(JSON.stringify({ error: "An address may not start with two slashes. Nothing was changed." }));
}

function notFound(res, error) {
  res.statusCode = error?.statusCode ?? 404;
  res.setHeader("content-type", "text/plain; charset=utf-8");
  res.end("Not found");
}
