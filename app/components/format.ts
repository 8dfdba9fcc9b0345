export const STATE_LABEL: Record<string, string> = {
  open: "Being diagnosed",
  awaiting_signoff: "Waiting for a senior",
  concluded: "Cause confirmed",
  closed: "Closed",
};

export function formatMoney(amount: number, currency: string, locale = "en-GB") {
  return new Intl.NumberFormat(locale, { style: "currency", currency }).format(amount);
}

export function formatDate(value: string | Date, locale = "en-GB") {
  return new Intl.DateTimeFormat(locale, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" }).format(new Date(value));
}

export const formatPercent = (p: number, digits = 0) => `${(p * 100).toFixed(digits)}%`;
