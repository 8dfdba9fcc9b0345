// The owner side as its people do it: the advisor builds the estimate of a concluded demo case and
// sends it; the owner opens the link from the captured e-mail on a phone, approves two of three
// items and pays the diagnostic fee on the payments fake; the case shows it; the technician is told.
// Figures are the demo workshop's (invented): labour £84.00 an hour, VAT 20 % (HMRC standard rate).
import { rm } from "node:fs/promises";
import { beforeAll, describe, expect, it } from "vitest";
import { readInbox } from "../fakes/smtp";
import { seedId } from "../../seeds/ids";
import { E2E_ENV } from "../setup/e2e-env";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";

const desk = useBrowser();
const phone = useBrowser({ width: 375, height: 812 });
const CASE = seedId("case:b4"); // 1031: brake pads worn to the backing plate, owner Mirela Stancu

async function mailTo(to: string, kind: RegExp, ms = 15_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    const found = (await readInbox(E2E_ENV.FAKE_MAIL_DIR)).find(
      (m) => m.to.includes(to) && kind.test(m.subject ?? ""),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${to} within ${ms} ms`);
}

describe("telling the owner", () => {
  beforeAll(async () => {
    await rm(E2E_ENV.FAKE_MAIL_DIR, { recursive: true, force: true });
  });

  it("estimate → e-mail → the owner approves two of three on a phone and pays → the case shows it", async () => {
    const { page, errors } = await desk.newPage();
    await signInAs(page, "dana-reyes");
    // The advisor's day starts at the front desk.
    await page.getByRole("heading", { level: 1, name: "Front desk" }).waitFor();
    const waiting = page.getByRole("region", { name: /Waiting for an estimate/ });
    await waiting.getByRole("link", { name: "Build the estimate for case 1031" }).click();
    await page.getByRole("heading", { level: 1, name: "Estimate for the owner" }).waitFor();
    await page.getByRole("button", { name: "Draft from the confirmed cause" }).click();
    await page.getByRole("status").filter({ hasText: "Drafted 2 items" }).waitFor();

    for (const [title, priority] of [
      ["Front discs", "soon"],
      ["Wiper blades", "watch"],
    ] as const) {
      await page.getByLabel("New item, as the owner will read it").fill(title);
      await page.getByLabel("Priority", { exact: true }).selectOption(priority);
      await page.getByRole("button", { name: "Add the item" }).click();
      await page
        .getByRole("status")
        .filter({ hasText: `Item "${title}" added.` })
        .waitFor();
    }
    // A price with three decimals is a slip: the message sits at the field and nothing is added.
    await page.getByLabel("Item", { exact: true }).selectOption({ label: "Front discs" });
    await page.getByLabel("Description").fill("Front discs, pair");
    await page.getByLabel(/Unit price/).fill("90.005");
    await page.getByRole("button", { name: "Add the line" }).click();
    await page.getByText("At most 2 decimals.").waitFor();
    expect(await page.getByLabel(/Unit price/).getAttribute("aria-invalid")).toBe("true");
    await page.getByLabel(/Unit price/).fill("90.00");
    await page.getByRole("button", { name: "Add the line" }).click();
    await page.getByRole("status").filter({ hasText: "Line added." }).waitFor();
    await page.getByLabel("Item", { exact: true }).selectOption({ label: "Wiper blades" });
    await page.getByLabel("Description").fill("Wiper blades, front pair");
    await page.getByLabel(/Unit price/).fill("24.00");
    await page.getByRole("button", { name: "Add the line" }).click();
    await page.getByRole("status").filter({ hasText: "Line added." }).waitFor();
    // By hand: 21.00 + 266.00 + 90.00 + 24.00 = 401.00 net, VAT 80.20, 481.20.
    await page
      .getByRole("region", { name: "If the owner approves everything" })
      .getByText("£481.20")
      .waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await page
      .getByLabel("A message to the owner (optional)")
      .fill("Call us on the workshop line with any question.");
    await page.getByRole("button", { name: "Send to the owner" }).click();
    await page.getByRole("status").filter({ hasText: "Estimate version 1 sent" }).waitFor();
    await page.locator('[data-owner-state="sent"]').waitFor();

    // The owner, on a phone, from the e-mail the outbox delivered.
    const mail = await mailTo("mirela.stancu@mail.example", /what we found/);
    const link = /http:\/\/\S+\/o\/[A-Za-z0-9_-]{43}/.exec(mail.text ?? "")?.[0];
    expect(link).toBeTruthy();
    expect(link!.startsWith(baseUrl())).toBe(true);
    const owner = (await phone.newPage()).page;
    await owner.goto(link!);
    await owner.getByRole("heading", { level: 1, name: /Your 2021 Pellin Tern/ }).waitFor();
    await owner.getByText("We measured brake pad friction material thickness: 0.8 mm").waitFor();
    expect(await owner.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    expect(await seriousViolations(owner)).toEqual([]);
    const choose = async (choices: [RegExp, "Approve" | "Decline"][]) => {
      for (const [item, choice] of choices)
        await owner.getByRole("group", { name: item }).getByLabel(choice).check();
    };
    // Leaving one out is refused beside it.
    const pads: [RegExp, "Approve"] = [/Brake pads worn/, "Approve"];
    const discs: [RegExp, "Approve"] = [/Front discs/, "Approve"];
    await choose([pads, discs]);
    await owner.getByRole("button", { name: /Send my answer/ }).click();
    await owner.getByText("Choose approve or decline.").waitFor();
    await choose([pads, discs, [/Wiper blades/, "Decline"]]);
    await owner.getByLabel("A note for the workshop (optional)").fill("Wipers next time, thanks.");
    await owner.getByRole("button", { name: /Send my answer/ }).click();
    await owner.getByRole("status").filter({ hasText: "you approved 2 of 3 items" }).waitFor();
    // Approved with what is owed: 21.00 + 266.00 + 90.00 = 377.00, VAT 75.40 → 452.40 (by hand).
    await owner
      .getByRole("region", { name: "What you approved, with what is owed" })
      .getByText("£452.40")
      .waitFor();

    // The paper copy: A4 pages from Chromium's own print.
    const pdf = Buffer.from(await owner.pdf({ preferCSSPageSize: true, printBackground: false }));
    const pages = pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? [];
    expect(pages.length).toBeGreaterThanOrEqual(1);
    expect(pages.length).toBeLessThanOrEqual(3);
    // A4 is 210 × 297 mm = 595.28 × 841.89 pt (ISO 216); Chromium rounds to its own units.
    const box = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf.toString("latin1"));
    expect(Math.abs(Number(box?.[1]) - 595.28)).toBeLessThan(1.5);
    expect(Math.abs(Number(box?.[2]) - 841.89)).toBeLessThan(1.5);
    if (process.env.RL_KEEP_PDF)
      await (await import("node:fs/promises")).writeFile(process.env.RL_KEEP_PDF, pdf);

    // Paying the diagnostic fee on the payments fake's page, then back on the owner's page.
    await owner.getByRole("button", { name: /Pay the diagnostic fee/ }).click();
    await owner.waitForURL((u) => u.pathname.startsWith("/pay/"));
    await owner.getByRole("button", { name: "Pay", exact: true }).click();
    await owner.waitForURL((u) => u.toString().startsWith(link!));
    await owner.getByText("Paid, thank you").waitFor();

    // The advisor sees it on the case's estimate; the technician got the notice.
    await page.goto(`${baseUrl()}/cases/${CASE}/estimate`);
    await page.locator('[data-owner-state="paid"]').waitFor();
    await page.getByText("Wiper blades declined").waitFor();
    const notice = await mailTo("priya@bramblegate.example", /the owner answered/);
    expect(notice.text).toContain("approved 2 of 3 items");
    // The one refusal on purpose (the three-decimal price) is a 400 the browser logs; nothing else.
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
  });
});
