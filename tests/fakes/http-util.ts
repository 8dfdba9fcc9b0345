// Small helpers shared by the HTTP fakes. Deliberately framework-free: the fakes must start in
// milliseconds inside a test worker and carry no dependencies of their own.
import { createServer } from "node:http";
import type { IncomingMessage, RequestListener, Server, ServerResponse } from "node:http";
import { isIP } from "node:net";

export const DEFAULT_HOST = "127.0.0.1";

// The fakes hand out codes, tokens and "payments" to anyone who asks, so they must never be
// reachable from another machine. Refuse anything that is not a loopback address.
export function assertLoopback(host: string): void {
  const loopback = host === "::1" || (isIP(host) === 4 && host.startsWith("127."));
  if (!loopback) {
    throw new Error(`fakes listen on loopback only (127.0.0.1 or ::1), not "${host}"`);
  }
}

export type Listening = { server: Server; url: string; port: number; close(): Promise<void> };

export async function listen(handler: RequestListener, port = 0, host = DEFAULT_HOST): Promise<Listening> {
  assertLoopback(host);
  const server = createServer((req, res) => {
    // One failing handler must not take the whole fake (and the test run) down with it.
    Promise.resolve(handler(req, res)).catch((err: unknown) => {
      if (!res.headersSent) sendJson(res, 500, { error: "server_error", error_description: String(err) });
      else res.destroy();
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const address = server.address();
  if (address === null || typeof address === "string") throw new Error("server has no TCP address");
  const urlHost = host.includes(":") ? `[${host}]` : host;
  return {
    server,
    port: address.port,
    url: `http://${urlHost}:${address.port}`,
    close: () =>
      new Promise<void>((resolve, reject) => {
        // Keep-alive sockets from fetch would otherwise hold close() open for seconds.
        server.closeAllConnections();
        server.close((err) => (err ? reject(err) : resolve()));
      }),
  };
}

const MAX_BODY_BYTES = 256 * 1024;

export async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buf = chunk as Buffer;
    size += buf.length;
    if (size > MAX_BODY_BYTES) throw new Error("request body too large");
    chunks.push(buf);
  }
  return Buffer.concat(chunks).toString("utf8");
}

// Form-encoded or JSON, flattened to strings: what OAuth token endpoints accept in practice.
export async function readParams(req: IncomingMessage): Promise<Record<string, string>> {
  const raw = await readBody(req);
  const type = (req.headers["content-type"] ?? "").split(";")[0]!.trim().toLowerCase();
  if (type === "application/json") {
    const parsed: unknown = raw === "" ? {} : JSON.parse(raw);
    const out: Record<string, string> = {};
    if (parsed && typeof parsed === "object") {
      for (const [k, v] of Object.entries(parsed)) if (v !== null && v !== undefined) out[k] = String(v);
    }
    return out;
  }
  return Object.fromEntries(new URLSearchParams(raw));
}

export function sendJson(
  res: ServerResponse,
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): void {
  const text = JSON.stringify(body);
  res.writeHead(status, {
    "content-type": "application/json; charset=utf-8",
    "content-length": Buffer.byteLength(text),
    "cache-control": "no-store",
    ...headers,
  });
  res.end(text);
}

export function sendHtml(res: ServerResponse, status: number, title: string, body: string): void {
  const page = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
body{font-family:system-ui,sans-serif;max-width:40rem;margin:2rem auto;padding:0 1rem;line-height:1.4}
button{display:block;width:100%;font-size:1.1rem;padding:.9rem 1rem;margin:.5rem 0;text-align:left;cursor:pointer}
button:focus-visible{outline:3px solid #1a5fb4;outline-offset:2px}
.note{background:#fff4ce;border:1px solid #c8a600;padding:.5rem .75rem}
</style></head>
<body><main>
<p class="note">${escapeHtml(title)}: nothing here is real.</p>
${body}
</main></body></html>`;
  res.writeHead(status, { "content-type": "text/html; charset=utf-8", "cache-control": "no-store" });
  res.end(page);
}

export function redirect(res: ServerResponse, location: string): void {
  res.writeHead(302, { location, "cache-control": "no-store" });
  res.end();
}

export function sendText(res: ServerResponse, status: number, text: string): void {
  res.writeHead(status, { "content-type": "text/plain; charset=utf-8" });
  res.end(text);
}

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

export function hiddenInputs(fields: Record<string, string | undefined>): string {
  return Object.entries(fields)
    .filter((entry): entry is [string, string] => entry[1] !== undefined)
    .map(([name, value]) => `<input type="hidden" name="${escapeHtml(name)}" value="${escapeHtml(value)}">`)
    .join("\n");
}

// RFC 6749 §2.3.1 says Basic credentials are form-urlencoded first; not every client does it.
export function safeDecode(value: string): string {
  try {
    return decodeURIComponent(value.replace(/\+/g, " "));
  } catch {
    return value;
  }
}
