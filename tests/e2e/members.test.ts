import { rm } from "node:fs/promises";
import { beforeAll, describe, expect, it } from "vitest";
import { readInbox } from "../fakes/smtp";
import { E2E_ENV } from "../setup/e2e-env";
import { baseUrl, signInAs, useBrowser } from "./browser";

const browser = useBrowser();

async function waitForMail(to: string, ms = 5000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    const found = (await readInbox(E2E_ENV.FAKE_MAIL_DIR)).find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} within ${ms} ms`);
}

describe("an admin manages the workshop's members", () => {
  beforeAll(async () => {
    await rm(E2E_ENV.FAKE_MAIL_DIR, { recursive: true, force: true });
  });

  it("invites by e-mail (queued, then sent through SMTP) and by GitHub login, changes a role, refuses to lose the last admin", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.getByRole("link", { name: "Members" }).click();
    await page.getByRole("heading", { level: 1, name: "Members" }).waitFor();

    await page.getByLabel("E-mail or GitHub login").fill("not an address@");
    await page.getByRole("button", { name: "Send invitation" }).click();
    // The message sits at the field it concerns, which names it.
    await page.getByText("That e-mail address does not look right").waitFor();
    await expect(page.getByLabel("E-mail or GitHub login").getAttribute("aria-invalid")).resolves.toBe(
      "true",
    );

    await page.getByLabel("E-mail or GitHub login").fill("new.tech@mail.example");
    await page.getByLabel("Role", { exact: true }).selectOption("technician");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "the e-mail to new.tech@mail.example is queued" })
      .waitFor();
    const mail = await waitForMail("new.tech@mail.example");
    expect(mail.subject).toBe("You are invited to Bramblegate Motor Works on Ramplight");
    expect(mail.text).toContain(`${baseUrl()}/sign-in`);

    await page.getByLabel("E-mail or GitHub login").fill("future-apprentice");
    await page.getByLabel("Role", { exact: true }).selectOption("apprentice");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByRole("status").filter({ hasText: "Invitation saved for future-apprentice" }).waitFor();
    await page.getByRole("heading", { name: "Waiting to join" }).waitFor();

    const priya = page.getByRole("listitem", { name: "Priya Hale" });
    await priya.getByLabel("Role of Priya Hale").selectOption("senior");
    await priya.getByRole("button", { name: "Change role" }).click();
    await page.getByRole("status").filter({ hasText: "Role changed." }).waitFor();
    await expect(priya.getByLabel("Role of Priya Hale").inputValue()).resolves.toBe("senior");

    // Back as she was: other journeys sign in as Priya the technician.
    await priya.getByLabel("Role of Priya Hale").selectOption("technician");
    await priya.getByRole("button", { name: "Change role" }).click();
    await page.getByRole("status").filter({ hasText: "Role changed." }).waitFor();

    const ines = page.getByRole("listitem", { name: "Ines Okafor" });
    await ines.getByLabel("Role of Ines Okafor").selectOption("technician");
    await ines.getByRole("button", { name: "Change role" }).click();
    await page.getByRole("alert").filter({ hasText: "only active admin" }).waitFor();

    await page.goto(`${baseUrl()}/settings/audit`);
    // In words, naming who was changed (app/audit/describe.ts).
    await page.getByText("changed Priya Hale's role from senior technician to technician").first().waitFor();
    await page
      .getByText(/invited .+ as /)
      .first()
      .waitFor();
    // The refused invitation (400) and the refused demotion (409) are the only failed loads.
    expect(errors.filter((e) => !/status of (400|409)/.test(e))).toEqual([]);
    expect(errors).toHaveLength(2);
    await page.close();
  });

  it("lets the admin change the labour rate, refusing a negative one", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.getByLabel("Labour rate per hour").fill("-1");
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.getByText("Labour rate cannot be negative").waitFor();
    await page.getByLabel("Labour rate per hour").fill("86.5");
    await page.getByRole("button", { name: "Save settings" }).click();
    await page.getByRole("status").filter({ hasText: "Settings saved." }).waitFor();
    await page.reload();
    await expect(page.getByLabel("Labour rate per hour").inputValue()).resolves.toBe("86.5");
    await page.close();
  });

  it("keeps a suspended member out", async () => {
    await browser.clearCookies();
    const admin = await browser.newPage();
    await signInAs(admin.page, "ines-okafor");
    await admin.page.goto(`${baseUrl()}/settings/members`);
    const dana = admin.page.getByRole("listitem", { name: "Dana Reyes" });
    await dana.getByRole("button", { name: "Suspend" }).click();
    await admin.page.getByRole("status").filter({ hasText: "Member suspended" }).waitFor();
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "dana-reyes").catch(() => undefined);
    const res = await page.goto(`${baseUrl()}/cases`);
    expect(res?.status()).toBe(403);
    await page.getByText("suspended").first().waitFor();
    await browser.clearCookies();
    await signInAs(admin.page, "ines-okafor");
    await admin.page.goto(`${baseUrl()}/settings/members`);
    await admin.page
      .getByRole("listitem", { name: "Dana Reyes" })
      .getByRole("button", { name: "Reactivate" })
      .click();
    await admin.page.getByRole("status").filter({ hasText: "Member reactivated" }).waitFor();
    await page.close();
    await admin.page.close();
  });
});
