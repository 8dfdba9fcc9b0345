import { describe, expect, it } from "vitest";
import { COUNTRIES, countryDefaults } from "~/domain/countries";
import { slugify } from "~/workshop/create.server";

describe("country defaults", () => {
  it("sets the UK standard VAT rate of 20% (HMRC VAT rates guidance, secondary)", () => {
    expect(countryDefaults("gb")).toMatchObject({ currency: "GBP", taxRate: 0.2 });
  });

  it("keeps EU standard rates at or above the 15% minimum (Council Directive 2006/112/EC Art. 97)", () => {
    for (const c of COUNTRIES.filter((c) => c.currency === "EUR"))
      expect(c.taxRate).toBeGreaterThanOrEqual(0.15);
  });

  it("uses ISO 4217 currency and ISO 3166 country codes", () => {
    for (const c of COUNTRIES) {
      expect(c.code).toMatch(/^[A-Z]{2}$/);
      expect(c.currency).toMatch(/^[A-Z]{3}$/);
    }
    expect(countryDefaults("XX")).toBeUndefined();
  });

  it("makes URL-safe slugs", () => {
    expect(slugify("  Ålesund Bay & Co. Motors ")).toBe("alesund-bay-co-motors");
    expect(slugify("!!!")).toBe("workshop");
  });
});
