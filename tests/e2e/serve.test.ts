// The production server (scripts/serve.mjs) in front of the build: caching of hashed assets,
// compression on request, and a plain 404 for an asset that does not exist. Caching values follow
// RFC 9111 §5.2.2.1 (max-age) and RFC 8246 (immutable); compression negotiation RFC 9110 §12.5.3.
import { and, count, eq, gt } from "drizzle-orm";
import { describe, expect, inject, it } from "vitest";
import { createDb } from "~/db/client.server";
import { signInAttempts } from "~/db/schema";
import { baseUrl } from "./browser";

async function firstAsset(): Promise<string> {
  const html = await (await fetch(`${baseUrl()}/`)).text();
  const href = html.match(/\/assets\/[^"]+\.css/)?.[0];
  expect(href, "the landing page links a stylesheet under /assets/").toBeTruthy();
  return href!;
}

describe("the production server", () => {
  it("serves hashed assets for a year as immutable", async () => {
    const res = await fetch(`${baseUrl()}${await firstAsset()}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/css/);
    // 31536000 s = 365 days: the year we configure (serve-static "1y"), not a published value.
    expect(res.headers.get("cache-control")).toBe("public, max-age=31536000, immutable");
  });

  it("compresses a page when the client accepts gzip, and not otherwise", async () => {
    const gz = await fetch(`${baseUrl()}/`, { headers: { "accept-encoding": "gzip" } });
    expect(gz.headers.get("content-encoding")).toBe("gzip");
    // fetch decodes gzip itself; the page still reads whole.
    await expect(gz.text()).resolves.toMatch(/complaint to a confirmed cause/);
    const plain = await fetch(`${baseUrl()}/`, { headers: { "accept-encoding": "identity" } });
    expect(plain.headers.get("content-encoding")).toBeNull();
  });

  it("answers 404 for an asset that is not in the build, and passes other paths to the app", async () => {
    const missing = await fetch(`${baseUrl()}/assets/no-such-file-123.js`);
    expect(missing.status).toBe(404);
    // A page path, and a file-like path that is not on disk, both reach the app's own 404 page.
    for (const path of ["/no-such-page", "/no-such-file.txt"]) {
      const page = await fetch(`${baseUrl()}${path}`);
      expect(page.status, path).toBe(404);
      expect(page.headers.get("content-type"), path).toMatch(/text\/html/);
    }
    // A page's data request goes to the router, never to the file server.
    const data = await fetch(`${baseUrl()}/_root.data`);
    expect(data.status).toBe(200);
    expect(data.headers.get("content-type")).toMatch(/text\/x-script/);
  });

  it("never serves a file from outside the client build (path traversal)", async () => {
    for (const path of [
      "/assets/..%2f..%2fserver%2findex.js",
      "/assets/%2e%2e/%2e%2e/package.json",
      "/..%2fpackage.json",
    ]) {
      const res = await fetch(`${baseUrl()}${path}`);
      expect([400, 403, 404], path).toContain(res.status);
      const body = await res.text();
      expect(body, path).not.toMatch(/"dependencies"|createRequestHandler|export\s+const\s+routes/);
    }
  });
});

describe("the caller's address reaches the sign-in rate limit", () => {
  it("counts a sign-in start against the socket's address, not one shared bucket", async () => {
    const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 1 });
    try {
      const bucket = "ip:127.0.0.1"; // the browser tests and this fetch all come from loopback
      // Counted from now on: the limiter clears old rows as it goes, so a total could shrink.
      const since = new Date(Date.now() - 1000);
      const recent = async () =>
        (
          await db
            .select({ n: count() })
            .from(signInAttempts)
            .where(and(eq(signInAttempts.bucket, bucket), gt(signInAttempts.at, since)))
        )[0].n;
      const before = await recent();
      const res = await fetch(`${baseUrl()}/auth/github`, {
        method: "POST",
        redirect: "manual",
        headers: { origin: baseUrl() },
        body: new URLSearchParams(),
      });
      expect(res.status).toBe(302);
      expect(await recent()).toBe(before + 1);
      expect(
        (
          await db
            .select({ n: count() })
            .from(signInAttempts)
            .where(and(eq(signInAttempts.bucket, "ip:direct"), gt(signInAttempts.at, since)))
        )[0].n,
      ).toBe(0);
    } finally {
      await pool.end();
    }
  });
});
