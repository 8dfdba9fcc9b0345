// The before and after of a knowledge-base change, field by field and in words, for an item's
// history. Browser-safe and pure: it reads the audit entry's before/after as they were written.
import type { Applicability } from "~/domain/knowledge";
import { describeStrength } from "~/domain/link-strength";
import { describeApplicability } from "~/kb/applicability";
import type { AuditLine } from "./describe";
import { CAUSE_FIELD_WORDS, CHECK_FIELD_WORDS, SYMPTOM_FIELD_WORDS } from "./field-words";

export type FieldChange = { what: string; before: string; after: string };

type Fields = Record<string, unknown>;
const obj = (v: unknown): Fields => (v && typeof v === "object" ? (v as Fields) : {});

// Fields held as a probability read as a percentage; the rest as they are.
const PROBABILITIES = new Set(["leak", "falseAlarm"]);
const LONGEST = 160;

function shown(field: string, v: unknown): string {
  if (v === null || v === undefined || v === "") return "none";
  if (Array.isArray(v)) return v.length ? v.map((x) => String(x)).join("; ") : "none";
  if (typeof v === "number") return PROBABILITIES.has(field) ? `${Math.round(v * 1000) / 10}%` : String(v);
  if (typeof v === "boolean") return v ? "yes" : "no";
  // History is read in any workshop; mileages in it are given in km, as they are stored.
  if (field === "applicability" && typeof v === "object")
    return describeApplicability(v as Applicability, "metric");
  if (typeof v === "string") return `“${v.length > LONGEST ? `${v.slice(0, LONGEST - 1)}…` : v}”`;
  return "changed";
}

const WORDS: Record<string, Record<string, string>> = {
  "kb.cause.update": { name: "its name", ...CAUSE_FIELD_WORDS },
  "kb.check.update": CHECK_FIELD_WORDS,
  "kb.symptom.update": SYMPTOM_FIELD_WORDS,
};

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** Each changed field with its value before and after; empty for entries that are not edits. */
export function changesOf(entry: Pick<AuditLine, "action" | "before" | "after">): FieldChange[] {
  const [a, b] = [obj(entry.after), obj(entry.before)];
  if (
    entry.action === "kb.link" ||
    entry.action === "kb.link.add" ||
    (entry.action === "kb.proposal.accept" && typeof b.p === "number")
  )
    return [
      {
        what:
          a.link === "check"
            ? `How often “${a.other}” fails when it is “${a.cause}”`
            : `How often “${a.cause}” shows as “${a.other ?? a.symptom}”`,
        before: typeof b.p === "number" ? describeStrength(b.p) : "no link",
        after: describeStrength(Number(a.p)),
      },
    ];
  const words = WORDS[entry.action];
  if (!words) return [];
  const changed = Array.isArray(a.changed) ? (a.changed as string[]) : [];
  return changed
    .filter((f) => f in words)
    .map((f) => ({
      what: capital(words[f]),
      before: shown(f, b[f]),
      after: f in a ? shown(f, a[f]) : "not recorded",
    }));
}
