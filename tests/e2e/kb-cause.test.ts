// A senior finds a failure mode in the cause tree, reads its links in words and figures in one
// table, and changes how often it shows a symptom by a word; a wrong word gets its message at that
// link's field and changes nothing; the keys walk the rows' fields. A technician reads the same
// table, sorts and filters it, without the forms.
import { afterAll, describe, expect, inject, it } from "vitest";
import { loadAccount } from "~/auth/accounts.server";
import { asMember } from "~/auth/guards.server";
import { loadCaseForChange } from "~/cases/case.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { createDb } from "~/db/client.server";
import { seedId } from "../../seeds/ids";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
afterAll(() => pool.end());

/** A concluded case of its own: the owner's squeal, confirmed as pads missing their shims. */
async function concludedSquealCase() {
  const priya = asMember((await loadAccount(db, seedId("user:priya-hale")))!);
  const opened = await openCase(db, priya, {
    vehicleId: seedId("vehicle:orlan-brisk"),
    mileageKm: 70_000,
    complaint: "Squeals every time I brake.",
  });
  await recordObservation(db, priya, await loadCaseForChange(db, priya, opened.id), {
    symptomId: kbId("bramblegate", "symptom", "squeal_braking"),
    present: true,
    source: "owner",
  });
  const c = await loadCaseForChange(db, priya, opened.id);
  await conclude(db, priya, c, {
    causeId: kbId("bramblegate", "cause", "brake_pad_noise"),
    notes: "Shims missing; quiet after refit.",
    version: c.version,
  });
  return c.number;
}

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

    // The impact preview: weakening the squeal link moves the case confirmed as this cause.
    const number = await concludedSquealCase();
    const links = page.getByRole("table", { name: "Its links" });
    const rowNamed = (name: string | RegExp) =>
      links
        .getByRole("row")
        .filter({ has: page.getByRole("rowheader").getByRole("link", { name, exact: true }) });
    const link = rowNamed(/squeal/i).first();
    await link.getByLabel(/^New strength for/).fill("rarely");
    await link.getByRole("button", { name: "Preview the effect" }).click();
    const effect = page.getByRole("status", { name: "Effect on cases with a confirmed cause" });
    await effect.getByText(/At rarely \(5%\), of \d+ cases with a confirmed cause/).waitFor();
    await effect.getByRole("list", { name: "Cases that moved" }).getByText(`case #${number}`).waitFor();
    await effect.getByText(/confirmed cause ranked first: \d+ → \d+/).waitFor();

    // The first row below the headers: the strongest symptom link, as the page lists them.
    const first = links.getByRole("row").nth(1);
    const name = (await first.getByRole("rowheader").getByRole("link").textContent())!;
    const squeal = rowNamed(name);
    const field = squeal.getByLabel(`New strength for ${name}`);

    await field.fill("very much");
    await squeal.getByRole("button", { name: "Save strength" }).click();
    await squeal.getByText(/Say how strongly in one of the words/).waitFor();
    await expect(field.getAttribute("aria-invalid")).resolves.toBe("true");

    // Down goes to the next row's field; Up comes back; Escape puts back what was typed over;
    // Enter saves.
    await hydrated(page);
    const again = rowNamed(name).getByLabel(`New strength for ${name}`);
    await again.focus();
    await page.keyboard.press("ArrowDown");
    const next = links.getByRole("row").nth(2).locator("input[data-strength-field]");
    await expect(next.evaluate((el) => el === document.activeElement)).resolves.toBe(true);
    await page.keyboard.press("ArrowUp");
    await expect(again.evaluate((el) => el === document.activeElement)).resolves.toBe(true);
    await again.fill("often");
    await again.press("Enter");
    await page
      .getByRole("status")
      .filter({ hasText: `“${name}”:` })
      .filter({ hasText: "→ often (60%)" })
      .waitFor();
    // The page's data is read again after the save; the row shows the new strength once it lands.
    await rowNamed(name)
      .locator("[data-strength]", { hasText: /^often \(60%\)$/ })
      .waitFor();

    await page.goto(`${baseUrl()}/settings/audit`);
    await page.getByText(`shows as “${name}”: from`).first().waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("a senior moves a failure mode under another component, and the tree shows it there", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb/causes/${kbId("bramblegate", "cause", "brake_disc_corrosion")}`);
    await hydrated(page);
    const name = "Disc face corroded or scored after standing"; // seeds/kb/brakes.ts
    await page.getByText("Edit this cause").click();
    const under = page.getByLabel("Belongs under");
    const current = await under.inputValue();
    const options = await under
      .locator("option")
      .evaluateAll((os) =>
        os.map((o) => ({ value: (o as HTMLOptionElement).value, text: o.textContent ?? "" })),
      );
    const target = options.find((o) => o.value !== current && o.text.startsWith("Brakes ›"))!;
    await under.selectOption(target.value);
    await page.getByRole("button", { name: "Save the cause" }).click();
    const component = target.text.split(" › ")[1];
    await page
      .getByRole("status")
      .filter({ hasText: `now under “${component}”` })
      .waitFor();

    await page.goto(`${baseUrl()}/kb`);
    await hydrated(page);
    await page.getByText("Brakes", { exact: true }).first().click();
    // The component's branch: the tree row whose own link is the component.
    const branch = page.locator("li", { has: page.getByRole("link", { name: component, exact: true }) });
    await branch.getByRole("link", { name }).waitFor();
    expect(errors).toEqual([]);
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
    const links = page.getByRole("table", { name: "Its links" });
    await links.waitFor();
    expect(await links.locator("[data-strength]").count()).toBeGreaterThan(1);
    expect(await links.getByRole("cell", { name: "Check", exact: true }).count()).toBeGreaterThan(0);
    expect(await page.locator("input[data-strength-field]").count()).toBe(0);
    expect(await page.getByRole("button", { name: "Save strength" }).count()).toBe(0);
    // Sorting and the filter are there for readers too.
    await hydrated(page);
    await page.getByLabel("Filter links").fill("check");
    await page.getByText(/^\d+ of \d+ links shown$/).waitFor();
    expect(await links.getByRole("cell", { name: "Symptom", exact: true }).count()).toBe(0);
    expect(await page.getByText("Edit this cause").count()).toBe(0);
    await page.close();
  });
});
