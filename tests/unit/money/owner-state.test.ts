import { describe, expect, it } from "vitest";
import { ownerState, ownerStateOf } from "~/estimates/owner-state";
import { evidenceSentences } from "~/estimates/document";

describe("where a case stands with its owner", () => {
  it("moves not sent → sent → opened → answered → paid", () => {
    expect(ownerState({ sent: false, opened: false, decisions: null, payment: null })).toBe("not_sent");
    expect(ownerState({ sent: true, opened: false, decisions: null, payment: null })).toBe("sent");
    expect(ownerState({ sent: true, opened: true, decisions: null, payment: null })).toBe("opened");
    expect(ownerState({ sent: true, opened: true, decisions: ["approved", "approved"], payment: null })).toBe(
      "approved_all",
    );
    expect(
      ownerState({ sent: true, opened: true, decisions: ["approved", "declined"], payment: "open" }),
    ).toBe("approved_some");
    expect(ownerState({ sent: true, opened: true, decisions: ["declined"], payment: null })).toBe("declined");
    expect(ownerState({ sent: true, opened: true, decisions: ["approved"], payment: "paid" })).toBe("paid");
  });
  it("reads the same from the list's counts", () => {
    expect(ownerStateOf(null)).toBe("not_sent");
    expect(ownerStateOf({ opened: true, answered: true, decided: 3, approved: 2, paid: false })).toBe(
      "approved_some",
    );
    expect(ownerStateOf({ opened: false, answered: false, decided: 0, approved: 0, paid: false })).toBe(
      "sent",
    );
  });
});

describe("evidence in the owner's words", () => {
  it("says what the owner told us and what we did, in the past tense", () => {
    expect(
      evidenceSentences(
        {
          present: [{ name: "Grinding when braking", source: "owner" }],
          failed: [
            { name: "Check the wheel spins freely", reading: null, rule: null },
            { name: "Measure disc run-out", reading: "0.11 mm", rule: "value <= 0.05 mm" },
          ],
        },
        "metric",
      ),
    ).toEqual([
      "You told us: grinding when braking.",
      "We checked the wheel spins freely: not in order.",
      "We measured disc run-out: 0.11 mm; it should be at most 0.05 mm.",
    ]);
  });
});
