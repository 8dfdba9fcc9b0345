import { env } from "~/env.server";

/**
 * React Router checks the Origin of form posts to UI routes, but not of resource routes (our JSON
 * API). Every state-changing API call must come from our own pages (OWASP ASVS 5.0 V3.5.1–V3.5.3):
 * the Origin header must name this server, or the fetch metadata must say same-origin.
 */
export function requireSameOrigin(request: Request) {
  if (request.method === "GET" || request.method === "HEAD" || request.method === "OPTIONS") return;
  const own = new URL(env().APP_URL).origin;
  const origin = request.headers.get("origin");
  const site = request.headers.get("sec-fetch-site");
  if (origin === own || (!origin && site === "same-origin")) return;
  throw Response.json({ error: "This request did not come from a Ramplight page, so it was refused." }, { status: 403 });
}
