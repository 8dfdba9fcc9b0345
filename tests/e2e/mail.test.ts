import { eq } from "drizzle-orm";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, inject, it } from "vitest";
import { createDb } from "~/db/client.server";
import { mailOutbox, workshops } from "~/db/schema";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";

// 375 px: a common small phone width in CSS pixels (common practice, no published source).
const browser = useBrowser({ width: 375, height: 812 });
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 1 });
afterAll(() => pool.end());

async function waitForState(page: Page, to: string, state: string) {
  const item = page.getByRole("listitem").filter({ hasText: `To ${to}` });
  const until = Date.now() + 15_000;
  while (!(await item.getByText(state, { exact: true }).isVisible())) {
    if (Date.now() > until) throw new Error(`still ${await item.innerText()}`);
    await page.waitForTimeout(300);
    await page.reload();
  }
  return item;
}

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
    await waitForState(page, "mail.page@mail.example", "Sent");
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

  it("sends a message that ran out of tries again, once the admin asks", async () => {
    const [w] = await db
      .select({ id: workshops.id })
      .from(workshops)
      .where(eq(workshops.slug, "bramblegate"));
    // A message as the worker leaves it after its last try (the relay was away all along).
    await db.insert(mailOutbox).values({
      workshopId: w.id,
      kind: "test",
      toAddress: "gave.up@mail.example",
      subject: "A message that ran out of tries",
      text: "Hello again",
      state: "failed",
      attempts: 6,
      lastError: "connect ECONNREFUSED 127.0.0.1:25",
    });
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.goto(`${baseUrl()}/settings/mail`);
    const item = page.getByRole("listitem").filter({ hasText: "To gave.up@mail.example" });
    await item.getByText("Not delivered", { exact: true }).waitFor();
    await item.getByText("Last error: connect ECONNREFUSED 127.0.0.1:25").waitFor();
    await item.getByRole("button", { name: "Send again" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "The e-mail to gave.up@mail.example is queued again." })
      .waitFor();
    const sent = await waitForState(page, "gave.up@mail.example", "Sent");
    await sent.getByText("7 attempts").waitFor();
    await expect(sent.getByRole("button", { name: "Send again" }).count()).resolves.toBe(0);
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
