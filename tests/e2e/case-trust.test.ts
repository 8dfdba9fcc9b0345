// What trying the case page as each role found, as journeys in Chromium: stray keys must record
// nothing, every recording can be undone, quantities follow the workshop's units, the why says what
// was recorded, a concluded case leads with its confirmed cause, the apprentice's phone shows the
// next check first, notes reach the other person, seniors reopen and close, the audit log reads.
// Each journey works on cases of its own, so the order of test files does not matter.
import { afterAll, describe, expect, inject, it } from "vitest";
import { loadAccount } from "~/auth/accounts.server";
import { asMember } from "~/auth/guards.server";
import { recordFinding, recordObservation } from "~/cases/evidence.server";
import { loadCaseForChange } from "~/cases/case.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { createDb } from "~/db/client.server";
import { cases } from "~/db/schema";
import { eq } from "drizzle-orm";
import { seedId } from "../../seeds/ids";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
afterAll(() => pool.end());

const member = async (login: string) => asMember((await loadAccount(db, seedId(`user:${login}`)))!);
const symptom = (key: string) => kbId("bramblegate", "symptom", key);
const check = (key: string) => kbId("bramblegate", "check", key);
const cause = (key: string) => kbId("bramblegate", "cause", key);

async function freshCase(complaint: string, assignTo?: string) {
  const created = await openCase(db, await member("priya-hale"), {
    vehicleId: seedId("vehicle:orlan-brisk"),
    mileageKm: 70_000,
    complaint,
  });
  if (assignTo)
    await db
      .update(cases)
      .set({ assignedMemberId: seedId(`member:${assignTo}`) })
      .where(eq(cases.id, created.id));
  return created;
}

const evidenceCount = async (caseId: string) => {
  const c = await loadCaseForChange(db, await member("priya-hale"), caseId);
  return c.observations.length + c.findings.length;
};

describe("stray keys and undo", () => {
  const browser = useBrowser();

  it("typing whole sentences anywhere on the case page with the palette closed records nothing", async () => {
    const { id } = await freshCase("Judder through the wheel when braking.");
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/cases/${id}`);
    const plan = page.getByRole("list", { name: "Checks, best value first" });
    await plan.waitFor();
    await hydrated(page);

    // Ctrl+K a second time keeps the palette, and the typing, where they are.
    await page.keyboard.press("Control+k");
    await page.keyboard.type("clunk over bumps"); // kept even while the palette's code is still loading
    await page.getByRole("dialog").waitFor();
    await page.keyboard.press("Control+k");
    await expect(page.getByRole("dialog").count()).resolves.toBe(1);
    await expect(page.getByRole("combobox").inputValue()).resolves.toBe("clunk over bumps");
    await page.keyboard.press("Escape");
    await page.getByRole("dialog").waitFor({ state: "detached" });

    const sentences =
      "clunk over bumps, pulls left when braking, needs a new pad{Enter}squeal from the front passenger side{Enter}pp ff nn pass fail";
    const type = async () => {
      for (const part of sentences.split("{Enter}")) {
        await page.keyboard.type(part);
        await page.keyboard.press("Enter");
      }
    };
    await type(); // focus where the palette left it
    await page.locator("main h1").click();
    await type(); // focus on the page
    await plan.locator("[data-step] h3").first().click();
    await type(); // a check has the focus: P or F alone must not record it
    for (let i = 0; i < 6; i++) await page.keyboard.press("Tab");
    await type();
    await page.waitForTimeout(500); // anything sent would have landed by now
    expect(await evidenceCount(id)).toBe(0);
    await expect(page.getByRole("button", { name: "Undo" }).count()).resolves.toBe(0);
    // A sentence typed into a reading field is sent as a reading and refused (400): nothing lands.
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("offers Undo after recording a check or an observation, and Undo takes it back", async () => {
    const { id } = await freshCase("Judder when braking from speed.");
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/cases/${id}`);
    await hydrated(page);
    const first = page.locator("[data-step]").first();
    const name = await first.getAttribute("aria-label");
    await first.getByRole("button", { name: "Passed" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `Recorded “${name}”: passed.` })
      .waitFor();
    await expect.poll(() => evidenceCount(id)).toBe(1);
    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => evidenceCount(id)).toBe(0);

    await page.keyboard.press("Control+k");
    await page.keyboard.type("judder when braking");
    await page
      .getByRole("option")
      .first()
      .filter({ hasText: "Vibration through the steering wheel under braking" })
      .waitFor();
    await page.keyboard.press("Enter");
    await page.keyboard.press("Escape");
    await page
      .getByRole("status")
      .filter({ hasText: "Recorded “Vibration through the steering wheel under braking” as present." })
      .waitFor();
    await expect.poll(() => evidenceCount(id)).toBe(1);
    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => evidenceCount(id)).toBe(0);
    expect(errors.filter((e) => !/status of 4\d\d/.test(e))).toEqual([]);
    await page.close();
  });
});

