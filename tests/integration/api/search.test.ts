// GET /api/search: Quick find on the server over the workshop's knowledge base and fleet.
import { describe, expect, it } from "vitest";
import { loader } from "~/routes/api/search";
import { testDb } from "../../setup/integration-worker";
import { cookieFor, isCleanError, request, run, symptomId } from "./helpers";

type Groups = { kind: string; items: { entry: { id: string; kind: string; title: string } }[] }[];

async function search(query: string, login = "priya-hale") {
  return run(
    loader,
    testDb(),
    request(`/api/search?${query}`, { cookie: await cookieFor(testDb(), login) }),
    {},
  );
}

describe("GET /api/search", () => {
  it("finds the braking-vibration symptom first for “judder when braking”", async () => {
    // "judder when braking" is a synonym of vibration_braking in the starter KB (seeds/kb/brakes.ts).
    const a = await search("q=judder%20when%20braking");
    expect(a.status).toBe(200);
    expect(a.body.query).toBe("judder when braking");
    const symptomsGroup = (a.body.groups as Groups).find((g) => g.kind === "symptom");
    expect(symptomsGroup?.items[0].entry.id).toBe(symptomId("vibration_braking"));
    expect(symptomsGroup?.items[0].entry.title).toBe("Vibration through the steering wheel under braking");
  });

  it("finds a demo vehicle by its registration", async () => {
    // DEMO 101 is the Orlan Brisk of seeds/demo/fleet.ts.
    const a = await search("q=DEMO%20101&kinds=vehicle");
    const groups = a.body.groups as Groups;
    expect(groups.map((g) => g.kind)).toEqual(["vehicle"]);
    expect(groups[0].items[0].entry.title).toContain("DEMO 101");
  });

  it("searches only the member's own workshop: Saltmarsh sees its own vehicle, not Bramblegate's", async () => {
    // Saltmarsh has one vehicle, DEMO 505; DEMO 101 belongs to Bramblegate (seeds/demo/fleet.ts).
    const a = await search("q=DEMO&kinds=vehicle&limit=50", "rowan-quill");
    const titles = (a.body.groups as Groups).flatMap((g) => g.items.map((i) => i.entry.title));
    expect(titles.some((t) => t.includes("DEMO 505"))).toBe(true);
    expect(titles.some((t) => t.includes("DEMO 101"))).toBe(false);
  });

  it("answers 400 for a query longer than 80 characters, and accepts exactly 80", async () => {
    const long = await search(`q=${"a".repeat(81)}`);
    expect(long.status).toBe(400);
    expect(isCleanError(long)).toBe(true);
    expect(long.body.error).toMatch(/80/);
    expect((await search(`q=${"a".repeat(80)}`)).status).toBe(200);
  });

  it("answers 400 for an unknown kind or a limit out of range", async () => {
    expect((await search("q=brake&kinds=symptom,recipe")).status).toBe(400);
    expect((await search("q=brake&limit=0")).status).toBe(400);
    expect((await search("q=brake&limit=51")).status).toBe(400);
  });

  it("answers 401 without a session", async () => {
    const a = await run(loader, testDb(), request("/api/search?q=brake"), {});
    expect(a.status).toBe(401);
  });
});
