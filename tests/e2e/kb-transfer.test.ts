// A senior takes a copy of the knowledge base and brings a file in: a spoilt file is refused with
// each problem named at the file field and nothing changes; a good one adds its new symptom, makes
// a new version and says what it did. A technician can download but not import.
import { readFile } from "node:fs/promises";
import { describe, expect, it } from "vitest";
import type { KnowledgeDocument } from "~/domain/knowledge-document";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();

describe("knowledge-base files", () => {
  it("a senior downloads the base, is refused a spoilt file with reasons, then imports a new symptom", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb`);
    await page.getByRole("link", { name: "Import or export a file" }).click();
    await page.getByRole("heading", { level: 1, name: "Knowledge-base files" }).waitFor();
    await hydrated(page);
    const version = async () =>
      Number((await page.getByText(/^Version \d+:/).textContent())!.match(/\d+/)![0]);
    const before = await version();

    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download as a file (JSON)" }).click(),
    ]);
    const doc = JSON.parse(await readFile((await download.path())!, "utf8")) as KnowledgeDocument;
    expect(doc.format).toBe("ramplight.knowledge-base");
    expect(doc.symptoms.length).toBeGreaterThanOrEqual(110);

    const spoilt = structuredClone(doc);
    spoilt.symptomLinks[0].p = 1.7;
    const bleed = spoilt.checks.find((c) => c.cautions.includes("brake_hydraulics"))!;
    bleed.cautions = bleed.cautions.filter((c) => c !== "brake_hydraulics");
    const file = (name: string, d: unknown) => ({
      name,
      mimeType: "application/json",
      buffer: Buffer.from(JSON.stringify(d)),
    });
    await page.getByLabel("Knowledge-base file").setInputFiles(file("spoilt.json", spoilt));
    await page.getByRole("button", { name: "Check and import" }).click();
    await page.getByText("spoilt.json was not imported and nothing changed").waitFor();
    const problems = page.getByRole("list", { name: "Problems in the file" });
    await problems.getByText("a probability is at most 1").waitFor();
    await problems.getByText(`checks.${spoilt.checks.indexOf(bleed)} (${bleed.key})`).waitFor();
    await problems.getByText(/does not carry: brake hydraulics/).waitFor();
    await expect(page.getByLabel("Knowledge-base file").getAttribute("aria-invalid")).resolves.toBe("true");
    expect(await version()).toBe(before);

    await page
      .getByLabel("Knowledge-base file")
      .setInputFiles({ name: "not-json.json", mimeType: "application/json", buffer: Buffer.from("{ nope") });
    await page.getByRole("button", { name: "Check and import" }).click();
    await page.getByText("not-json.json was not imported").waitFor();
    await page.getByText(/it is not JSON/).waitFor();

    const good = structuredClone(doc);
    const pads = good.causes.find((c) => c.level === "failure_mode" && c.system === "brakes")!;
    good.symptoms.push({
      key: "rattle_from_caliper_on_cobbles",
      name: "Rattle from a front wheel over cobbles",
      synonyms: ["rattles on cobbles"],
      system: "brakes",
      kind: "noise",
      conditions: ["over bumps"],
      leak: 0.02,
    });
    good.symptomLinks.push({ symptom: "rattle_from_caliper_on_cobbles", cause: pads.key, p: 0.35 });
    await page.getByLabel("Knowledge-base file").setInputFiles(file("with-rattle.json", good));
    await page.getByRole("button", { name: "Check and import" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `as version ${before + 1}` })
      .waitFor();
    await page.getByRole("status").filter({ hasText: "1 symptoms added" }).waitFor();
    expect(await version()).toBe(before + 1);

    await page.goto(`${baseUrl()}/kb`);
    await page.getByText("Rattle from a front wheel over cobbles").first().waitFor({ state: "attached" });
    await page.goto(`${baseUrl()}/settings/audit`);
    await page
      .getByText(/imported the knowledge base “.*” as version/)
      .first()
      .waitFor();
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("a technician may download the base but has no import, and the import page refuses them", async () => {
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/kb`);
    await page.getByRole("link", { name: "Download as a file" }).waitFor();
    expect(await page.getByRole("link", { name: "Import or export a file" }).count()).toBe(0);
    const res = await page.goto(`${baseUrl()}/kb/transfer`);
    expect(res!.status()).toBe(403);
    await page.close();
  });
});
