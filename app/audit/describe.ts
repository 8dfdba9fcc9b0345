import { href } from "react-router";
import { describeStrength } from "~/domain/link-strength";
import { formatMinor } from "~/money";
import { CAUSE_FIELD_WORDS, CHECK_FIELD_WORDS, SYMPTOM_FIELD_WORDS } from "./field-words";
// Audit entries in the words of the workshop floor: a sentence that starts after the actor's name
// ("Priya Hale recorded a fault: …") and, where the entry concerns a record, a link to it. Shared by
// the case history and the workshop's audit log, browser-safe.

export type AuditSubject = {
  caseId?: string | null;
  caseNumber?: number | null;
  personName?: string | null;
  invitee?: string | null;
};
export type AuditLine = {
  action: string;
  before: unknown;
  after: unknown;
  entity?: string;
  entityId?: string | null;
  subject?: AuditSubject;
};
export type Described = { text: string; href: string | null; linkText: string | null };

type Fields = Record<string, unknown>;
const obj = (v: unknown): Fields => (v && typeof v === "object" ? (v as Fields) : {});
const quoted = (v: unknown) => (typeof v === "string" && v.trim() ? `: “${v.trim()}”` : "");
const STATE: Record<string, string> = {
  open: "being diagnosed",
  awaiting_signoff: "waiting for a senior",
  concluded: "cause confirmed",
  closed: "closed",
};
const ROLE: Record<string, string> = {
  apprentice: "apprentice",
  technician: "technician",
  senior: "senior technician",
  advisor: "service advisor",
  admin: "workshop admin",
};
const paid = (a: Fields) =>
  `${typeof a.amountMinor === "number" && typeof a.currency === "string" ? formatMinor(a.amountMinor, a.currency) : "an amount"}${a.caseNumber != null ? ` for case #${a.caseNumber}` : ""}`;
const role = (r: unknown) => ROLE[String(r)] ?? String(r ?? "");

const SETTING_WORDS: Record<string, (v: unknown) => string> = {
  name: (v) => `name to “${v}”`,
  currency: (v) => `currency to ${v}`,
  taxRate: (v) => `tax rate to ${Math.round(Number(v) * 10_000) / 100}%`,
  units: (v) => `units to ${v}`,
  labourRatePerHour: (v) => `labour rate to ${v} per hour`,
};

/** What changed in the workshop's settings, field by field, in words. */
function settingsChange(before: Fields, after: Fields): string {
  const changed = Object.keys(SETTING_WORDS).filter(
    (k) => k in after && String(before[k]) !== String(after[k]),
  );
  if (changed.length === 0) return "saved the workshop settings without changes";
  return `changed the workshop's ${changed.map((k) => SETTING_WORDS[k](after[k])).join(", ")}`;
}

