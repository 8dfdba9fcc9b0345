import type { UnitSystem } from "./vehicles";

// Defaults a new workshop gets from its country. The admin can change every one of them.
// Tax rates are standard VAT rates; check them against the tax authority before relying on them.

export type CountryDefaults = {
  code: string; // ISO 3166-1 alpha-2
  name: string;
  currency: string; // ISO 4217
  taxRate: number; // standard rate as a fraction
  units: UnitSystem;
  source: string;
};

export const COUNTRIES: CountryDefaults[] = [
  // HM Revenue & Customs, VAT rates guidance: 20% standard rate since 4 January 2011 (secondary).
  {
    code: "GB",
    name: "United Kingdom",
    currency: "GBP",
    taxRate: 0.2,
    units: "imperial",
    source: "HMRC VAT rates (secondary)",
  },
  { code: "IE", name: "Ireland", currency: "EUR", taxRate: 0.23, units: "metric", source: "from memory" },
  { code: "DE", name: "Germany", currency: "EUR", taxRate: 0.19, units: "metric", source: "from memory" },
  { code: "FR", name: "France", currency: "EUR", taxRate: 0.2, units: "metric", source: "from memory" },
  { code: "NL", name: "Netherlands", currency: "EUR", taxRate: 0.21, units: "metric", source: "from memory" },
  { code: "ES", name: "Spain", currency: "EUR", taxRate: 0.21, units: "metric", source: "from memory" },
  {
    code: "US",
    name: "United States",
    currency: "USD",
    taxRate: 0,
    units: "imperial",
    source: "no federal VAT; sales tax is local",
  },
];

export function countryDefaults(code: string): CountryDefaults | undefined {
  return COUNTRIES.find((c) => c.code === code.toUpperCase());
}
