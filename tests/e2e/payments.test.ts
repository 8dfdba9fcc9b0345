// An admin refunds a paid diagnostic fee on /settings/payments, at phone width. The payment is
// taken for real against the e2e payments fake: a checkout session through the SDK, Pay on the
// fake's hosted page, its signed webhook to the running server. The amount is invented (common
// practice, no published source).
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, inject, it } from "vitest";
import { createDb } from "~/db/client.server";
import { payments, sentEstimates } from "~/db/schema";
import { startCheckout } from "~/payments/checkout.server";
import { seedId } from "../../seeds/ids";
import { E2E_ENV } from "../setup/e2e-env";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";
import { SAMPLE_SENT_DOCUMENT } from "../setup/sent-document";

const browser = useBrowser({ width: 375, height: 800 });
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
afterAll(() => pool.end());

async function paidPayment(): Promise<string> {
  Object.assign(process.env, {
    PAYMENTS_SECRET_KEY: E2E_ENV.PAYMENTS_SECRET_KEY,
    PAYMENTS_API_URL: E2E_ENV.PAYMENTS_API_URL,
    PAY_WEBHOOK_SECRET: E2E_ENV.PAY_WEBHOOK_SECRET,
  });
  const workshopId = seedId("workshop:bramblegate");
  const caseId = seedId("case:b1");
  const [sent] = await db
    .insert(sentEstimates)
    .values({
      workshopId,
      caseId,
      version: 900,
      toEmail: "owner@mail.example",
      document: SAMPLE_SENT_DOCUMENT,
    })
    .returning({ id: sentEstimates.id });
  const { paymentId, url } = await startCheckout(db, {
    workshopId,
    caseId,
    sentEstimateId: sent!.id,
    purpose: "diagnostic_fee",
    amountMinor: 4500,
    currency: "GBP",
    description: "Diagnostic fee, case #1041",
    successUrl: `${baseUrl()}/board`,
    cancelUrl: `${baseUrl()}/board`,
  });
  // The owner presses Pay on the hosted page; the fake sends its webhook before redirecting.
  const paid = await fetch(`${url}/pay`, { method: "POST", redirect: "manual" });
  expect(paid.status).toBe(302);
  const [row] = await db.select().from(payments).where(eq(payments.id, paymentId));
  expect(row?.status).toBe("paid");
  return paymentId;
}

describe("payments settings", () => {
  it("lets an admin refund a paid payment, after confirming, at 375 px", async () => {
    const paymentId = await paidPayment();
    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "ines-okafor");
    await page.getByRole("link", { name: "Payments" }).click();
    await page.getByRole("heading", { level: 1, name: "Payments" }).waitFor();
    const item = page.getByRole("listitem", { name: "Case #1041, £45.00" });
    await item.getByText("Paid", { exact: true }).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    expect(await seriousViolations(page)).toEqual([]);

    // Nothing is refunded by the first click: it only shows what would happen.
    await item.getByText("Refund…").click();
    await item.getByText("Give £45.00 back to the owner of case #1041?").waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await item.getByRole("button", { name: "Yes, refund £45.00" }).click();
    await page.getByRole("status").filter({ hasText: "Refunded £45.00." }).waitFor();
    await item.getByText("Refunded", { exact: true }).waitFor();
    expect(await item.getByRole("button", { name: /refund/i }).count()).toBe(0);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);

    const [row] = await db.select().from(payments).where(eq(payments.id, paymentId));
    expect(row).toMatchObject({ status: "refunded" });
    expect(row?.refundId).toMatch(/^re_test_/);
    expect(errors).toEqual([]);
    await page.close();
  });
});
