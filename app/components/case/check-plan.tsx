import { useEffect, useRef, useState } from "react";
import type { Diagnosis } from "~/cases/present-diagnosis";
import { formatMoney, formatPercent } from "../format";
import { Fold } from "../fold";
import { Cautions } from "./cautions";

type Step = Diagnosis["plan"]["steps"][number];
export type RecordResult = (step: Step, result: { result?: "pass" | "fail"; reading?: string }) => void;

const SHOWN = 8;
const WORTH = 0.02; // below a 2% chance of finding the fault a check waits in the folded list

const ACCESS_LABEL: Record<string, string> = { ramp: "ramp", road_test: "road test", scan_tool: "scan tool", wheels_off: "wheels off", bonnet_open: "bonnet open", cold_engine: "cold engine" };

/** Arrow keys move between steps; P and F record pass or fail on the focused step. */
function onPlanKey(e: React.KeyboardEvent<HTMLOListElement>, steps: Step[], record: RecordResult) {
  const items = [...e.currentTarget.querySelectorAll<HTMLElement>("[data-step]")];
  const at = items.indexOf(document.activeElement as HTMLElement);
  if (e.key === "ArrowDown" || e.key === "ArrowUp") {
    e.preventDefault();
    const next = at < 0 ? 0 : Math.min(items.length - 1, Math.max(0, at + (e.key === "ArrowDown" ? 1 : -1)));
    items[next]?.focus();
  } else if (at >= 0 && (e.key === "p" || e.key === "f") && steps[at].resultKind === "pass_fail") {
    e.preventDefault();
    record(steps[at], { result: e.key === "p" ? "pass" : "fail" });
  } else if (at >= 0 && e.key === "Enter" && e.target === items[at]) {
    e.preventDefault();
    items[at].querySelector<HTMLElement>("input, button")?.focus();
  }
}

