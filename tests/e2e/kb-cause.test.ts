// A senior finds a failure mode in the cause tree, reads its links in words and figures, and
// changes how often it shows a symptom by a word; a wrong word gets its message at that link's
// field and changes nothing. A technician reads the same page without the forms.
import { describe, expect, it } from "vitest";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();

describe("a cause's links in words", () => {
  it("a senior changes a symptom link by word, and a wrong word is refused at its field", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb`);
    await hydrated(page);
    await page.getByText("Brakes", { exact: true }).first().click();
    await page
      .getByRole("link", { name: "Pad vibration from missing shims, dry slides or glazed pads" })
      .click();
    await page.getByRole("heading", { level: 1, name: /Pad vibration from missing shims/ }).waitFor();
    await hydrated(page);

    const shows = page.getByRole("list", { name: "Symptoms it shows" });
    const squeal = shows.getByRole("listitem").first();
    const name = (await squeal.getAttribute("aria-label"))!;
    const field = squeal.getByLabel(`New strength for ${name}`);

    await field.fill("very much");
    await squeal.getByRole("button", { name: "Save strength" }).click();
    await squeal.getByText(/Say how strongly in one of the words/).waitFor();
    await expect(field.getAttribute("aria-invalid")).resolves.toBe("true");

    const again = page.getByRole("list", { name: "Symptoms it shows" }).getByRole("listitem", { name });
    await again.getByLabel(`New strength for ${name}`).fill("often");
    await again.getByRole("button", { name: "Save strength" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `“${name}”:` })
      .filter({ hasText: "→ often (60%)" })
      .waitFor();
    await expect(
      page
        .getByRole("list", { name: "Symptoms it shows" })
        .getByRole("listitem", { name })
        .locator("[data-strength]")
        .textContent(),
    ).resolves.toBe("often (60%)");

    await page.goto(`${baseUrl()}/settings/audit`);
    await page.getByText(`shows as “${name}”: from`).first().waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("a technician reads the links without the forms", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/kb`);
    await page.getByText("Brakes", { exact: true }).first().click();
    await page
      .getByRole("link", { name: "Pad vibration from missing shims, dry slides or glazed pads" })
      .click();
    await page.getByRole("heading", { name: "Checks that find it" }).waitFor();
    expect(await page.locator("[data-strength]").count()).toBeGreaterThan(1);
    expect(await page.getByRole("button", { name: "Save strength" }).count()).toBe(0);
    await page.close();
  });
});
