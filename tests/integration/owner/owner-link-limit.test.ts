// Dead owner links from one address are limited, with the time to try again on the page; another
// address is not held up. The limit (30 in 15 minutes) is common practice, no published source.
import { describe, expect, it } from "vitest";
import { clientAddressContext } from "~/http/context";
import { OWNER_LINK_MISSES } from "~/estimates/owner-link-limit.server";
import { draftFromCause } from "~/estimates/draft.server";
import { loadEstimateCase } from "~/estimates/estimate-case.server";
import { sendEstimate } from "~/estimates/send.server";
import { loader } from "~/routes/owner/estimate";
import { testDb } from "../../setup/integration-worker";
import { APP, BRAMBLEGATE, caseId, contextFor, memberFor } from "../api/helpers";

async function open(token: string, address: string) {
  const context = contextFor(testDb());
  context.set(clientAddressContext, address);
  try {
    await loader({ request: new Request(`${APP}/o/${token}`), params: { token }, context } as never);
    return 200;
  } catch (e) {
    if (e instanceof Response) return e.status === 429 ? `429 ${(await e.json()).error}` : e.status;
    throw e;
  }
}

describe("owner links from one address", () => {
  it("refuses after 30 dead links, says when to try again, and holds no one else up", async () => {
    const db = testDb();
    const dana = await memberFor(db, "dana-reyes");
    await draftFromCause(db, dana, await loadEstimateCase(db, BRAMBLEGATE, caseId("b4")));
    const { token } = await sendEstimate(db, dana, caseId("b4"), { message: "" });
    const dead = "A".repeat(43);
    const answers = [];
    for (let i = 0; i < OWNER_LINK_MISSES; i++) answers.push(await open(dead, "203.0.113.7"));
    expect(answers).toEqual(Array(OWNER_LINK_MISSES).fill(404));
    // Addresses from RFC 5737's documentation ranges.
    expect(await open(dead, "203.0.113.7")).toMatch(/^429 Too many links .* Try again after \d\d:\d\d UTC/);
    expect(await open(token, "203.0.113.7")).toMatch(/^429 /);
    expect(await open(token, "198.51.100.20")).toBe(200);
  });
});
