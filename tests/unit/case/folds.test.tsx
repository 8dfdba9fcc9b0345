// The workbench renders what the technician reads first and leaves the rest folded until asked:
// a folded "why" or set of instructions is not in the page at all until it is opened, and the
// next check always shows its cautions in full while later checks name their hazards.
import { fireEvent, render, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { CheckPlan } from "~/components/case/check-plan";
import { LikelyCauses } from "~/components/case/likely-causes";
import type { Diagnosis } from "~/cases/present-diagnosis";

type Step = Diagnosis["plan"]["steps"][number];
const cause = (n: number, probability: number) => ({ id: `c${n}`, name: `Cause ${n}`, probability, priority: null, why: [{ label: `Evidence for ${n}`, weight: 1.5 }] });
const step = (n: number, cautions: string[] = []): Step => ({
  checkId: `k${n}`, name: `Check ${n}`, pFind: 0.5 / n, cost: 10 * n, ratio: 0.05 / n, skill: "technician", pReached: 1, minutes: 10,
  tools: [], access: [], cautions, instructions: [`Do step ${n}`], resultKind: "pass_fail", unit: null, rule: null, failMeans: `Fault ${n}`,
});
const plan = (steps: Step[]): Diagnosis["plan"] => ({ steps, moreSteps: 0, aboveSkill: [], expectedCost: 20, cheapestFirstExpectedCost: 25, saving: 5, whatIf: null });

describe("likely causes", () => {
  it("shows the why of the top cause and renders another's only when it is opened", () => {
    render(<LikelyCauses causes={[cause(1, 0.6), cause(2, 0.3)]} unlisted={0.1} />);
    expect(screen.getByText(/Evidence for 1/)).toBeTruthy();
    expect(screen.queryByText(/Evidence for 2/)).toBeNull();
    const second = screen.getByText("2. Cause 2").closest("li")!;
    const details = second.querySelector("details")!;
    details.open = true;
    fireEvent(details, new Event("toggle"));
    expect(within(second).getByText(/Evidence for 2/)).toBeTruthy();
  });
});

describe("check plan", () => {
  it("gives the next check its full cautions and instructions, later checks a named hazard and folded steps", () => {
    render(<CheckPlan plan={plan([step(1, ["lifting"]), step(2, ["hot_parts"])])} currency="GBP" record={vi.fn()} busy={false} error={null} />);
    const [first, second] = screen.getAllByRole("listitem").filter((li) => li.hasAttribute("data-step"));
    expect(within(first).getByText(/never work under a car held only by a jack/)).toBeTruthy();
    expect(within(first).getByText("Do step 1")).toBeTruthy();
    expect(within(second).getByRole("note", { name: "Cautions" }).textContent).toContain("hot parts");
    expect(within(second).queryByText("Do step 2")).toBeNull();
    const details = second.querySelector("details")!;
    details.open = true;
    fireEvent(details, new Event("toggle"));
    expect(within(second).getByText("Do step 2")).toBeTruthy();
    expect(within(second).getByText(/exhaust, engine and brakes stay hot/)).toBeTruthy();
    expect(within(second).getByText(/A fail means: Fault 2/)).toBeTruthy();
  });
});
