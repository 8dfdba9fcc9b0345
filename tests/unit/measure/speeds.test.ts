// Road speeds in knowledge-base text, read in the workshop's units. 1 mile = 1.609344 km exactly
// (international yard and pound agreement, 1959); rounded to the nearest 5 mph, as a speedometer
// is read on a road test (common practice, no published source).
import { describe, expect, it } from "vitest";
import { speedsIn } from "~/measure";

describe("road speeds in the workshop's units", () => {
  it("leaves a metric workshop's text as written", () => {
    expect(speedsIn("Brake gently from about 80 km/h.", "metric")).toBe("Brake gently from about 80 km/h.");
  });

  it("reads km/h as mph for a workshop in miles: 80 km/h = 49.7 mph → 50 mph", () => {
    expect(speedsIn("Brake gently from about 80 km/h, then firmly from about 50 km/h.", "imperial")).toBe(
      "Brake gently from about 50 mph, then firmly from about 30 mph.",
    );
  });

  it("keeps ranges as ranges: 60–90 km/h = 37.3–55.9 mph → 35–55 mph", () => {
    expect(speedsIn("Drive steadily at 60–90 km/h with the heater on low.", "us")).toBe(
      "Drive steadily at 35–55 mph with the heater on low.",
    );
  });
});
