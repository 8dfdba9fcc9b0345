// Trouble codes (SAE J2012 / ISO 15031-6 — secondary): P/C/B/U + 4 characters; second 0 = generic,
// 1 = maker-specific; the rest hexadecimal. Titles quoted for context only: P0171 System Too Lean
// (Bank 1), P0301 Cylinder 1 Misfire Detected, P0420 Catalyst System Efficiency Below Threshold.
import { describe, expect, it } from "vitest";
import { parseDtc } from "~/measure";

describe("DTC", () => {
  it("systems and scope", () => {
    expect(parseDtc("P0301")).toEqual({
      valid: true,
      code: "P0301",
      system: "powertrain",
      scope: "generic",
      group: "ignition system or misfire",
    });
    expect(parseDtc("C1234")).toMatchObject({ valid: true, system: "chassis", scope: "manufacturer" });
    expect(parseDtc("B0001")).toMatchObject({ valid: true, system: "body", scope: "generic" });
    expect(parseDtc("U0100")).toMatchObject({ valid: true, system: "network", scope: "generic" });
    expect(parseDtc("P2A00")).toMatchObject({ valid: true, scope: "depends on system and edition" });
  });

  it("generic powertrain families by third character (from memory of SAE J2012)", () => {
    expect(parseDtc("P0171")).toMatchObject({ group: "fuel and air metering" });
    expect(parseDtc("P0420")).toMatchObject({ group: "auxiliary emission controls" });
    expect(parseDtc("P0117")).toMatchObject({ group: "fuel and air metering" });
    expect(parseDtc("P1301")).not.toHaveProperty("group"); // maker-specific: no standard family
  });

  it("normalises and accepts hexadecimal digits", () => {
    expect(parseDtc(" p0a0f ")).toMatchObject({ valid: true, code: "P0A0F", group: "hybrid propulsion" });
  });

  it("refuses what is not a code", () => {
    expect(parseDtc("X0301").valid).toBe(false); // unknown system letter
    expect(parseDtc("P4301").valid).toBe(false); // second character is 0–3
    expect(parseDtc("P0G01").valid).toBe(false); // G is not hexadecimal
    expect(parseDtc("P030").valid).toBe(false);
    expect(parseDtc("P03011").valid).toBe(false);
    expect(parseDtc("").valid).toBe(false);
  });
});
