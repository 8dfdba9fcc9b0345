// Which vehicles a failure mode applies to, as a senior types it and as the pages say it. Mileage
// typed in the workshop's units is stored in km: 1 mile = 1.609344 km exactly (NIST SP 811, B.6),
// so 60,000 miles = 96,560.64 km, stored to the whole km (96,561). Ages and mileages are demo figures.
import { describe, expect, it } from "vitest";
import { describeApplicability, readApplicability } from "~/kb/applicability";

const form = (fields: [string, string][]) => {
  const d = new FormData();
  for (const [k, v] of fields) d.append(k, v);
  return d;
};

describe("a failure mode's applicability", () => {
  it("reads ticked fuels and drivetrains, an age, and a mileage in the workshop's units", () => {
    const read = readApplicability(
      form([
        ["fuel", "diesel"],
        ["fuel", "hybrid"],
        ["drivetrain", "awd"],
        ["minAgeYears", "5"],
        ["minMileage", "60,000"],
      ]),
      "imperial",
      {},
    );
    expect(read).toEqual({
      ok: true,
      value: { fuel: ["diesel", "hybrid"], drivetrain: ["awd"], minAgeYears: 5, minKm: 96_561 }, // whole km, as stored
    });
  });

  it("means any vehicle when nothing is ticked, and keeps a senior's own rarity factor", () => {
    expect(readApplicability(form([]), "metric", { youngFactor: 0.5 })).toEqual({ ok: true, value: {} });
    expect(readApplicability(form([["minMileage", "80000 km"]]), "imperial", { youngFactor: 0.5 })).toEqual({
      ok: true,
      value: { minKm: 80_000, youngFactor: 0.5 },
    });
  });

  it("refuses an age or mileage that is not one, by field", () => {
    const read = readApplicability(
      form([
        ["minAgeYears", "old"],
        ["minMileage", "lots"],
      ]),
      "metric",
      {},
    );
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.errors).sort()).toEqual(["minAgeYears", "minMileage"]);
  });

  it("says it in words, mileage in the workshop's units", () => {
    expect(describeApplicability({ fuel: ["diesel"], minKm: 96_560.64 }, "imperial")).toBe(
      "Diesel; any drivetrain; rarer before 60,000 miles",
    );
    expect(describeApplicability({}, "metric")).toBe("any fuel; any drivetrain");
  });
});
