// Money as integer minor units (pence, cents) with the currency beside it. Pure and browser-safe.
import { formatMoney } from "~/domain/format";

/** How many minor-unit digits a currency has (GBP 2, JPY 0), from the platform's ISO 4217 data. */
export function minorDigits(currency: string): number {
  return (
    new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2
  );
}

/**
 * n / d rounded to the nearest integer, a half away from zero (0.5p → 1p, −0.5p → −1p): the rounding
 * HMRC's VAT guide allows for VAT amounts, and the one people do by hand. Exact for |n| < 2^53.
 */
export function divRound(n: number, d: number): number {
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d) || d <= 0)
    throw new RangeError("divRound needs safe integers");
  const sign = n < 0 ? -1 : 1;
  const a = Math.abs(n);
  const q = Math.floor(a / d);
  const r = a - q * d;
  return sign * (2 * r >= d ? q + 1 : q) || 0;
}

/** 12345 GBP → "£123.45": minor units through the one currency formatter (domain/format.ts, major units). */
export function formatMinor(minor: number, currency: string, locale = "en-GB"): string {
  return formatMoney(minor / 10 ** minorDigits(currency), currency, locale);
}

/**
 * A typed amount ("12.5", "£1,234.56", "-3") → minor units, or a message for the field. No more
 * decimals than the currency has: a price of 12.345 pounds is a typing slip, not a price.
 */
export function parseMoney(text: string, currency: string): { minor: number } | { error: string } {
  const digits = minorDigits(currency);
  const clean = text.trim().replace(/[£$€¥,\s]/g, "");
  const m = /^(-)?(\d+)(?:\.(\d*))?$/.exec(clean);
  if (!m) return { error: "Type an amount, for example 12.50." };
  const frac = m[3] ?? "";
  if (frac.length > digits)
    return { error: digits === 0 ? "This currency has no decimals." : `At most ${digits} decimals.` };
  const minor = Number(m[2]) * 10 ** digits + Number(frac.padEnd(digits, "0") || "0");
  if (!Number.isSafeInteger(minor) || minor > 100_000_000_00) return { error: "That amount is too large." };
  return { minor: m[1] ? -minor : minor };
}

/** A typed quantity ("1.5", "2") → thousandths, or a message; it must be above zero. */
export function parseQuantity(text: string): { milli: number } | { error: string } {
  const m = /^(\d+)(?:[.,](\d{0,3}))?$/.exec(text.trim());
  if (!m) return { error: "Type a quantity, for example 1 or 1.5 (at most 3 decimals)." };
  const milli = Number(m[1]) * 1000 + Number((m[2] ?? "").padEnd(3, "0") || "0");
  if (milli <= 0) return { error: "The quantity must be more than zero." };
  if (milli > 10_000_000) return { error: "That quantity is too large." };
  return { milli };
}

/** 1500 → "1.5" */
export function formatQuantity(milli: number): string {
  return (milli / 1000).toLocaleString("en-GB", { maximumFractionDigits: 3 });
}
