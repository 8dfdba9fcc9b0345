import { fraction, multiply, round } from "mathjs";
import { describe, expect, it } from "vitest";
import { divRound, formatMinor, lineAmount, minorDigits, parseMoney, parseQuantity, totals } from "~/money";

// VAT standard rate 20 % (UK since 4 January 2011) and the VAT fraction 1/6 of a VAT-inclusive
// price at that rate: HM Revenue & Customs, VAT rates guidance. Rounding of VAT to the nearest
// penny, a half penny up, at invoice level: HMRC VAT Notice 700, section on calculating VAT on
// invoices (from memory). Every other figure below is worked by hand from those.
const STANDARD = 2000;

describe("rounding", () => {
  it("rounds a half away from zero and agrees with mathjs's exact fractions", () => {
    expect(divRound(5, 10)).toBe(1);
    expect(divRound(4, 10)).toBe(0);
    expect(divRound(-5, 10)).toBe(-1);
    expect(divRound(-4, 10)).toBe(0);
    // mathjs (a general reference library) on the same exact values, e.g. 250.6p → 251p.
    for (const [n, d] of [
      [12530 * 2000, 10_000],
      [303 * 2000, 12_000],
      [99_999, 1000],
    ] as const)
      expect(divRound(n, d)).toBe(Number(round(fraction(n, d) as unknown as number)));
  });
});

describe("tax on an estimate", () => {
  it("adds VAT at 20 % to net prices: £125.30 net → £25.06 VAT, £150.36 (by hand)", () => {
    const t = totals([{ quantityMilli: 1000, unitMinor: 12_530, taxRateBp: STANDARD }], false);
    expect(t).toEqual({
      bands: [{ rateBp: 2000, net: 12_530, tax: 2506, gross: 15_036 }],
      net: 12_530,
      tax: 2506,
      gross: 15_036,
    });
  });

  it("takes the VAT fraction 1/6 out of tax-inclusive prices: £120.00 → £20.00 VAT (HMRC)", () => {
    const t = totals([{ quantityMilli: 1000, unitMinor: 12_000, taxRateBp: STANDARD }], true);
    expect(t.tax).toBe(2000);
    expect(t.net).toBe(10_000);
    expect(t.tax).toBe(Number(multiply(fraction(1, 6), 12_000)));
  });

  it("rounds a half penny up: £3.03 tax-inclusive holds 50.5p of VAT → 51p (by hand)", () => {
    const t = totals([{ quantityMilli: 1000, unitMinor: 303, taxRateBp: STANDARD }], true);
    expect(t.tax).toBe(51);
    expect(t.net).toBe(252);
  });

  it("rounds each line once: 1.5 h at 3p is 4.5p → 5p, then VAT on the total (by hand)", () => {
    expect(lineAmount({ quantityMilli: 1500, unitMinor: 3, taxRateBp: STANDARD })).toBe(5);
  });

  it("rounds VAT once on the total of a rate, not per line: three 2p lines → 6p net, VAT 1p", () => {
    // Per line each 0.4p of VAT would round to 0p (0p in all); on the total, 1.2p → 1p.
    const lines = [1, 2, 3].map(() => ({ quantityMilli: 1000, unitMinor: 2, taxRateBp: STANDARD }));
    expect(totals(lines, false).tax).toBe(1);
  });

  it("takes a discount off before tax: £200 of parts, £20 off → £180 + £36 VAT = £216 (by hand)", () => {
    const t = totals(
      [
        { quantityMilli: 2000, unitMinor: 10_000, taxRateBp: STANDARD },
        { quantityMilli: 1000, unitMinor: -2000, taxRateBp: STANDARD },
      ],
      false,
    );
    expect(t).toMatchObject({ net: 18_000, tax: 3600, gross: 21_600 });
  });

  it("keeps a zero-rated line in a band of its own with no tax", () => {
    const t = totals(
      [
        { quantityMilli: 1000, unitMinor: 5000, taxRateBp: STANDARD },
        { quantityMilli: 1000, unitMinor: 1234, taxRateBp: 0 },
      ],
      false,
    );
    expect(t.bands).toEqual([
      { rateBp: 2000, net: 5000, tax: 1000, gross: 6000 },
      { rateBp: 0, net: 1234, tax: 0, gross: 1234 },
    ]);
    expect(t.gross).toBe(7234);
  });

  it("labour is hours × the rate: 1.2 h at £85.00 → £102.00 (by hand)", () => {
    expect(lineAmount({ quantityMilli: 1200, unitMinor: 8500, taxRateBp: STANDARD })).toBe(10_200);
  });
});

describe("typed amounts", () => {
  it("knows each currency's minor unit from ISO 4217 (GBP 2, JPY 0)", () => {
    expect(minorDigits("GBP")).toBe(2);
    expect(minorDigits("JPY")).toBe(0);
  });
  it("reads prices and refuses slips with a message", () => {
    expect(parseMoney("£1,234.5", "GBP")).toEqual({ minor: 123_450 });
    expect(parseMoney("-20", "GBP")).toEqual({ minor: -2000 });
    expect(parseMoney("12.345", "GBP")).toEqual({ error: "At most 2 decimals." });
    expect(parseMoney("abc", "GBP")).toHaveProperty("error");
    expect(parseMoney("1.5", "JPY")).toEqual({ error: "This currency has no decimals." });
    expect(parseQuantity("1.5")).toEqual({ milli: 1500 });
    expect(parseQuantity("0")).toHaveProperty("error");
    expect(formatMinor(123_450, "GBP")).toBe("£1,234.50");
  });
});
