import { describe, expect, it } from "vitest";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";

// 375 px: a common small phone width in CSS pixels (common practice, no published source).
const browser = useBrowser({ width: 375, height: 812 });

describe("an admin reads the workshop's mail", () => {
  it("sees the invitation e-mail that was queued, then sent, with its text, on a phone", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.goto(`${baseUrl()}/settings/members`);
    await page.getByLabel("E-mail or GitHub login").fill("mail.page@mail.example");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByRole("status").filter({ hasText: "mail.page@mail.example is queued" }).waitFor();

    await page.goto(`${baseUrl()}/settings`);
    await page.getByRole("navigation", { name: "Settings" }).getByRole("link", { name: "Mail" }).click();
    await page.getByRole("heading", { level: 1, name: "Mail" }).waitFor();
    const subject = "You are invited to Bramblegate Motor Works on Ramplight";
    const item = () =>
      page
        .getByRole("listitem")
        .filter({ hasText: "To mail.page@mail.example" })
        .filter({ hasText: subject });
    await item().waitFor();
    // Delivered by the server's own worker within a few polls; the page shows it on reload.
    const until = Date.now() + 15_000;
    while (!(await item().getByText("Sent", { exact: true }).isVisible())) {
      if (Date.now() > until) throw new Error(`still ${await item().innerText()}`);
      await page.waitForTimeout(300);
      await page.reload();
    }
    await expect(item().getByText("1 attempt").isVisible()).resolves.toBe(true);
    await item().getByText("The text").click();
    await item().getByText("invited you to join Bramblegate Motor Works as technician").waitFor();
    await expect(item().getByRole("button", { name: "Send again" }).count()).resolves.toBe(0);

    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBe(0);
    expect(await seriousViolations(page)).toEqual([]);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("is not shown to a technician", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    const res = await page.goto(`${baseUrl()}/settings/mail`);
    expect(res?.status()).toBe(403);
    await page.goto(`${baseUrl()}/settings`);
    await expect(page.getByRole("link", { name: "Mail" }).count()).resolves.toBe(0);
    await page.close();
  });
});
