// Wire-format helpers for the payments fake: the SDK's bracketed form encoding, the webhook
// signature scheme, and the hosted checkout page.
import { createHmac } from "node:crypto";
import type { ServerResponse } from "node:http";
import { escapeHtml, sendHtml } from "./http-util";

export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

// The SDK sends nested params qs-style: line_items[0][price_data][currency]=gbp&metadata[job]=42.
export function parseBracketForm(raw: string): FormObject {
  const root: FormObject = {};
  for (const [key, value] of new URLSearchParams(raw)) {
    const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
    // Unsafe names would reach Object.prototype through plain-object assignment.
    if (!match || /\b(__proto__|constructor|prototype)\b/.test(key)) continue;
    const path = [match[1]!, ...[...match[2]!.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]!)];
    let node: FormObject = root;
    path.forEach((segment, i) => {
      // "expand[]" style: an empty segment appends.
      const name = segment === "" ? String(Object.keys(node).length) : segment;
      if (i === path.length - 1) {
        node[name] = value;
        return;
      }
      const next = node[name];
      if (typeof next !== "object" || Array.isArray(next)) node[name] = {};
      node = node[name] as FormObject;
    });
  }
  return arraysFromIndexes(root) as FormObject;
}

function arraysFromIndexes(value: FormValue): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const converted = Object.fromEntries(keys.map((k) => [k, arraysFromIndexes(value[k]!)]));
  const isList = keys.length > 0 && keys.every((k, i) => k === String(i));
  return isList ? keys.map((k) => converted[k]!) : converted;
}

export function asRecord(value: FormValue | undefined): FormObject {
  return value && typeof value === "object" && !Array.isArray(value) ? value : {};
}

export function asString(value: FormValue | undefined): string | undefined {
  return typeof value === "string" ? value : undefined;
}

// Exactly the public scheme: HMAC-SHA256 over "<timestamp>.<raw body>", keyed with the endpoint
// secret (the whole "whsec_..." string), sent as "t=<timestamp>,v1=<hex>".
export function signWebhook(body: string, secret: string, timestampSeconds: number): string {
  const mac = createHmac("sha256", secret).update(`${timestampSeconds}.${body}`, "utf8").digest("hex");
  return `t=${timestampSeconds},v1=${mac}`;
}

export const PAY_PAGE_TITLE = "Fake payment page (local demo only)";

export type PayPageSession = {
  id: string;
  amount_total: number | null;
  currency: string | null;
  status: string;
  payment_status: string;
  items: { name: string; quantity: number; unitAmount: number }[];
};

export function formatMoney(minorUnits: number, currency: string): string {
  try {
    return new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(
      minorUnits / 100,
    );
  } catch {
    return `${(minorUnits / 100).toFixed(2)} ${currency.toUpperCase()}`;
  }
}

export function renderPayPage(res: ServerResponse, s: PayPageSession): void {
  const currency = s.currency ?? "gbp";
  const rows = s.items
    .map(
      (it) =>
        `<li>${escapeHtml(it.name)} × ${it.quantity}: ${escapeHtml(formatMoney(it.unitAmount * it.quantity, currency))}</li>`,
    )
    .join("\n");
  const total =
    s.amount_total === null
      ? ""
      : `<p><strong>Total: ${escapeHtml(formatMoney(s.amount_total, currency))}</strong></p>`;
  const open = s.status === "open";
  const actions = open
    ? `<form method="post" action="/pay/${escapeHtml(s.id)}/pay"><button type="submit">Pay</button></form>
<form method="post" action="/pay/${escapeHtml(s.id)}/cancel"><button type="submit">Cancel</button></form>`
    : `<p role="status">This checkout is ${escapeHtml(s.status)} (${escapeHtml(s.payment_status)}).</p>`;
  sendHtml(
    res,
    200,
    PAY_PAGE_TITLE,
    `<h1>${PAY_PAGE_TITLE}</h1>
<p>No card is needed and no money moves. Checkout <code>${escapeHtml(s.id)}</code>.</p>
<ul>${rows}</ul>
${total}
${actions}`,
  );
}
