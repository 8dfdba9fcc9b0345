import { describe, expect, it } from "vitest";
import { baseUrl, useBrowser } from "./browser";

const browser = useBrowser();

describe("landing page", () => {
  it("says what Ramplight is for, in IBM Plex Sans shipped with the app", async () => {
    const { page, errors } = await browser.newPage();
    const res = await page.goto(`${baseUrl()}/`);
    expect(res?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(
      /complaint to a confirmed cause/,
    );
    await page.evaluate(() => document.fonts.ready);
    const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(family).toMatch(/^"?IBM Plex Sans/);
    const loaded = await page.evaluate(() => document.fonts.check('18px "IBM Plex Sans"'));
    expect(loaded).toBe(true);
    // The font files come from our own origin, not a CDN.
    const fontUrls = await page.evaluate(() =>
      performance
        .getEntriesByType("resource")
        .map((e) => e.name)
        .filter((n) => /\.woff2?/.test(n)),
    );
    expect(fontUrls.length).toBeGreaterThan(0);
    for (const u of fontUrls) expect(new URL(u).origin).toBe(baseUrl());
    expect(errors).toEqual([]);
    await page.close();
  });

  it("sends the security headers (OWASP ASVS 5.0 V3.4)", async () => {
    const res = await fetch(`${baseUrl()}/`);
    const csp = res.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+'/);
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("same-origin");
  });

  it("shows the four owner priorities with distinct shapes, not colour alone", async () => {
    const { page } = await browser.newPage();
    await page.goto(`${baseUrl()}/`);
    for (const p of ["stop", "soon", "watch", "sound"]) {
      const mark = page.locator(`[data-priority="${p}"]`).first();
      await expect(mark.locator("svg").count()).resolves.toBe(1);
    }
    // Each mark draws its shape by reference to the page's one copy of it: compare the drawings
    // without their colours, so four distinct shapes remain.
    const shapes = await page.$$eval("[data-priority] svg", (svgs) =>
      svgs.map((s) => {
        const ref = s.querySelector("use")?.getAttribute("href");
        const drawn = ref ? (document.querySelector(ref)?.innerHTML ?? "") : s.innerHTML;
        return drawn.replace(/fill="[^"]*"|stroke="[^"]*"/g, "");
      }),
    );
    expect(shapes.every((d) => /<(path|circle|rect|line)/.test(d))).toBe(true);
    expect(new Set(shapes).size).toBe(4);
    await page.close();
  });

  it("fits a 375 px phone without sideways scrolling", async () => {
    const { page } = await browser.newPage();
    await page.setViewportSize({ width: 375, height: 740 });
    await page.goto(`${baseUrl()}/`);
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    const button = await page.getByRole("button", { name: "Sign in" }).boundingBox();
    expect(button!.height).toBeGreaterThanOrEqual(44); // touch target, WCAG 2.2 SC 2.5.5 (AAA) size
    await page.close();
  });
});

describe("error pages", () => {
  it("answers an unknown address with a friendly 404 page and a real 404 status", async () => {
    const { page } = await browser.newPage();
    const res = await page.goto(`${baseUrl()}/no/such/page`);
    expect(res?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Nothing here");
    await page.getByRole("link", { name: "Back to the start" }).click();
    await page.waitForURL(`${baseUrl()}/`);
    await page.close();
  });

  it("sends a signed-out visitor of a workshop area to sign in", async () => {
    const res = await fetch(`${baseUrl()}/board`, { redirect: "manual" });
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe("/sign-in?next=%2Fboard");
  });

  it("refuses a GET on the sign-in start with 405", async () => {
    const res = await fetch(`${baseUrl()}/auth/github`);
    expect(res.status).toBe(405);
  });
});
