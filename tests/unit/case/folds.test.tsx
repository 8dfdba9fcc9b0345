// The workbench renders what the technician reads first and leaves the rest folded until asked:
// a folded "why" or set of instructions is not in the page at all until it is opened. Cautions are
// never folded: every check on offer can be recorded at once, so each shows them in full.
import { act, fireEvent, render, screen, within } from "@testing-library/react";
import { hydrateRoot } from "react-dom/client";
import { renderToString } from "react-dom/server";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { describe, expect, it, vi } from "vitest";
import { CheckPlan } from "~/components/case/check-plan";
import { LikelyCauses } from "~/components/case/likely-causes";
import { Fold } from "~/components/fold";
import type { Diagnosis } from "~/cases/present-diagnosis";

/** Components that read through React Query need its client, as the app's root gives them. */
const renderWithQuery = (ui: React.ReactElement) =>
  render(<QueryClientProvider client={new QueryClient()}>{ui}</QueryClientProvider>);

type Step = Diagnosis["plan"]["steps"][number];
const cause = (n: number, probability: number) => ({
  id: `c${n}`,
  name: `Cause ${n}`,
  probability,
  priority: null,
  why: [{ label: `Evidence for ${n}`, recorded: "present", weight: 1.5 }],
});
const step = (n: number, cautions: string[] = []): Step => ({
  checkId: `k${n}`,
  name: `Check ${n}`,
  pFind: 0.5 / n,
  cost: 10 * n,
  skill: "technician",
  minutes: 10,
  tools: [],
  access: [],
  cautions,
  instructions: [`Do step ${n}`],
  resultKind: "pass_fail",
  unit: null,
  limit: null,
  detailed: true,
  failMeans: `Fault ${n}`,
});
const plan = (steps: Step[]): Diagnosis["plan"] => ({
  steps,
  moreSteps: 0,
  aboveSkill: [],
  expectedCost: 20,
  cheapestFirstExpectedCost: 25,
  saving: 5,
  whatIf: null,
});

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
  it("shows every offered check's cautions in full and folds only the later checks' instructions", () => {
    renderWithQuery(
      <CheckPlan
        plan={plan([step(1, ["lifting"]), step(2, ["hot_parts"])])}
        currency="GBP"
        record={vi.fn()}
        busy={false}
        error={null}
        errorFor={() => null}
      />,
    );
    const [first, second] = screen.getAllByRole("listitem").filter((li) => li.hasAttribute("data-step"));
    expect(within(first).getByText(/never work under a car held only by a jack/)).toBeTruthy();
    expect(within(first).getByText("Do step 1")).toBeTruthy();
    expect(within(second).getByRole("note", { name: "Cautions" }).textContent).toMatch(
      /exhaust, engine and brakes stay hot/,
    );
    expect(within(second).getByText(/A fail means: Fault 2/)).toBeTruthy();
    expect(within(second).queryByText("Do step 2")).toBeNull();
    const details = second.querySelector("details")!;
    details.open = true;
    fireEvent(details, new Event("toggle"));
    expect(within(second).getByText("Do step 2")).toBeTruthy();
  });

  it("shows the cautions of a check that has no instructions", () => {
    const bare = { ...step(2, ["high_voltage"]), instructions: [] };
    renderWithQuery(
      <CheckPlan
        plan={plan([step(1), bare])}
        currency="GBP"
        record={vi.fn()}
        busy={false}
        error={null}
        errorFor={() => null}
      />,
    );
    const second = screen.getAllByRole("listitem").filter((li) => li.hasAttribute("data-step"))[1];
    expect(within(second).getByRole("note", { name: "Cautions" }).textContent).toMatch(
      /only trained and authorised people/,
    );
  });
});

describe("Fold", () => {
  it("renders its contents at once when told to open, and keeps them", () => {
    const { rerender } = render(
      <Fold summary="More" open={false}>
        inside
      </Fold>,
    );
    expect(screen.queryByText("inside")).toBeNull();
    rerender(
      <Fold summary="More" open>
        inside
      </Fold>,
    );
    expect(screen.getByText("inside")).toBeTruthy();
    rerender(
      <Fold summary="More" open={false}>
        inside
      </Fold>,
    );
    expect(screen.getByText("inside")).toBeTruthy();
  });

  it("fills a fold that was opened before the page's script took over", async () => {
    const container = document.createElement("div");
    container.innerHTML = renderToString(<Fold summary="More">inside</Fold>);
    document.body.append(container);
    container.querySelector("details")!.open = true; // the browser opened it; React was not there yet
    await act(async () => {
      hydrateRoot(container, <Fold summary="More">inside</Fold>);
    });
    expect(container.textContent).toContain("inside");
    container.remove();
  });
});
