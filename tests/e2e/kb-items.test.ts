// A senior adds to the knowledge base from its pages: a new symptom (a malformed trouble code is
// refused at its field, SAE J2012), a new check (steps on the ramp without the lifting caution are
// refused at the cautions), and keeps a concluded case as a test case, which its page then lists.
import { describe, expect, it } from "vitest";
import { seedId } from "../../seeds/ids";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();

describe("adding to the knowledge base", () => {
  it("adds a symptom and a check, refusing a bad code and a missing caution at their fields", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb`);
    await hydrated(page);
    await page.getByRole("link", { name: "New symptom" }).click();
    await page.getByRole("heading", { level: 1, name: "A new symptom" }).waitFor();
    await hydrated(page);
    await page.getByLabel("Name, as a technician says it").fill("Rear wiper parks off the screen edge");
    await page.getByLabel("System").selectOption({ label: "Electrical" });
    await page.getByLabel("Kind").selectOption("trouble_code");
    await page.getByLabel(/^Trouble code/).fill("Q1234");
    await page.getByRole("button", { name: "Add the symptom" }).click();
    await page.locator("#code-error").waitFor();
    await hydrated(page);
    await page.getByLabel("Kind").selectOption("electrical");
    await page.getByLabel(/^Trouble code/).fill("");
    await page.getByRole("button", { name: "Add the symptom" }).click();
    await page.getByRole("heading", { level: 1, name: "Rear wiper parks off the screen edge" }).waitFor();

    await page.goto(`${baseUrl()}/kb/checks/new`);
    await hydrated(page);
    await page.getByLabel("Name").fill("Rear wiper park position on the ramp");
    await page
      .getByLabel("Steps, one per line")
      .fill("Put the car on the ramp.\nRun the rear wiper and stop it.");
    await page.getByRole("button", { name: "Add the check" }).click();
    await page.locator("#cautions-error").waitFor();
    await hydrated(page);
    await page.getByLabel("lifting", { exact: false }).first().check();
    await page.getByRole("button", { name: "Add the check" }).click();
    await page.getByRole("heading", { level: 1, name: "Rear wiper park position on the ramp" }).waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("keeps a concluded case as a test case and lists it", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/cases/${seedId("case:b4")}`);
    await hydrated(page);
    await page.getByText("Keep as a test case for the knowledge base").click();
    await page.getByLabel("Name of the test case").fill("Grinding, pads to the backing plate");
    await page.getByRole("button", { name: "Keep it" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "Kept as the test case “Grinding, pads to the backing plate”" })
      .waitFor();
    await page.goto(`${baseUrl()}/kb/test-cases`);
    const kept = page
      .getByRole("list", { name: "Test cases" })
      .getByRole("listitem", { name: "Grinding, pads to the backing plate" });
    await kept.getByText(/Known answer: Brake pads worn to the backing plate · ranked \d+\w\w now/).waitFor();
    await page
      .getByTestId("test-case-summary")
      .getByText(/the known answer ranks first in \d+ of \d+/)
      .waitFor();
    expect(errors).toEqual([]);
    await page.close();
  });
});