describe("the workshop's units and the why", () => {
  const browser = useBrowser();

  it("an imperial workshop enters and sees miles, with thousands separators, and limits in inches", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/cases/new`);
    await expect(page.title()).resolves.toBe("Open a case — Ramplight");
    await page.getByLabel("Mileage (miles)").fill("84,000");
    await page.getByLabel("Complaint, in the owner's words").fill("The steering wheel shakes when I brake.");
    await page.getByRole("button", { name: "Open the case" }).click();
    await page.waitForURL(/\/cases\/[0-9a-f-]{36}$/);
    await page.getByText("84,000 miles").waitFor();
    const caseId = page.url().split("/").pop()!;

    // Put the run-out check on the plan, as a technician's first findings would.
    const c = await loadCaseForChange(db, await member("priya-hale"), caseId);
    await recordObservation(db, await member("priya-hale"), c, {
      symptomId: symptom("vibration_braking"),
      present: true,
      source: "technician",
    });
    await page.reload();
    const step = page.locator(
      '[data-step][aria-label="Measure front disc lateral run-out with a dial gauge"]',
    );
    // Past the first three the plan's checks are folded; open it if it is one of those.
    const open = step.getByRole("button", { name: /^Open / });
    if (await open.count()) await open.click();
    const field = step.getByRole("textbox");
    await expect(field.getAttribute("placeholder")).resolves.toBe("limit: at most 0.00197 in (0.05 mm)");
    await field.fill("65 %");
    await field.press("Enter");
    const alert = step.getByRole("alert");
    await alert
      .filter({ hasText: "That reading is a percentage; this check needs a length, such as 0.05 mm." })
      .waitFor();
    // The message sits at the field it is about, not at the top of the plan.
    const [f, a] = [await field.boundingBox(), await alert.boundingBox()];
    expect(Math.abs(a!.y - f!.y)).toBeLessThan(200);
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await page.close();
  });

  it("each line of the why says what was recorded and which way it pushes", async () => {
    const { id } = await freshCase("Squeal when braking? No, a judder.");
    const c = await loadCaseForChange(db, await member("priya-hale"), id);
    const priya = await member("priya-hale");
    await recordObservation(db, priya, c, {
      symptomId: symptom("squeal_braking"),
      present: false,
      source: "technician",
    });
    await recordObservation(db, priya, c, {
      symptomId: symptom("vibration_braking"),
      present: true,
      source: "technician",
    });
    await recordFinding(db, priya, c, { checkId: check("brake_road_test"), result: "fail" });
    await browser.clearCookies();
    const { page } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/cases/${id}`);
    for (const summary of await page
      .locator('[aria-label="Likely causes, most likely first"] summary')
      .all()) {
      if (!(await summary.evaluate((s) => (s.parentElement as HTMLDetailsElement).open)))
        await summary.click();
    }
    const lines = page.locator("[data-why]");
    await lines.first().waitFor();
    const texts = await lines.evaluateAll((ls) =>
      ls.map((l) => ({ text: l.textContent ?? "", up: l.getAttribute("data-why") === "up" })),
    );
    const squeal = texts.filter((t) => t.text.startsWith("Squeal when braking"));
    expect(squeal.length).toBeGreaterThan(0);
    for (const t of squeal)
      expect(t.text).toMatch(/^Squeal when braking: absent(▲ makes it more likely|▼ makes it less likely)$/);
    for (const t of texts)
      expect(t.text).toMatch(t.up ? /▲ makes it more likely$/ : /▼ makes it less likely$/);
    expect(
      texts.some(
        (t) => t.text === "Vibration through the steering wheel under braking: present▲ makes it more likely",
      ),
    ).toBe(true);
    expect(texts.some((t) => t.text.startsWith("Road test the brakes from speed: failed"))).toBe(true);
    await expect(page.getByText("Points to it").count()).resolves.toBe(0);
    await page.close();
  });
});

