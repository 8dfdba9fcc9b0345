// axe-core on every page, as each person who uses it sees it, on a desk screen, a 375 px phone and
// in the dark theme: no serious or critical violation (WCAG 2.2 A and AA rules).
import { describe, expect, it } from "vitest";
import { seedId } from "../../seeds/ids";
import { kbId } from "../../seeds/knowledge";
import { seriousViolations } from "./axe";
import { baseUrl, signInAs, useBrowser } from "./browser";

const CASE = (key: string) => `/cases/${seedId(`case:${key}`)}`;
const CAUSE = (key: string) => `/kb/causes/${kbId("bramblegate", "cause", key)}`;
const SYMPTOM = (key: string) => `/kb/symptoms/${kbId("bramblegate", "symptom", key)}`;

// Who sees which pages: every route with a screen appears at least once.
const VISITS: { login: string | null; paths: string[] }[] = [
  { login: null, paths: ["/", "/sign-in", "/sign-in/code", "/no-such-page"] },
  { login: "sam-newcomer", paths: ["/welcome"] },
  {
    login: "priya-hale",
    paths: [
      "/board",
      "/cases",
      "/cases?q=DEMO",
      "/cases/new",
      CASE("b1"),
      "/kb",
      CAUSE("brake_pad_noise"),
      SYMPTOM("squeal_braking"),
      "/settings",
    ],
  },
  { login: "ollie-mbeki", paths: [CASE("b2")] },
  {
    login: "tomas-varga",
    paths: [
      CASE("b3"),
      "/settings/audit",
      "/kb/transfer",
      "/kb/proposals",
      CAUSE("brake_disc_runout_dtv"),
      SYMPTOM("squeal_braking"),
      `/kb/checks/${kbId("bramblegate", "check", "disc_runout_dial_gauge")}`,
      "/kb",
      CAUSE("brakes_friction"),
      "/kb/test-cases",
      "/kb/symptoms/new",
      "/kb/checks/new",
      CASE("b4"),
    ],
  },
  { login: "dana-reyes", paths: ["/desk", CASE("b4"), `${CASE("b4")}/estimate`, CASE("b5")] },
  {
    login: "ines-okafor",
    paths: [
      "/settings",
      "/settings/members",
      "/settings/audit",
      "/settings/mail",
      "/settings/payments",
      "/settings/sessions",
    ],
  },
];

for (const view of [
  { name: "desk", width: 1280, height: 900, dark: false },
  { name: "phone", width: 375, height: 812, dark: false },
  { name: "dark theme", width: 1280, height: 900, dark: true },
]) {
  describe(`accessibility on a ${view.name}`, () => {
    const browser = useBrowser({ width: view.width, height: view.height });
    for (const visit of VISITS) {
      it(`${visit.login ?? "signed out"}: ${visit.paths.join(", ")}`, async () => {
        await browser.clearCookies();
        const { page } = await browser.newPage();
        await page.emulateMedia({ colorScheme: view.dark ? "dark" : "light" });
        if (visit.login) await signInAs(page, visit.login);
        const found: string[] = [];
        for (const path of visit.paths) {
          await page.goto(`${baseUrl()}${path}`);
          await page.waitForLoadState("networkidle");
          // Open every fold on the page so what it hides is checked too.
          await page.evaluate(() =>
            document.querySelectorAll("main details").forEach((d) => ((d as HTMLDetailsElement).open = true)),
          );
          await page.waitForTimeout(50);
          for (const v of await seriousViolations(page)) found.push(`${path}: ${v}`);
        }
        expect(found).toEqual([]);
        await page.close();
      });
    }
  });
}
