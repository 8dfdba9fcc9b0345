// The checks every request passes before any route sees it (the root middleware runs them for
// pages, their data requests and resource routes alike):
//   - a write comes from one of our own pages: its Origin is the configured APP_URL, never the
//     request's own URL, which a path such as //host:port/settings lets the caller choose
//     (OWASP ASVS 5.0 V3.5.1–V3.5.3);
//   - its body is within the route's limit, judged from Content-Length before a byte is read;
//   - its body is of the kind the route reads (a form for pages, JSON for the API) and can be
//     parsed, so a wrong content type is a 415 and not a 500 inside the action;
//   - no text anywhere in it holds a NUL character, which PostgreSQL refuses to store in text.
// Each refusal is thrown as a JSON `{ error }` Response with a 4xx: the API returns it as it is,
// pages show its message on their error page. Nothing has been read or changed when it is thrown.
import { bodyRuleFor, describeBytes, PAYMENT_WEBHOOK_PATH } from "./body-rules";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
const FORM_TYPES = ["application/x-www-form-urlencoded", "multipart/form-data"];

export function refusal(status: number, message: string): Response {
  return Response.json({ error: message }, { status, headers: { "Cache-Control": "no-store" } });
}

const refuse = (status: number, message: string): never => {
  throw refusal(status, message);
};

const NUL_MESSAGE =
  "Part of what was sent holds a NUL character (\\0), which Ramplight does not store. Remove it and send again.";

export async function guardRequest(request: Request, appOrigin: string): Promise<void> {
  const url = new URL(request.url);
  if (hasNul(safeDecode(url.pathname)) || hasNul(safeDecode(url.search))) refuse(400, NUL_MESSAGE);
  const method = request.method.toUpperCase();
  if (SAFE_METHODS.has(method)) return;

  // The one write that comes from another origin by nature: the payments service's webhook. It
  // carries no cookie and does nothing on a visitor's behalf, so the origin check (which stops a
  // page elsewhere from using a visitor's session) has nothing to protect; its authentication is
  // the signature over its body, checked before anything is stored (app/payments/webhook.server.ts).
  // Exactly this path: its size limit and JSON check below still apply.
  if (url.pathname !== PAYMENT_WEBHOOK_PATH) assertOwnOrigin(request, appOrigin);

  const rule = bodyRuleFor(url.pathname);
  const declared = request.headers.get("content-length");
  let length = 0;
  if (declared === null) {
    // Browsers always send the length of a form or fetch body; a body without one (chunked) could
    // be any size, so it is refused rather than read to find out.
    if (request.headers.has("transfer-encoding"))
      refuse(411, "Send the length of the body (Content-Length) with this request.");
  } else {
    length = Number(declared);
    if (!Number.isSafeInteger(length) || length < 0)
      refuse(400, "The Content-Length of this request is not a number of bytes.");
    if (length > rule.maxBytes)
      refuse(
        413,
        `That request is ${describeBytes(length)}; this address takes at most ${describeBytes(rule.maxBytes)}. Nothing was saved.`,
      );
  }

  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (rule.kind === "json") {
    // Already within the limit, so reading it is bounded. A DELETE sends no body at all.
    const text = declared !== null && length === 0 ? "" : await request.clone().text();
    if (text === "") return;
    if (type !== "application/json")
      refuse(415, "This address takes JSON: send the body with Content-Type: application/json.");
    let parsed: unknown;
    try {
      parsed = JSON.parse(text);
    } catch {
      refuse(400, "The request body must be JSON.");
    }
    if (jsonHasNul(parsed)) refuse(400, NUL_MESSAGE);
    return;
  }
  // Pages: every action reads a form, even an empty one (sign-out sends no fields).
  if (!FORM_TYPES.includes(type))
    refuse(
      415,
      "This page takes a form: send it from the page's own form (Content-Type: application/x-www-form-urlencoded or multipart/form-data).",
    );
  let form: FormData;
  try {
    form = await request.clone().formData();
  } catch {
    refuse(400, "The form could not be read. Send it again from the page.");
  }
  for (const [name, value] of form!) {
    if (hasNul(name) || (typeof value === "string" && hasNul(value))) refuse(400, NUL_MESSAGE);
  }
}

/**
 * Writes come from our own pages: the Origin header names APP_URL, or (for a browser that sends
 * no Origin) the fetch metadata says same-origin. Anything else, including a request with neither
 * header, is refused: a browser always sends one of them on a write.
 */
export function assertOwnOrigin(request: Request, appOrigin: string): void {
  const origin = request.headers.get("origin");
  const site = request.headers.get("sec-fetch-site");
  if (origin === appOrigin || (origin === null && site === "same-origin")) return;
  refuse(403, "This request did not come from a Ramplight page, so it was refused.");
}

const hasNul = (s: string) => s.includes("\u0000");

function safeDecode(s: string): string {
  try {
    return decodeURIComponent(s.replace(/\+/g, " "));
  } catch {
    refuse(400, "The address is not valid (a broken %-escape).");
  }
  return s;
}

function jsonHasNul(value: unknown): boolean {
  // Iterative: a deeply nested body must not exhaust the stack.
  const stack: unknown[] = [value];
  while (stack.length) {
    const v = stack.pop();
    if (typeof v === "string") {
      if (hasNul(v)) return true;
    } else if (Array.isArray(v)) {
      for (const x of v) stack.push(x);
    } else if (v && typeof v === "object") {
      for (const [k, x] of Object.entries(v)) {
        if (hasNul(k)) return true;
        stack.push(x);
      }
    }
  }
  return false;
}

/**
 * Headers every response of the app carries (documents get their own CSP from entry.server.tsx):
 * no MIME sniffing, no framing, nothing a non-document may load, and no caching of what a signed-in
 * person saw (ASVS 5.0 V3.4, V14.3).
 */
export function withResponseHeaders(response: Response): Response {
  try {
    const h = response.headers;
    if (!h.has("X-Content-Type-Options")) h.set("X-Content-Type-Options", "nosniff");
    if (!h.has("Content-Security-Policy"))
      h.set("Content-Security-Policy", "default-src 'none'; frame-ancestors 'none'; base-uri 'none'");
    if (!h.has("Cache-Control")) h.set("Cache-Control", "no-store");
    if (!h.has("X-Frame-Options")) h.set("X-Frame-Options", "DENY");
    return response;
  } catch {
    // Immutable headers (a Response.redirect): copy it into one we may change.
    return withResponseHeaders(new Response(response.body, response));
  }
}