describe("each person's screen", () => {
  const browser = useBrowser();

  it("a concluded case shows the advisor its confirmed cause first, the ranking folded below", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "dana-reyes");
    await page.goto(`${baseUrl()}/cases/${seedId("case:b4")}`);
    const confirmed = page.getByTestId("confirmed-cause");
    await confirmed.getByText("Brake pads worn to the backing plate").waitFor();
    await expect(page.getByRole("heading", { name: "Likely causes" }).count()).resolves.toBe(0);
    await page.getByText("How the likely causes stood").click();
    const likely = page.getByRole("heading", { name: "Likely causes" });
    await likely.waitFor();
    expect((await confirmed.boundingBox())!.y).toBeLessThan((await likely.boundingBox())!.y);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("seniors reopen a concluded case with a reason, and close a concluded one; both are in the history", async () => {
    const { id } = await freshCase("Grinding from the front.");
    const priya = await member("priya-hale");
    const c = await loadCaseForChange(db, priya, id);
    await conclude(db, priya, c, {
      causeId: cause("brake_pads_metal"),
      notes: "Pads to the backing plate.",
      version: c.version,
    });
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/cases/${id}`);
    await page.getByText("Reopen the case…").click();
    await page.getByLabel("Why it is reopened").fill("Owner reports the grinding is back after the pads.");
    await page.getByRole("button", { name: "Reopen", exact: true }).click();
    await page.getByRole("status").filter({ hasText: "Case reopened" }).waitFor();
    await page.getByRole("heading", { name: "Check plan" }).waitFor();
    await page.getByText("History").click();
    await page
      .getByRole("list", { name: "Case history" })
      .getByText("reopened it (it was cause confirmed): “Owner reports the grinding is back after the pads.”")
      .waitFor();

    const again = await loadCaseForChange(db, priya, id);
    await conclude(db, priya, again, {
      causeId: cause("brake_disc_corrosion"),
      notes: "Disc scored; replaced.",
      version: again.version,
    });
    await page.reload();
    await page.getByRole("button", { name: "Close the case" }).click();
    await page.getByRole("status").filter({ hasText: "Case closed." }).waitFor();
    const [row] = await db
      .select({ state: cases.state, closedAt: cases.closedAt })
      .from(cases)
      .where(eq(cases.id, id));
    expect(row.state).toBe("closed");
    expect(row.closedAt).not.toBeNull();
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the apprentice's question reaches the senior, and the senior's note reaches the apprentice", async () => {
    const { id, number } = await freshCase("Squeal when braking, front.", "ollie-mbeki");
    await browser.clearCookies();
    const ollie = await browser.newPage();
    await signInAs(ollie.page, "ollie-mbeki");
    await ollie.page.goto(`${baseUrl()}/cases/${id}`);
    await ollie.page
      .getByLabel("What do you need help with?")
      .fill("Is a glazed pad enough to squeal like this?");
    await ollie.page.getByRole("button", { name: "Ask a senior" }).click();
    await ollie.page.getByRole("status").filter({ hasText: "A senior has been asked." }).waitFor();
    await ollie.page.getByText("Send for a senior's sign-off…").click();
    await ollie.page.getByLabel("What you found and the repair").fill("Pads glazed; cleaned and chamfered.");
    await ollie.page.getByRole("button", { name: "Send for a senior's sign-off" }).click();
    await ollie.page.getByRole("status").filter({ hasText: "Sent for a senior's sign-off." }).waitFor();

    await browser.clearCookies();
    const tomas = await browser.newPage();
    await signInAs(tomas.page, "tomas-varga");
    const card = tomas.page
      .getByRole("region", { name: /Needs a senior/ })
      .getByRole("article")
      .filter({ hasText: `#${number}` });
    await card.getByText("Ollie Mbeki asks: “Is a glazed pad enough to squeal like this?”").waitFor();
    await tomas.page.goto(`${baseUrl()}/cases/${id}`);
    await tomas.page
      .getByTestId("question")
      .filter({ hasText: "Is a glazed pad enough to squeal like this?" })
      .waitFor();
    await tomas.page
      .getByLabel("Note for the apprentice")
      .fill("Yes: glazing sings. Check the shims next time.");
    await tomas.page.getByRole("button", { name: "Sign off" }).click();
    await tomas.page.getByRole("status").filter({ hasText: "Signed off." }).waitFor();

    await browser.clearCookies();
    await signInAs(ollie.page, "ollie-mbeki");
    await ollie.page.goto(`${baseUrl()}/cases/${id}`);
    await ollie.page
      .getByTestId("senior-note")
      .filter({ hasText: "Note from Tomas Varga: “Yes: glazing sings. Check the shims next time.”" })
      .waitFor();
    expect([...ollie.errors, ...tomas.errors]).toEqual([]);
    await ollie.page.close();
    await tomas.page.close();
  });

  it("the audit log reads as sentences with links, not codes and JSON", async () => {
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.goto(`${baseUrl()}/settings/audit`);
    const entries = page.getByRole("list", { name: "Audit entries" }).getByRole("listitem");
    await entries.first().waitFor();
    const texts = await entries.allTextContents();
    expect(texts.length).toBeGreaterThan(5);
    for (const t of texts) {
      expect(t).not.toMatch(/[{}]|"[a-z]+":/);
      expect(t).not.toMatch(/\bcase\.[a-z_]+\b/);
    }
    await page
      .getByRole("link", { name: /^case #\d+$/ })
      .first()
      .click();
    await page.waitForURL(/\/cases\/[0-9a-f-]{36}$/);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe("the apprentice on a phone", () => {
  const browser = useBrowser({ width: 375, height: 812 });

  it("shows the next check, Ask a senior and the evidence before the statistics, with thumb-sized targets", async () => {
    const { id } = await freshCase("Squeal every time I brake.", "ollie-mbeki");
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ollie-mbeki");
    await page.goto(`${baseUrl()}/cases/${id}`);
    const y = async (name: string) =>
      (await page.getByRole("heading", { name, exact: true }).boundingBox())!.y;
    await page.getByRole("heading", { name: "Your next check" }).waitFor();
    const order = [
      await y("Your next check"),
      await y("Not sure?"),
      await y("Evidence"),
      await y("Likely causes"),
    ];
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    // Checks beyond the apprentice's level are one line, not sixty rows before the evidence.
    await expect(page.getByRole("list", { name: "Checks beyond your level" }).count()).resolves.toBe(0);
    await page.getByText(/more checks need a technician or a senior: ask a senior/).waitFor();
    expect(order[2]).toBeLessThan(3_000);
    const header = (await page.getByRole("banner").boundingBox())!;
    expect(header.height).toBeLessThanOrEqual(120);
    // WCAG 2.2 target size: the disclosure summaries are at least 24 px tall; ours are 44.
    for (const s of await page.locator("summary").all()) {
      if (await s.isVisible())
        expect((await s.boundingBox())!.height, (await s.textContent()) ?? "").toBeGreaterThanOrEqual(44);
    }
    await expect(page.getByText("next check ·").isVisible()).resolves.toBe(false); // keyboard hints are for the desk
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(375);
    expect(errors).toEqual([]);
    await page.close();
  });
});
