// A senior edits a symptom's words: a malformed trouble code is refused at its field, new synonyms
// save with a new version and show in its history, before and after. A technician reads the symptom
// and the causes that show it.
import { describe, expect, it } from "vitest";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();
const SYMPTOM = `/kb/symptoms/${kbId("bramblegate", "symptom", "grinding_braking")}`;

describe("editing a symptom", () => {
  it("refuses a malformed code at its field and saves new synonyms", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}${SYMPTOM}`);
    await hydrated(page);
    await page.getByText("Edit this symptom").click();
    await page.getByLabel("Kind").selectOption("trouble_code");
    await page.getByLabel(/^Trouble code/).fill("Q1234");
    await page.getByRole("button", { name: "Save the symptom" }).click();
    await page.locator("#code-error").waitFor();
    await expect(page.getByLabel(/^Trouble code/).getAttribute("aria-invalid")).resolves.toBe("true");
    await hydrated(page);
    await page.getByLabel("Kind").selectOption("noise");
    await page.getByLabel(/^Trouble code/).fill("");
    const words = page.getByLabel("Other words people use, separated by commas");
    await words.fill(`${await words.inputValue()}, scrapes like metal on metal`);
    await page.getByRole("button", { name: "Save the symptom" }).click();
    await page.getByRole("status").filter({ hasText: "Quick find reads the new words at once" }).waitFor();
    await page.getByText(/Also: .*scrapes like metal on metal/).waitFor();
    // Its history says who changed what, with the words before and after.
    await page.getByText(/^History \(\d+/).click();
    const change = page.getByRole("list", { name: "Changes, newest first" }).getByRole("listitem").first();
    await change.getByText("Tomas Varga", { exact: true }).waitFor();
    await change
      .getByText(/edited the symptom “Grinding when braking”: changed the words people use for it/)
      .waitFor();
    await change.getByText(/→ .*scrapes like metal on metal/).waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("a technician reads the symptom without the editor", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}${SYMPTOM}`);
    await page.getByRole("heading", { name: "Causes that show it" }).waitFor();
    expect(await page.getByText("Edit this symptom").count()).toBe(0);
    await page.close();
  });
});