export function CheckPlan({ plan, currency, record, busy, error }: { plan: Diagnosis["plan"]; currency: string; record: RecordResult; busy: boolean; error: string | null }) {
  const steps = plan.steps;
  // The plan orders every remaining check; the screen offers the few worth doing now.
  const worth = steps.filter((s, i) => i === 0 || s.pFind >= WORTH);
  const shown = worth.slice(0, SHOWN);
  const later = steps.filter((s) => !shown.includes(s));
  const list = useRef<HTMLOListElement>(null);
  // N jumps to the next check from anywhere on the page (not while typing).
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (e.key !== "n" || e.ctrlKey || e.metaKey || e.altKey || t?.closest("input, textarea, select, [cmdk-root]")) return;
      const first = list.current?.querySelector<HTMLElement>("[data-step]");
      if (first) (e.preventDefault(), first.focus());
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
  return (
    <section aria-labelledby="plan" className="rounded-card border border-rule bg-card p-4">
      <h2 id="plan" className="text-xl font-semibold">Check plan</h2>
      {steps.length ? (
        <p className="mt-1 text-sm text-graphite-700" data-testid="plan-saving">
          Expected cost in this order <strong className="tabular">{formatMoney(plan.expectedCost, currency)}</strong>; cheapest-first would
          expect <span className="tabular">{formatMoney(plan.cheapestFirstExpectedCost, currency)}</span>
          {plan.saving > 0.005 ? <> — this order saves <strong className="tabular">{formatMoney(plan.saving, currency)}</strong> on average.</> : "."}
        </p>
      ) : (
        <p className="mt-1 text-graphite-700">No checks left that bear on these causes.</p>
      )}
      {error ? <p role="alert" className="mt-2 rounded-lg border-2 border-stop p-3">{error}</p> : null}
      {plan.whatIf && steps[0] ? (
        <p className="mt-2 text-sm" data-testid="what-if">
          Why {steps[0].name.toLowerCase()} first: if it fails, the top cause becomes <strong>{plan.whatIf.ifFail?.topCause ?? "—"}</strong>
          {plan.whatIf.ifFail ? ` (${formatPercent(plan.whatIf.ifFail.probability)})` : ""}; if it passes, <strong>{plan.whatIf.ifPass?.topCause ?? "—"}</strong>
          {plan.whatIf.ifPass ? ` (${formatPercent(plan.whatIf.ifPass.probability)})` : ""}.
        </p>
      ) : null}
      <p className="mt-2 text-sm text-graphite-600">
        <kbd>N</kbd> next check · <kbd>↑</kbd>/<kbd>↓</kbd> move · <kbd>P</kbd> passed · <kbd>F</kbd> found a fault · <kbd>Enter</kbd> type a reading
      </p>
      <ol ref={list} className="mt-3 grid gap-3" aria-label="Checks, best value first" onKeyDown={(e) => onPlanKey(e, shown, record)}>
        {shown.map((s, i) => (
          <PlanStep key={s.checkId} step={s} first={i === 0} currency={currency} record={record} busy={busy} />
        ))}
      </ol>
      {later.length ? (
        <Fold className="mt-3" summaryClassName="min-h-tap cursor-pointer content-center text-graphite-700" summary={`${later.length + plan.moreSteps} more checks, unlikely to find it now`}>
          <ul className="mt-1 grid gap-1 text-sm text-graphite-700">
            {later.map((s) => (
              <li key={s.checkId} className="flex justify-between gap-2">
                <span>{s.name}</span>
                <span className="tabular">{formatPercent(s.pFind, 1)} · {formatMoney(s.cost, currency)}</span>
              </li>
            ))}
            {plan.moreSteps ? <li>… and {plan.moreSteps} more with almost no chance of finding it.</li> : null}
          </ul>
        </Fold>
      ) : null}
      {plan.aboveSkill.length ? (
        <div className="mt-4 border-t border-rule pt-3">
          <h3 className="font-semibold">Waiting for a senior</h3>
          <ul className="mt-1 grid gap-1 text-graphite-700">
            {plan.aboveSkill.map((s) => (
              <li key={s.checkId}>{s.name} — needs a {s.skill} ({formatPercent(s.pFind)} chance of finding it)</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}

function PlanStep({ step, first, currency, record, busy }: { step: Step; first: boolean; currency: string; record: RecordResult; busy: boolean }) {
  const [reading, setReading] = useState("");
  return (
    <li
      data-step={step.checkId}
      tabIndex={0}
      aria-label={step.name}
      className={`rounded-lg border p-3 outline-offset-2 ${first ? "border-uv-500 bg-uv-50" : "border-rule"}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-semibold">{first ? "Next: " : ""}{step.name}</h3>
        <span className="tabular text-sm">
          <strong>{formatPercent(step.pFind)}</strong> to find it · {step.minutes} min · {formatMoney(step.cost, currency)}
        </span>
      </div>
      <p className="text-sm text-graphite-600">
        {[step.skill, ...step.access.map((a) => ACCESS_LABEL[a] ?? a), ...step.tools].join(" · ")}
      </p>
      {/* Every check on offer can be recorded straight away (buttons, P and F), so its cautions
          are always shown in full; only the instructions fold. */}
      <Cautions cautions={step.cautions} />
      {step.instructions.length ? (
        <Fold className="mt-2" open={first} summaryClassName="cursor-pointer text-sm font-medium" summary="How to do it">
          <ol className="mt-1 list-decimal pl-6 text-sm">
            {step.instructions.map((line, i) => <li key={i}>{line}</li>)}
          </ol>
        </Fold>
      ) : null}
      {step.resultKind === "measurement" ? (
        <form
          className="mt-2 flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            record(step, { reading });
          }}
        >
          <label className="flex flex-col text-sm font-medium">
            Reading for {step.name.toLowerCase()}
            <input value={reading} onChange={(e) => setReading(e.target.value)} placeholder={step.rule ? `limit: ${step.rule.replace(/value\s*/g, "")}` : step.unit ?? ""} className="mt-1 min-h-tap w-56 rounded-lg border border-rule bg-card px-3 text-base" />
          </label>
          <button type="submit" disabled={busy} className="min-h-tap rounded-lg bg-uv-600 px-4 font-semibold text-white">Record reading</button>
        </form>
      ) : (
        <div className="mt-2 flex gap-2">
          <button type="button" disabled={busy} onClick={() => record(step, { result: "pass" })} className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper" aria-keyshortcuts="p">
            Passed <kbd className="text-sm text-graphite-500">P</kbd>
          </button>
          <button type="button" disabled={busy} onClick={() => record(step, { result: "fail" })} className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper" aria-keyshortcuts="f">
            Found a fault <kbd className="text-sm text-graphite-500">F</kbd>
          </button>
        </div>
      )}
      {step.failMeans ? <p className="mt-1 text-sm text-graphite-600">A fail means: {step.failMeans}</p> : null}
    </li>
  );
}
