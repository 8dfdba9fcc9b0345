// What each address takes as a request body, and how much of it. Pure, so the production server,
// the request guard and the tests read one table. Limits are per route because a refused body
// must be refused before it is read (a 300 MB form posted to sign-out must cost nothing).
export type BodyKind = "form" | "json";
export type BodyRule = { kind: BodyKind; maxBytes: number };

const KiB = 1024;

/** Forms of the signed-in pages: a conclusion or a complaint is a few KiB at most. */
export const FORM_RULE: BodyRule = { kind: "form", maxBytes: 64 * KiB };
/** One observation or finding, or a search. */
export const API_RULE: BodyRule = { kind: "json", maxBytes: 16 * KiB };
/** A what-if model: a whole knowledge base of the size a screen shows (see app/routes/api/what-if.ts). */
export const WHAT_IF_RULE: BodyRule = { kind: "json", maxBytes: 1024 * KiB };

/** A whole knowledge base as a file: the starter base exports to well under 1 MB. */
export const KB_IMPORT_RULE: BodyRule = { kind: "form", maxBytes: 8 * 1024 * KiB };

/** Where the payments service POSTs its events (the one write accepted from another origin). */
export const PAYMENT_WEBHOOK_PATH = "/api/payments/webhook";
/** One payment event: a checkout session or a charge with its refunds is a few KiB. */
export const PAYMENT_WEBHOOK_RULE: BodyRule = { kind: "json", maxBytes: 64 * KiB };

const BY_PATH: [RegExp, BodyRule][] = [
  [/^\/api\/payments\/webhook$/, PAYMENT_WEBHOOK_RULE],
  [/^\/kb\/transfer(\.data)?$/, KB_IMPORT_RULE],
  [/^\/api\/what-if$/, WHAT_IF_RULE],
  [/^\/api\//, API_RULE],
];

/** The rule for a path (without its query); pages and their `.data` requests take forms. */
export function bodyRuleFor(pathname: string): BodyRule {
  for (const [pattern, rule] of BY_PATH) if (pattern.test(pathname)) return rule;
  return FORM_RULE;
}

export const describeBytes = (n: number) =>
  n >= 1024 * KiB ? `${(n / (1024 * KiB)).toFixed(1)} MB` : `${Math.ceil(n / KiB)} KB`;