/** "moved “Warped disc” under “Wheel hubs”, renamed it from “…”, changed the base rate from 6 to 4". */
function causeEditSentence(a: Fields, b: Fields): string {
  const changed = Array.isArray(a.changed) ? (a.changed as string[]) : [];
  if (changed.length === 0) return `saved the cause “${a.name}” without changes`;
  const parts: string[] = [];
  if (changed.includes("parentId")) parts.push(`moved it under “${a.movedUnder}”`);
  if (changed.includes("name")) parts.push(`renamed it from “${b.name}”`);
  for (const f of changed.filter((x) => x in CAUSE_FIELD_WORDS))
    parts.push(
      ["description", "ownerDescription", "ifLeft", "applicability"].includes(f)
        ? `changed ${CAUSE_FIELD_WORDS[f]}`
        : `changed ${CAUSE_FIELD_WORDS[f]} from ${b[f] ?? "none"}${f in a ? ` to ${a[f] ?? "none"}` : ""}`,
    );
  return `edited the cause “${a.name}”: ${parts.join(", ")}`;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

/** "imported the knowledge base “X” (version 4): 2 symptoms added, 219 updated; …". */
function importSentence(a: Fields): string {
  const counts = obj(a.counts);
  const part = (k: string, word: string) => {
    const c = obj(counts[k]);
    const added = Number(c.added ?? 0);
    const updated = Number(c.updated ?? 0);
    return `${plural(added, word)} added, ${updated} updated`;
  };
  return `imported the knowledge base${typeof a.name === "string" && a.name.trim() ? ` “${a.name.trim()}”` : ""}${a.kbVersion ? ` as version ${a.kbVersion}` : ""}: ${[
    part("symptoms", "symptom"),
    part("causes", "cause"),
    part("checks", "check"),
  ].join("; ")}`;
}

// Each action's sentence; entries of actions not listed read as their code, never as raw JSON.
const SAID: Record<string, (a: Fields, b: Fields, s: AuditSubject) => string> = {
  "case.open": (a) => `opened the case${quoted(a.complaint)}`,
  "case.observation": (a) =>
    `noted ${a.present ? "present" : "absent"}: ${a.symptom}${a.source === "owner" ? " (owner's report)" : ""}`,
  "case.observation_remove": () => "removed an observation",
  "case.finding": (a) =>
    `recorded ${a.result === "fail" ? "a fault" : "a pass"}: ${a.check}${a.reading ? ` (${a.reading})` : ""}`,
  "case.finding_remove": (_a, b) => `removed a finding${b.reading ? ` (${b.reading})` : ""}`,
  "case.ask_senior": (a) => `asked a senior${quoted(a.note)}`,
  "case.conclude": (a) =>
    `concluded: ${a.cause}${a.state === "awaiting_signoff" ? ", for a senior's sign-off" : ""}`,
  "case.signoff": (a) => `signed the conclusion off${quoted(a.note)}`,
  "case.send_back": (a) => `sent it back to diagnose${quoted(a.note)}`,
  "case.complaint": (a) => `edited the complaint${quoted(a.complaint)}`,
  "case.reopen": (a, b) => `reopened it (it was ${STATE[String(b.state)] ?? b.state})${quoted(a.reason)}`,
  "case.close": () => "closed the case",
  "case.kb_version": (a, b) =>
    `ranked it again with knowledge-base version ${a.kbVersion} (it was ranked with version ${b.kbVersion})`,
  "settings.update": (a, b) => settingsChange(b, a),
  "kb.import": (a) => importSentence(a),
  "kb.cause.update": (a, b) => causeEditSentence(a, b),
  "kb.check.update": (a) => {
    const changed = Array.isArray(a.changed) ? (a.changed as string[]) : [];
    return `edited the check “${a.name}”: changed ${changed.map((f) => CHECK_FIELD_WORDS[f] ?? f).join(", ") || "nothing"}`;
  },
  "kb.symptom.update": (a) => {
    const changed = Array.isArray(a.changed) ? (a.changed as string[]) : [];
    return `edited the symptom “${a.name}”: changed ${changed.map((f) => SYMPTOM_FIELD_WORDS[f] ?? f).join(", ") || "nothing"}`;
  },
  "kb.cause.retire": (a) => `retired the cause “${a.name}”: it is no longer ranked`,
  "kb.cause.add": (a) =>
    `added ${a.level === "component" ? "the component" : "the failure mode"} “${a.name}” under “${a.under}”`,
  "kb.cause.merge": (a) =>
    `merged “${a.name}” into “${a.into}”: ${a.level === "component" ? `${a.moved} failure modes moved` : `${a.moved} links moved, ${a.kept} kept as “${a.into}” had them`}`,
  "kb.check.add": (a) =>
    `added the check “${a.name}”${a.resultKind === "measurement" ? ", a measurement" : ""}`,
  "kb.symptom.add": (a) => `added the symptom “${a.name}”`,
  "kb.test_case.keep": (a) => `kept case #${a.caseNumber} as the test case “${a.name}”`,
  "kb.test_case.remove": (_a, b) => `removed the test case “${b.name}”`,
  "kb.link.add": (a) =>
    a.link === "check"
      ? `linked the check “${a.other}” to “${a.cause}”: it fails ${describeStrength(Number(a.p))} of the time when that is the cause`
      : `linked “${a.cause}” to the symptom “${a.other}”: it shows ${describeStrength(Number(a.p))}`,
  "kb.propose": (a) =>
    a.kind === "symptom"
      ? `proposed a new symptom “${a.symptom}”, shown by “${a.cause}” ${describeStrength(Number(a.p))}`
      : a.kind === "cause"
        ? `proposed a new cause “${a.cause}” beside the others under “${a.under}”, shown as “${a.symptom}” ${describeStrength(Number(a.p))}`
        : `proposed that “${a.cause}” shows as “${a.symptom}” ${describeStrength(Number(a.p))}`,
  "kb.proposal.accept": (a) =>
    `accepted the proposal ${a.kind === "cause" ? `of a new cause “${a.cause}”` : a.kind === "symptom" ? `of a new symptom “${a.symptom}”, shown by “${a.cause}”` : `that “${a.cause}” shows as “${a.symptom}”`} ${describeStrength(Number(a.p))}${quoted(a.comment)}`,
  "kb.proposal.reject": (a) =>
    `rejected the proposal ${a.kind === "cause" ? `of a new cause “${a.cause}”` : a.kind === "symptom" ? `of a new symptom “${a.symptom}”` : `that “${a.cause}” shows as “${a.symptom}”`}${quoted(a.comment)}`,
  "kb.link": (a, b) =>
    `${a.link === "check" ? `changed how often “${a.other}” fails when the cause is “${a.cause}”` : `changed how often “${a.cause}” shows as “${a.other}”`}: from ${describeStrength(Number(b.p))} to ${describeStrength(Number(a.p))}`,
  "workshop.create": (a) => `created the workshop ${a.name ?? ""}`.trim(),
  "member.invite": (a, _b, s) =>
    `invited ${s.invitee ?? a.email ?? a.githubLogin ?? "someone"} as ${role(a.role)}`,
  "mail.resend": (a) => `sent the e-mail “${a.subject}” to ${a.to} again`,
  "member.invite_revoke": (_a, _b, s) => `withdrew the invitation${s.invitee ? ` of ${s.invitee}` : ""}`,
  "member.invite_expired": (_a, b) =>
    `found the invitation of ${b.email ?? b.githubLogin ?? "someone"} expired; it is closed`,
  "member.join": (a) => `joined the workshop as ${role(a.role)}`,
  "member.role": (a, b, s) =>
    `changed ${s.personName ?? "a member"}'s role from ${role(b.role)} to ${role(a.role)}`,
  "member.suspend": (_a, _b, s) => `suspended ${s.personName ?? "a member"}`,
  "member.reactivate": (_a, _b, s) => `reactivated ${s.personName ?? "a member"}`,
  "payment.paid": (a) => `recorded a payment of ${paid(a)}`,
  "payment.refunded": (a) => `refunded ${paid(a)}`,
  "payment.flagged": (a) => `flagged a payment of ${paid(a)}${quoted(a.reason)}`,
  "auth.sign_in": () => "signed in",
  "auth.sign_out.this": () => "signed out on one device",
  "auth.sign_out.everywhere": () => "signed out on every device",
};

export function describeAudit(entry: AuditLine): Described {
  const subject = entry.subject ?? {};
  const say = SAID[entry.action];
  const text = say ? say(obj(entry.after), obj(entry.before), subject) : entry.action.replace(/[._]/g, " ");
  if (subject.caseId && subject.caseNumber != null)
    return {
      text,
      href: href("/cases/:caseId", { caseId: subject.caseId }),
      linkText: `case #${subject.caseNumber}`,
    };
  if (entry.action.startsWith("member."))
    return { text, href: href("/settings/members"), linkText: "members" };
  if (entry.action === "settings.update") return { text, href: href("/settings"), linkText: "settings" };
  if (entry.action.startsWith("kb.test_case"))
    return { text, href: href("/kb/test-cases"), linkText: "test cases" };
  if (entry.action.startsWith("kb.propos"))
    return { text, href: href("/kb/proposals"), linkText: "proposals" };
  if (entry.action.startsWith("payment."))
    return { text, href: href("/settings/payments"), linkText: "payments" };
  if (entry.action.startsWith("kb.")) return { text, href: href("/kb"), linkText: "knowledge base" };
  return { text, href: null, linkText: null };
}
