import { CASE_STATE_LABEL, type CaseState } from "./cases";

/** A case state's words, for a state read as a string from the API. */
export const STATE_LABEL = CASE_STATE_LABEL as Record<CaseState | (string & {}), string>;

// Building an Intl formatter costs far more than using one: keep one per locale and currency.
const money = new Map<string, Intl.NumberFormat>();
const dates = new Map<string, Intl.DateTimeFormat>();

export function formatMoney(amount: number, currency: string, locale = "en-GB") {
  const key = `${locale}|${currency}`;
  let f = money.get(key);
  if (!f) money.set(key, (f = new Intl.NumberFormat(locale, { style: "currency", currency })));
  return f.format(amount);
}

export function formatDate(value: string | Date, locale = "en-GB") {
  let f = dates.get(locale);
  if (!f)
    dates.set(
      locale,
      (f = new Intl.DateTimeFormat(locale, {
        day: "numeric",
        month: "short",
        hour: "2-digit",
        minute: "2-digit",
        timeZone: "UTC",
      })),
    );
  return f.format(new Date(value));
}

export const formatPercent = (p: number, digits = 0) => `${(p * 100).toFixed(digits)}%`;

/** A ranking place in words: 1 → "1st", 22 → "22nd"; null (not ranked at all) → "not ranked". */
export const ordinal = (n: number | null) =>
  n === null
    ? "not ranked"
    : `${n}${n % 10 === 1 && n % 100 !== 11 ? "st" : n % 10 === 2 && n % 100 !== 12 ? "nd" : n % 10 === 3 && n % 100 !== 13 ? "rd" : "th"}`;
