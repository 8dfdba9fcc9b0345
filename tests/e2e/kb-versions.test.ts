// A case keeps the knowledge-base version it was ranked with: after a senior's change the
// technician's case still shows the same ranking and says a newer version exists; asked, it is
// ranked with the newer one, and the senior's list of versions names the change.
import { afterAll, describe, expect, inject, it } from "vitest";
import { loadAccount } from "~/auth/accounts.server";
import { asMember } from "~/auth/guards.server";
import { loadCase, loadCaseForChange } from "~/cases/case.server";
import { caseView } from "~/cases/diagnosis.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { createDb } from "~/db/client.server";
import { setLinkStrength } from "~/kb/cause-links.server";
import { seedId } from "../../seeds/ids";
import { kbId } from "../../seeds/knowledge";
import { baseUrl, hydrated, signInAs, useBrowser } from "./browser";

const browser = useBrowser();
const { db, pool } = createDb(inject("e2eDatabaseUrl"), { max: 2 });
afterAll(() => pool.end());
const member = async (login: string) => asMember((await loadAccount(db, seedId(`user:${login}`)))!);

describe("a case and the knowledge base's versions", () => {
  it("keeps its ranking after a senior's change, and is ranked with the newer version when asked", async () => {
    const priya = await member("priya-hale");
    const squeal = kbId("bramblegate", "symptom", "squeal_braking");
    const opened = await openCase(db, priya, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 70_000,
      complaint: "Squeals at every stop in town.",
    });
    await recordObservation(db, priya, await loadCaseForChange(db, priya, opened.id), {
      symptomId: squeal,
      present: true,
      source: "owner",
    });

    await browser.clearCookies();
    const { page, errors } = await browser.newPage();
    await signInAs(page, "priya-hale");
    await page.goto(`${baseUrl()}/cases/${opened.id}`);
    await hydrated(page);
    const causes = page.getByRole("list", { name: "Likely causes, most likely first" });
    const top = causes.getByRole("listitem").first();
    const before = await top.innerText();
    const version = page.getByTestId("kb-version");
    const v0 = Number((await version.innerText()).match(/version (\d+)/)![1]);
    await version.getByText(`Ranked with knowledge-base version ${v0}, the newest.`).waitFor();

    // Meanwhile a senior says the cause ranked first shows as a squeal only rarely.
    const view = await caseView(db, priya, await loadCase(db, priya, opened.id));
    await setLinkStrength(db, await member("tomas-varga"), {
      link: "symptom",
      causeId: view.diagnosis.causes[0].id,
      otherId: squeal,
      p: 0.05,
    });
    await page.reload();
    await hydrated(page);
    await version.getByRole("heading", { name: `Ranked with knowledge-base version ${v0}` }).waitFor();
    await version.getByText(`Version ${v0 + 1} is newer.`, { exact: false }).waitFor();
    expect(await causes.getByRole("listitem").first().innerText()).toBe(before);

    await version.getByRole("button", { name: `Rank with version ${v0 + 1}` }).click();
    await page.getByText(`Ranked again with knowledge-base version ${v0 + 1}`).waitFor();
    await version.getByText(`Ranked with knowledge-base version ${v0 + 1}, the newest.`).waitFor();
    await expect.poll(() => causes.getByRole("listitem").first().innerText()).not.toBe(before);
    expect(errors).toEqual([]);

    // The senior's page lists the version and what made it.
    await browser.clearCookies();
    await signInAs(page, "tomas-varga");
    await page.goto(`${baseUrl()}/kb`);
    await hydrated(page);
    await page.getByText(`Versions: now at ${v0 + 1}`).click();
    await page
      .getByTestId("kb-versions")
      .getByText(/rarely/)
      .first()
      .waitFor();
  });
});
