// A senior edits a symptom's words: a malformed trouble code is refused at its field, new synonyms
// save with a new version and show in its history, before and after. From the same page a senior
// changes how often a cause shows the symptom, by a word, in the causes' table. A technician reads
// the symptom and the causes that show it, without fields.
import { describe, expect, it } from "vitest";
import { describeStrength, strengthOf } from "~/domain/link-strength";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();
const SYMPTOM = `/kb/symptoms/${kbId("bramblegate", "symptom", "grinding_braking")}`;
// A symptom with a cause no other journey ranks (seeds/kb/body.ts), so its change moves nothing else.
const BONNET = `/kb/symptoms/${kbId("bramblegate", "symptom", "bonnet_wont_open")}`;
const CATCH = "Bonnet catch or safety catch sticking";

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

  it("a senior changes a cause's strength by word from the symptom's page", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}${BONNET}`);
    await hydrated(page);
    const causes = page.getByRole("table", { name: "Causes that show it" });
    const row = causes
      .getByRole("row")
      .filter({ has: page.getByRole("rowheader").getByRole("link", { name: CATCH, exact: true }) });
    const field = row.getByLabel(`New strength for ${CATCH}`);

    // A word not on the scale: its message beside this row's field, and nothing saved.
    const before = await row.locator("[data-strength]").textContent();
    await field.fill("very much");
    await row.getByRole("button", { name: "Save strength" }).click();
    await row.getByText(/Say how strongly in one of the words/).waitFor();
    await expect(field.getAttribute("aria-invalid")).resolves.toBe("true");
    await expect(row.locator("[data-strength]").textContent()).resolves.toBe(before);

    const after = describeStrength(strengthOf("now and then")!);
    await field.fill("now and then");
    await row.getByRole("button", { name: "Save strength" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `“${CATCH}”: ${before} → ${after}` })
      .waitFor();
    await row.locator("[data-strength]", { hasText: after }).waitFor();
    // On a phone the rows stack: the page itself never scrolls sideways.
    await page.setViewportSize({ width: 375, height: 812 });
    await expect(
      page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth),
    ).resolves.toBeLessThanOrEqual(0);
    await page.setViewportSize({ width: 1280, height: 900 });
    // It is the same link the cause's page shows.
    await row.getByRole("link", { name: CATCH }).click();
    await page.getByRole("heading", { level: 1, name: CATCH }).waitFor();
    await page
      .getByRole("table", { name: "Its links" })
      .getByRole("row")
      .filter({
        has: page.getByRole("link", { name: "Bonnet will not open from the release lever", exact: true }),
      })
      .locator("[data-strength]", { hasText: after })
      .waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("a technician reads the symptom and its causes without the editor or fields", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}${BONNET}`);
    const causes = page.getByRole("table", { name: "Causes that show it" });
    await causes.getByRole("rowheader").getByRole("link", { name: CATCH, exact: true }).waitFor();
    expect(await causes.locator("[data-strength]").count()).toBeGreaterThan(1);
    expect(await page.locator("input[data-strength-field]").count()).toBe(0);
    expect(await page.getByRole("button", { name: "Save strength" }).count()).toBe(0);
    expect(await page.getByText("Edit this symptom").count()).toBe(0);
    await page.close();
  });
});
