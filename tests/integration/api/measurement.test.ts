// A measured finding is judged by its check's rule in the check's unit, whatever unit it was
// typed in. The run-out check's rule is `value <= 0.05 mm` (seeds/kb/brakes.ts).
import { beforeAll, describe, expect, it } from "vitest";
import { action as findingsAction } from "~/routes/api/findings";
import { testDb } from "../../setup/integration-worker";
import { checkId, cookieFor, findingRow, freshCase, request, run } from "./helpers";

const runout = checkId("disc_runout_dial_gauge");
let priya: string;
beforeAll(async () => {
  priya = await cookieFor(testDb(), "priya-hale");
});

async function record(reading: string) {
  const id = await freshCase(testDb());
  const a = await run(
    findingsAction,
    testDb(),
    request(`/api/cases/${id}/findings`, { cookie: priya, json: { checkId: runout, reading } }),
    { caseId: id },
  );
  return { a, row: await findingRow(testDb(), id, runout) };
}

describe("run-out readings against `value <= 0.05 mm`", () => {
  it("fails 0.0035 in: 0.0035 in × 25.4 mm/in = 0.0889 mm > 0.05 mm", async () => {
    // 1 in = 25.4 mm exactly (NIST SP 811, 2008, appendix B.8). 0.0035 × 25.4 = 0.0889.
    const { a, row } = await record("0.0035 in");
    expect(a.status).toBe(201);
    expect(a.body.result).toBe("fail");
    // Stored as typed, with the value in the check's own unit.
    expect(row.reading).toBe("0.0035 in");
    expect(row.unit).toBe("mm");
    expect(Math.abs(row.value! - 0.0889)).toBeLessThan(1e-9);
    expect(row.result).toBe("fail");
  });

  it("passes 0.03 mm: 0.03 mm ≤ 0.05 mm", async () => {
    const { a, row } = await record("0.03 mm");
    expect(a.status).toBe(201);
    expect(a.body.result).toBe("pass");
    expect(row.value).toBe(0.03);
  });

  it("passes exactly at the limit, 0.05 mm (the rule says ≤)", async () => {
    const { a } = await record("0.05 mm");
    expect(a.body.result).toBe("pass");
  });

  it("judges inches near the limit by the exact conversion", async () => {
    // 0.0019 in × 25.4 = 0.04826 mm ≤ 0.05 → pass; 0.002 in × 25.4 = 0.0508 mm > 0.05 → fail.
    expect((await record("0.0019 in")).a.body.result).toBe("pass");
    expect((await record("0.002 in")).a.body.result).toBe("fail");
  });

  it("ignores a result sent alongside a reading: the rule decides", async () => {
    const id = await freshCase(testDb());
    const a = await run(
      findingsAction,
      testDb(),
      request(`/api/cases/${id}/findings`, {
        cookie: priya,
        json: { checkId: runout, reading: "0.11 mm", result: "pass" },
      }),
      { caseId: id },
    );
    // 0.11 mm > 0.05 mm: the demo's closed case b5 records this very reading as a fail (seeds/demo/cases.ts).
    expect(a.body.result).toBe("fail");
  });
});

describe("readings as gauges show them", () => {
  const tread = checkId("tread_depth"); // value >= 1.6 mm (Road Vehicles (Construction and Use) Regulations 1986 reg. 27, secondary)

  it("takes tread in 32nds of an inch: 2/32 in = 1.5875 mm fails, 3/32 in = 2.38125 mm passes", async () => {
    for (const [reading, result, mm] of [
      ["2/32 in", "fail", 1.5875],
      ["3/32 in", "pass", 2.38125],
    ] as const) {
      const id = await freshCase(testDb());
      const a = await run(
        findingsAction,
        testDb(),
        request(`/api/cases/${id}/findings`, { cookie: priya, json: { checkId: tread, reading } }),
        { caseId: id },
      );
      expect(a.status, reading).toBe(201);
      expect(a.body.result, reading).toBe(result);
      const row = await findingRow(testDb(), id, tread);
      expect(row.reading).toBe(reading);
      expect(row.value).toBeCloseTo(mm, 9);
    }
  });

  it("refuses a percentage for a length, naming what is needed", async () => {
    const { a } = await record("65 %");
    expect(a.status).toBe(400);
    expect(a.body.error).toBe("That reading is a percentage; this check needs a length, such as 0.05 mm.");
  });
});
