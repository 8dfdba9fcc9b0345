import { describe, expect, it } from "vitest";
import { ROLE_HOME } from "~/domain/permissions";
import { DEMO_PEOPLE } from "../../seeds/demo/people";
import { baseUrl, signInAs, signOut, useBrowser } from "./browser";

const browser = useBrowser();
const AREA_HEADINGS: Record<string, string> = {
  "/board": "Board",
  "/cases": "Cases",
  "/desk": "Front desk",
  "/settings": "Workshop settings",
  "/kb": "Knowledge base",
};

describe("sign-in round trip against the fake provider", () => {
  for (const person of DEMO_PEOPLE.filter((p) => p.workshop === "bramblegate")) {
    it(`signs ${person.role} ${person.name} in and lands on that role's home`, async () => {
      await browser.clearCookies();
      const { page, errors } = await browser.newPage();
      await signInAs(page, person.login);
      const home = ROLE_HOME[person.role!];
      expect(new URL(page.url()).pathname).toBe(home);
      await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(AREA_HEADINGS[home]);
      await expect(page.getByRole("banner").locator("summary").textContent()).resolves.toContain(person.name);
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it("moves between the areas from the navigation, then signs out", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    const nav = page.getByRole("navigation", { name: "Areas" });
    for (const [label, path, heading] of [
      ["Cases", "/cases", "Cases"],
      ["Knowledge base", "/kb", "Knowledge base"],
      ["Settings", "/settings", "Workshop settings"],
      ["Board", "/board", "Board"],
    ]) {
      await nav.getByRole("link", { name: label }).click();
      await page.waitForURL(`${baseUrl()}${path}`);
      // Client-side navigation: the address changes first, the new screen follows.
      await page.getByRole("heading", { level: 1, name: heading, exact: true }).waitFor();
    }
    await signOut(page);
    await page.waitForURL(`${baseUrl()}/`);
    const res = await page.goto(`${baseUrl()}/board`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    expect(res?.status()).toBe(200);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("guides a newcomer without an invitation to set up a workshop, and refuses bad input", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "sam-newcomer");
    expect(new URL(page.url()).pathname).toBe("/welcome");
    await page.getByLabel("Workshop name").fill("x");
    await page.getByLabel("Labour rate per hour").fill("-3");
    await page.getByRole("button", { name: "Create the workshop" }).click();
    await page.getByText("Give the workshop a name of at least 2 characters").waitFor();
    await page.getByText("The labour rate cannot be negative").waitFor();
    await page.getByLabel("Workshop name").fill("Newcomer Test Bay");
    await page.getByLabel("Labour rate per hour").fill("72.50");
    await page.getByRole("button", { name: "Create the workshop" }).click();
    await page.waitForURL(`${baseUrl()}/settings`);
    await page.getByRole("heading", { level: 1, name: "Workshop settings" }).waitFor();
    await expect(page.getByLabel("Name", { exact: true }).inputValue()).resolves.toBe("Newcomer Test Bay");
    await page
      .getByRole("navigation", { name: "Areas" })
      .getByRole("link", { name: "Knowledge base" })
      .click();
    await page.waitForURL(`${baseUrl()}/kb`);
    await page.getByRole("heading", { level: 1, name: "Knowledge base" }).waitFor();
    // The starter knowledge base came with the new workshop.
    const symptomsCount = Number(await page.locator("dt:text('Symptoms') + dd").textContent());
    expect(symptomsCount).toBeGreaterThanOrEqual(30);
    await page.close();
  });
});
