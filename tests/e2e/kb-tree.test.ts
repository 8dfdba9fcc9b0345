// A senior reshapes the cause tree: moves a failure mode to another component with the keyboard
// (Move, then Put it here) and back by dragging it; adds a failure mode under a component, links it
// to a symptom by a word, and merges it into another failure mode. A technician sees the tree
// without the Move buttons.
import { afterAll, describe, expect, inject, it } from "vitest";
import { eq } from "drizzle-orm";
import { createDb } from "~/db/client.server";
import { causes } from "~/db/schema";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
afterAll(() => pool.end());
const THIN = kbId("bramblegate", "cause", "brake_disc_worn_thin");
const THIN_NAME = "Disc worn below its minimum thickness"; // seeds/kb/brakes.ts
const parentOf = async (id: string) =>
  (await db.select({ parentId: causes.parentId }).from(causes).where(eq(causes.id, id)))[0].parentId;

describe("reshaping the cause tree", () => {
  it("moves a failure mode by keyboard and back by dragging it", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb`);
    await hydrated(page);
    await page.getByText("Brakes", { exact: true }).first().click();
    const home = await parentOf(THIN);

    await page.getByRole("button", { name: `Move ${THIN_NAME}` }).focus();
    await page.keyboard.press("Enter");
    await page
      .getByRole("status")
      .filter({ hasText: `Moving “${THIN_NAME}”` })
      .waitFor();
    const put = page.getByRole("button", { name: "Put it here: under Brake calipers" });
    await put.focus();
    await page.keyboard.press("Enter");
    await page
      .getByRole("status")
      .filter({ hasText: `Moved “${THIN_NAME}” under “Brake calipers”` })
      .waitFor();
    const calipers = kbId("bramblegate", "cause", "brakes_calipers");
    await expect.poll(() => parentOf(THIN)).toBe(calipers);
    await page.getByTestId(`component-${calipers}`).getByRole("link", { name: THIN_NAME }).waitFor();

    // Escape puts a picked-up failure mode back without moving it.
    await page.getByRole("button", { name: `Move ${THIN_NAME}` }).click();
    await page.keyboard.press("Escape");
    await page.getByRole("status").filter({ hasText: "Move cancelled." }).waitFor();

    // Dragged back onto its own component.
    await page.locator(`#cause-${THIN}`).dragTo(page.getByTestId(`component-${home}`).locator("p").first());
    await page
      .getByRole("status")
      .filter({ hasText: `Moved “${THIN_NAME}” under “Brake discs and pads”` })
      .waitFor();
    await expect.poll(() => parentOf(THIN)).toBe(home);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("adds a failure mode under a component, links it by a word and merges it into another", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb/causes/${kbId("bramblegate", "cause", "brakes_calipers")}`);
    await hydrated(page);
    await page.getByText("Add a failure mode here").click();
    const form = page.locator("form", { has: page.getByRole("button", { name: "Add the failure mode" }) });
    await form.getByLabel("Name").fill("Caliper guide bolt thread stripped");
    await form.getByLabel("Base rate (relative frequency)").fill("zero");
    await form.getByRole("button", { name: "Add the failure mode" }).click();
    await page.locator("#newBaseRate-error").waitFor();
    await hydrated(page);
    await form.getByLabel("Base rate (relative frequency)").fill("0.5");
    await form.getByRole("button", { name: "Add the failure mode" }).click();
    await page.getByRole("heading", { level: 1, name: "Caliper guide bolt thread stripped" }).waitFor();
    await hydrated(page);

    await page.getByText("Link a symptom or a check").click();
    await page.getByLabel("A symptom it shows").selectOption({ label: "Grinding when braking" });
    await page.getByLabel("How often it shows").fill("sometimes");
    await page.getByRole("button", { name: "Link the symptom" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "Linked “Grinding when braking”: sometimes (35%)" })
      .waitFor();

    await hydrated(page);
    await page.getByText("Merge into another").click();
    const into = page.getByLabel("Merge it into");
    const target = await into
      .locator("option", { hasText: "Brakes › Caliper slide pins" })
      .first()
      .getAttribute("value");
    expect(target).not.toBeNull();
    await into.selectOption(target!);
    await page.getByRole("button", { name: "Merge into it" }).click();
    // Refused without the tick: the fold stays open with the message beside the box.
    await page.locator("#confirm-merge-error").waitFor();
    await hydrated(page);
    await page.getByLabel("Merge it into").selectOption(target!);
    await page.getByLabel("Yes, merge it").check();
    await page.getByRole("button", { name: "Merge into it" }).click();
    await page.getByText(/^Merged into/).waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("shows a technician the tree without Move buttons", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/kb`);
    await page.getByText("Brakes", { exact: true }).first().click();
    await page.getByRole("link", { name: THIN_NAME }).waitFor();
    expect(await page.getByRole("button", { name: /^Move / }).count()).toBe(0);
    await page.close();
  });
});
