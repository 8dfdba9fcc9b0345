// An estimate's sums. Pure.
//
// The rounding rule: each line is quantity × unit price rounded to the minor unit (half away from
// zero); tax is then worked out once per tax rate on the sum of that rate's lines and rounded the
// same way (invoice-level rounding, which HMRC's VAT guide allows). Per rate and not per line, so
// the tax the owner sees is the rate applied to what they see, with one rounding instead of a
// half-penny drift on every line; and so approving some items re-sums without new drift.
import { divRound } from "./money";

export type PricedLine = { quantityMilli: number; unitMinor: number; taxRateBp: number };

/** quantity × unit price in minor units, as the line shows it (net or tax-inclusive as entered). */
export function lineAmount(line: PricedLine): number {
  return divRound(line.quantityMilli * line.unitMinor, 1000);
}

export type TaxBand = { rateBp: number; net: number; tax: number; gross: number };
export type Totals = { bands: TaxBand[]; net: number; tax: number; gross: number };

/**
 * Totals of the lines. With `pricesIncludeTax` the amounts are gross and the tax is the VAT
 * fraction rate / (1 + rate) of each band (1/6 at 20 %); otherwise they are net and the tax is the
 * rate of each band.
 */
export function totals(lines: readonly PricedLine[], pricesIncludeTax: boolean): Totals {
  const byRate = new Map<number, number>();
  for (const l of lines) byRate.set(l.taxRateBp, (byRate.get(l.taxRateBp) ?? 0) + lineAmount(l));
  const bands = [...byRate]
    .sort((a, b) => b[0] - a[0])
    .map(([rateBp, amount]): TaxBand => {
      if (pricesIncludeTax) {
        const tax = divRound(amount * rateBp, 10_000 + rateBp);
        return { rateBp, net: amount - tax, tax, gross: amount };
      }
      const tax = divRound(amount * rateBp, 10_000);
      return { rateBp, net: amount, tax, gross: amount + tax };
    });
  const sum = (k: "net" | "tax" | "gross") => bands.reduce((s, b) => s + b[k], 0);
  return { bands, net: sum("net"), tax: sum("tax"), gross: sum("gross") };
}

/** 2000 → "20 %" */
export function rateWords(rateBp: number): string {
  return `${(rateBp / 100).toLocaleString("en-GB", { maximumFractionDigits: 2 })} %`;
}

/** The workshop's rate (a fraction, 0.2) in basis points (2000). */
export function toBasisPoints(rate: number): number {
  return Math.round(rate * 10_000);
}
