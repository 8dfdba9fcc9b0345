import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { ROLE_HOME } from "~/domain/permissions";
import { readInbox, type StoredMessage } from "../fakes/smtp";
import { E2E_ENV } from "../setup/e2e-env";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";

const browser = useBrowser({ width: 375, height: 812 });
const PERIOD_S = Number(E2E_ENV.SIGN_IN_CODE_PERIOD_S);

async function waitForMail(to: string, match: (m: StoredMessage) => boolean, ms = 8000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    const found = (await readInbox(E2E_ENV.FAKE_MAIL_DIR)).find((m) => m.to.includes(to) && match(m));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no matching mail to ${to} within ${ms} ms`);
}

/** Asks for a code on the code page and returns it from the captured e-mail. */
async function askForCode(page: Page, email: string) {
  const before = new Date().toISOString();
  await page.goto(`${baseUrl()}/sign-in/code`);
  await page.getByLabel("Your e-mail address").fill(email);
  await page.getByRole("button", { name: "E-mail me a code" }).click();
  await page.getByRole("heading", { level: 1, name: "Check your e-mail" }).waitFor();
  const mail = await waitForMail(email, (m) => m.subject.includes("sign-in code") && m.receivedAt >= before);
  return /Your sign-in code is (\d{6})/.exec(mail.text ?? "")![1];
}

async function typeCode(page: Page, code: string) {
  await page.getByLabel("Code from the e-mail").fill(code);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
}

const wrong = (code: string) => (code === "000000" ? "111111" : "000000");
const noHorizontalScroll = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= document.documentElement.clientWidth);

describe("sign-in with an e-mailed code", () => {
  it("an invitee without a GitHub account joins with the role chosen, by the code from the e-mail", async () => {
    await browser.clearCookies();
    const { page: admin } = await browser.newPage();
    await signInAs(admin, "ines-okafor");
    await admin.goto(`${baseUrl()}/settings/members`);
    const invitee = `rowan.${Date.now()}@mail.example`;
    await admin.getByLabel("E-mail or GitHub login").fill(invitee);
    await admin.getByLabel("Role", { exact: true }).selectOption("senior");
    await admin.getByRole("button", { name: "Send invitation" }).click();
    await admin
      .getByRole("status")
      .filter({ hasText: `the e-mail to ${invitee} is queued` })
      .waitFor();
    const invitation = await waitForMail(invitee, (m) => m.subject.startsWith("You are invited"));
    expect(invitation.text).not.toMatch(/GitHub/);
    const link = /(http\S+\/sign-in\/code\?email=\S+)/.exec(invitation.text ?? "")![1];
    await admin.close();

    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await page.goto(link);
    await expect(page.getByLabel("Your e-mail address").inputValue()).resolves.toBe(invitee);
    expect(await seriousViolations(page)).toEqual([]);
    expect(await noHorizontalScroll(page)).toBe(true);
    await page.getByRole("button", { name: "E-mail me a code" }).click();
    await page.getByRole("heading", { level: 1, name: "Check your e-mail" }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    expect(await noHorizontalScroll(page)).toBe(true);
    const mail = await waitForMail(invitee, (m) => m.subject.includes("sign-in code"));
    const code = /Your sign-in code is (\d{6})/.exec(mail.text ?? "")![1];
    await typeCode(page, code);
    await page.waitForURL(`${baseUrl()}${ROLE_HOME.senior}`);
    await page.goto(`${baseUrl()}/settings/sessions`);
    await page.getByRole("heading", { level: 1, name: "Signed-in devices" }).waitFor();
    await page.getByText("— this device").waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    expect(await noHorizontalScroll(page)).toBe(true);
    expect(errors).toEqual([]);
    await page.close();

    await browser.clearCookies();
    const { page: check } = await browser.newPage();
    await signInAs(check, "ines-okafor");
    await check.goto(`${baseUrl()}/settings/members`);
    const row = check.getByRole("listitem", { name: invitee.split("@")[0] });
    await expect(row.getByLabel(`Role of ${invitee.split("@")[0]}`).inputValue()).resolves.toBe("senior");
    await check.goto(`${baseUrl()}/settings/audit`);
    await check.getByText("joined the workshop as senior").first().waitFor();
    await check.close();
  });

  it("answers a known and an unknown address with the same page", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const known = "tomas@bramblegate.example";
    const unknown = `nobody.${Date.now()}@mail.example`;
    await askForCode(page, known);
    const knownText = (await page.locator("main").innerText()).replace(known, "ADDRESS");
    await browser.clearCookies();
    await askForCode(page, unknown);
    const unknownText = (await page.locator("main").innerText()).replace(unknown, "ADDRESS");
    expect(unknownText).toBe(knownText);
    // The unknown address, once proven, gets no workshop: it lands on the newcomer's page.
    await page.close();
  });

  it("says so beside the field for a wrong code, then lets the right one in", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const email = `wrong.${Date.now()}@mail.example`;
    const code = await askForCode(page, email);
    await typeCode(page, wrong(code));
    await page.getByText("That code is not right. Check the e-mail and type it again.").waitFor();
    await expect(page.getByLabel("Code from the e-mail").getAttribute("aria-invalid")).resolves.toBe("true");
    await typeCode(page, "12ab");
    await page.getByText("The code is the 6 digits from the e-mail.").waitFor();
    await typeCode(page, code);
    await page.waitForURL(`${baseUrl()}/welcome`);
    await page.close();
  });

  it("refuses a code used already, even with a copy of its cookie", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const email = `reuse.${Date.now()}@mail.example`;
    const code = await askForCode(page, email);
    const saved = (await page.context().cookies()).filter((c) => c.name === "_totp");
    expect(saved).toHaveLength(1);
    await typeCode(page, code);
    await page.waitForURL(`${baseUrl()}/welcome`);
    await browser.clearCookies();
    await page.context().addCookies(saved);
    await page.goto(`${baseUrl()}/sign-in/code`);
    await typeCode(page, code);
    await page.getByText("That code was used already. Ask for a new one.").waitFor();
    await page.close();
  });

  it("refuses a code after too many wrong tries, and says to ask for a new one", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const email = `tries.${Date.now()}@mail.example`;
    const code = await askForCode(page, email);
    // Five tries per code (the server's default).
    for (let i = 0; i < 5; i++) {
      await typeCode(page, wrong(code));
      await page.getByText("That code is not right").waitFor();
    }
    await typeCode(page, code);
    await page.getByText("That code has had too many wrong tries and no longer works").waitFor();
    expect(new URL(page.url()).pathname).toBe("/sign-in/code");
    await page.close();
  });

  it("refuses an expired code", { timeout: 90_000 }, async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const code = await askForCode(page, `late.${Date.now()}@mail.example`);
    await new Promise((r) => setTimeout(r, (PERIOD_S + 2) * 1000));
    await typeCode(page, code);
    await page.getByText("That code has expired. Ask for a new one below.").waitFor();
    await page.close();
  });

  it("signs in from the link in the e-mail in the same browser, once", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const email = `link.${Date.now()}@mail.example`;
    const before = new Date().toISOString();
    await askForCode(page, email);
    const mail = await waitForMail(
      email,
      (m) => m.receivedAt >= before && m.subject.includes("sign-in code"),
    );
    const link = /(http\S+\/sign-in\/link\?t=\S+)/.exec(mail.text ?? "")![1];
    await page.goto(link);
    await page.waitForURL(`${baseUrl()}/welcome`);
    await browser.clearCookies();
    const res = await page.goto(link);
    expect(res?.status()).toBe(400);
    await page.getByRole("heading", { level: 1, name: "This link did not sign you in" }).waitFor();
    await page.close();
  });

  it("shows a refused sign-in on the page with the time to come back", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    const retry = new Date(Date.now() + 4 * 60_000).toISOString();
    const res = await page.goto(`${baseUrl()}/sign-in?retry=${encodeURIComponent(retry)}`);
    expect(res?.status()).toBe(429);
    const alert = await page.getByRole("alert").textContent();
    expect(alert).toMatch(
      /^Too many sign-ins from this network\. Try again after \d\d:\d\d UTC \(in about [45] minutes\)\.$/,
    );
    expect(await seriousViolations(page)).toEqual([]);
    expect(await noHorizontalScroll(page)).toBe(true);
    await page.close();
  });
});
