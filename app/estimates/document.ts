// The owner's document, built from the draft and the case: plain words first, then the money.
// Pure, so the page, the paper and the tests build it the same way.
import type { SentEstimateDocument, SentFinding, SentItem } from "~/domain/estimate-document";
import type { Priority } from "~/domain/knowledge";
import type { EstimateLineKind } from "~/domain/owner-side";
import { describeRule } from "~/measure";
import type { UnitSystem } from "~/domain/vehicles";
import { lineAmount, type PricedLine, totals } from "~/money";

export type DraftLine = PricedLine & {
  id: string;
  kind: EstimateLineKind;
  description: string;
  partNumber: string | null;
};
export type DraftItem = {
  id: string;
  title: string;
  priority: Priority;
  required: boolean;
  lines: DraftLine[];
};

type Evidence = {
  failed: { name: string; reading: string | null; rule: string | null }[];
  present: { name: string; source: string }[];
};

/** One sentence per piece of evidence, in the owner's terms: what you told us, what we found, what we measured. */
export function evidenceSentences(e: Evidence, units: UnitSystem): string[] {
  const told = e.present.map((p) =>
    p.source === "owner" ? `You told us: ${lower(p.name)}.` : `We confirmed: ${lower(p.name)}.`,
  );
  const found = e.failed.map((f) => {
    const { verb, what } = pastTense(f.name);
    return f.reading && f.rule
      ? `We ${verb} ${what}: ${f.reading}; it should be ${describeRule(f.rule, units)}.`
      : `We ${verb} ${what}: not in order.`;
  });
  return [...told, ...found];
}

// Checks are named as instructions ("Measure brake pad … thickness"); the owner reads what we did.
const VERBS: Record<string, string> = {
  measure: "measured",
  check: "checked",
  inspect: "inspected",
  test: "tested",
  read: "read",
  listen: "listened",
  look: "looked",
  scan: "scanned",
  compare: "compared",
  road: "road-tested",
};
function pastTense(name: string) {
  const [first, ...rest] = name.split(" ");
  const verb = VERBS[first.toLowerCase()];
  return verb && rest.length ? { verb, what: rest.join(" ") } : { verb: "checked", what: lower(name) };
}

const lower = (s: string) => (/^[A-Z][a-z]/.test(s) ? s[0].toLowerCase() + s.slice(1) : s);

export function findingFor(
  cause: { name: string; priority: Priority | null; ownerDescription: string; ifLeft: string },
  evidence: Evidence,
  units: UnitSystem,
): SentFinding {
  return {
    causeName: cause.name,
    priority: cause.priority ?? "soon",
    ownerWords: cause.ownerDescription || cause.name,
    ifLeft: cause.ifLeft,
    evidence: evidenceSentences(evidence, units),
    photos: [],
  };
}

export function sentItems(items: readonly DraftItem[]): SentItem[] {
  return items.map((i) => {
    const lines = i.lines.map((l) => ({
      kind: l.kind,
      description: l.description,
      partNumber: l.partNumber,
      quantityMilli: l.quantityMilli,
      unitMinor: l.unitMinor,
      taxRateBp: l.taxRateBp,
      amountMinor: lineAmount(l),
    }));
    return {
      id: i.id,
      title: i.title,
      priority: i.priority,
      required: i.required,
      lines,
      amountMinor: lines.reduce((s, l) => s + l.amountMinor, 0),
    };
  });
}

/** The totals of the items the owner approved (and those owed whatever they decide). */
export function totalsOf(
  doc: Pick<SentEstimateDocument, "items" | "pricesIncludeTax">,
  approved?: ReadonlySet<string>,
) {
  const chosen = doc.items.filter((i) => i.required || !approved || approved.has(i.id));
  return totals(
    chosen.flatMap((i) => i.lines),
    doc.pricesIncludeTax,
  );
}

/** What the owner pays online: the diagnostic fee items (owed in any case), tax included. */
export function depositOf(doc: Pick<SentEstimateDocument, "items" | "pricesIncludeTax">) {
  const owed = doc.items.filter((i) => i.required);
  return owed.length
    ? totals(
        owed.flatMap((i) => i.lines),
        doc.pricesIncludeTax,
      ).gross
    : 0;
}

/** Problems that stop a send, by field: nothing to approve, an item without lines, a total below zero. */
export function sendProblems(
  items: readonly DraftItem[],
  ownerEmail: string | null,
): Record<string, string[]> {
  const problems: Record<string, string[]> = {};
  if (!ownerEmail) problems.form = ["The owner has no e-mail address: add one to the owner's record first."];
  if (!items.some((i) => !i.required && i.lines.length > 0))
    (problems.form ??= []).push("Add at least one item of work for the owner to approve.");
  const empty = items.filter((i) => i.lines.length === 0).map((i) => i.title);
  if (empty.length) (problems.form ??= []).push(`These items have no lines yet: ${empty.join(", ")}.`);
  const t = totals(
    items.flatMap((i) => i.lines),
    false,
  );
  if (t.net < 0) (problems.form ??= []).push("The discounts are larger than the work.");
  return problems;
}
