import { Fold } from "../fold";
import { formatDate } from "../format";

// Audit actions in the words of the workshop floor.
const SAID: Record<string, (after: Record<string, unknown>) => string> = {
  "case.open": () => "opened the case",
  "case.observation": (a) => `noted ${a.present ? "present" : "absent"}: ${a.symptom}${a.source === "owner" ? " (owner's report)" : ""}`,
  "case.observation_remove": () => "removed an observation",
  "case.finding": (a) => `recorded ${a.result === "fail" ? "a fault" : "a pass"}: ${a.check}${a.reading ? ` (${a.reading})` : ""}`,
  "case.finding_remove": () => "removed a finding",
  "case.ask_senior": (a) => `asked a senior${a.note ? `: “${a.note}”` : ""}`,
  "case.conclude": (a) => `concluded: ${a.cause}`,
  "case.signoff": () => "signed the conclusion off",
  "case.send_back": (a) => `sent it back to diagnose${a.note ? `: “${a.note}”` : ""}`,
  "case.complaint": () => "edited the complaint",
};

export function CaseHistory({ entries }: { entries: { id: number; at: string | Date; action: string; after: unknown; actor: string | null }[] }) {
  return (
    <section aria-labelledby="history" className="rounded-card border border-rule bg-card p-4">
      <Fold summaryClassName="min-h-tap cursor-pointer content-center text-xl font-semibold" summary={<span id="history">History</span>}>
        <ol className="mt-2 grid gap-1 text-sm" aria-label="Case history">
          {entries.map((e) => (
            <li key={e.id}>
              <span className="tabular text-graphite-600">{formatDate(e.at)}</span> · <strong>{e.actor ?? "someone"}</strong>{" "}
              {(SAID[e.action] ?? (() => e.action))((e.after ?? {}) as Record<string, unknown>)}
            </li>
          ))}
        </ol>
      </Fold>
    </section>
  );
}
