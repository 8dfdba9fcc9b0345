import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { type BrowserContext, chromium, type Page } from "playwright-core";
import { afterAll, beforeAll, inject } from "vitest";

// Debian's Chromium; playwright-core never downloads a browser of its own.
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const FLAGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export const baseUrl = () => inject("baseUrl");

/** One browser profile per test file, closed afterwards. Console errors fail the page's test. */
export function useBrowser(options: { width?: number; height?: number } = {}) {
  const state: { context?: BrowserContext; dir?: string } = {};
  beforeAll(async () => {
    state.dir = await mkdtemp(join(tmpdir(), "rl-chromium-"));
    state.context = await chromium.launchPersistentContext(state.dir, {
      executablePath: CHROMIUM,
      headless: true,
      args: FLAGS,
      viewport: { width: options.width ?? 1280, height: options.height ?? 900 },
    });
  });
  afterAll(async () => {
    await state.context?.close();
    if (state.dir) await rm(state.dir, { recursive: true, force: true });
  });
  return {
    async newPage(): Promise<{ page: Page; errors: string[] }> {
      const page = await state.context!.newPage();
      const errors: string[] = [];
      page.on("console", (m) => {
        if (m.type() === "error") errors.push(m.text());
      });
      page.on("pageerror", (e) => errors.push(e.message));
      return { page, errors };
    },
    async clearCookies() {
      await state.context!.clearCookies();
    },
  };
}

/** The demo's two-click sign-in: the landing page's button, then the person on the provider's page. */
export async function signInAs(page: Page, login: string) {
  await page.goto(`${baseUrl()}/`);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/login\/oauth\/authorize/);
  await page.locator(`form:has(input[name="login"][value="${login}"]) button`).click();
  await page.waitForURL((url) => url.origin === baseUrl() && !url.pathname.startsWith("/auth"));
}

/** Signs out from the person's menu in the header. */
export async function signOut(page: Page) {
  await page.getByRole("banner").locator("summary").last().click();
  await page.getByRole("button", { name: "Sign out", exact: true }).click();
}

/** Waits until the page's script has taken over (app/root.tsx marks it), so keys reach its handlers. */
export async function hydrated(page: Page) {
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
}
