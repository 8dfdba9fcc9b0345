import { and, desc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { sendCode, verifyCode } from "~/auth/code-sign-in.server";
import { countSignIn } from "~/auth/rate-limit.server";
import { startSignIn } from "~/auth/sign-in.server";
import { mailOutbox, members, users, workshops } from "~/db/schema";
import { TEST_ENV } from "../../setup/test-env";
import { testDb } from "../../setup/integration-worker";

// One network address for the whole workshop (TEST-NET-3, RFC 5737: documentation only).
const WORKSHOP_IP = "203.0.113.40";

type Answer =
  Response | { data: { errors: Record<string, string[] | undefined> }; init: ResponseInit | null };

function post(fields: Record<string, string>, cookie = "") {
  return new Request(`${TEST_ENV.APP_URL}/sign-in/code`, {
    method: "POST",
    headers: {
      "content-type": "application/x-www-form-urlencoded",
      cookie,
      "user-agent": "integration test",
    },
    body: new URLSearchParams(fields),
  });
}

const cookiesOf = (res: Response) =>
  res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");

/** Asks for a code as the browser would and returns it from the outbox with the cookie that holds it. */
async function ask(email: string, ip = WORKSHOP_IP) {
  const answer = (await sendCode(testDb(), post({ intent: "send", email }), ip)) as Answer;
  if (!(answer instanceof Response)) throw new Error(`no code sent: ${JSON.stringify(answer.data)}`);
  const [mail] = await testDb()
    .select({ text: mailOutbox.text })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.toAddress, email), eq(mailOutbox.kind, "sign-in-code")))
    .orderBy(desc(mailOutbox.createdAt))
    .limit(1);
  return { code: /Your sign-in code is (\d{6})/.exec(mail.text)![1], cookie: cookiesOf(answer) };
}

const verify = (code: string, cookie: string, ip = WORKSHOP_IP) =>
  verifyCode(testDb(), post({ intent: "verify", code }, cookie), ip) as Promise<Answer>;

describe("sign-in code limits", () => {
  it("lets twenty-five members sign in from one address within five minutes", async () => {
    const [w] = await testDb()
      .select({ id: workshops.id })
      .from(workshops)
      .where(eq(workshops.slug, "bramblegate"));
    for (let i = 0; i < 25; i++) {
      const [u] = await testDb()
        .insert(users)
        .values({ name: `Bay member ${i}`, email: `bay.${i}@workshop.example` })
        .returning({ id: users.id });
      await testDb().insert(members).values({ workshopId: w.id, userId: u.id, role: "technician" });
    }
    const started = Date.now();
    for (let i = 0; i < 25; i++) {
      const { code, cookie } = await ask(`bay.${i}@workshop.example`);
      const answer = await verify(code, cookie);
      expect(answer, `member ${i}`).toBeInstanceOf(Response);
      const res = answer as Response;
      expect(res.status).toBe(302);
      expect(res.headers.get("location")).toBe("/board");
      expect(
        res.headers.getSetCookie().some((c) => c.startsWith("rl_session=") && !c.includes("Max-Age=0")),
      ).toBe(true);
    }
    expect(Date.now() - started).toBeLessThan(5 * 60_000);
  });

  it("refuses thirty wrong codes for one address with a message and a time, and no one else", async () => {
    const email = "tomas@bramblegate.example";
    let current = await ask(email, "198.51.100.20");
    const answers: { status: number; message: string }[] = [];
    for (let i = 0; i < 30; i++) {
      const wrong = current.code === "000000" ? "111111" : "000000";
      const answer = await verify(wrong, current.cookie, "198.51.100.20");
      expect(answer).not.toBeInstanceOf(Response);
      const refused = answer as Exclude<Answer, Response>;
      const message = refused.data.errors.code?.[0] ?? refused.data.errors.form?.[0] ?? "";
      answers.push({ status: refused.init?.status ?? 200, message });
      // A code that has had its five tries is dead: ask for another, as the page says.
      if (/too many wrong tries/.test(message)) current = await ask(email, "198.51.100.20");
    }
    // Ten tries per address per window (the server's default), five per code: wrong answers first…
    expect(answers.slice(0, 5).every((a) => a.status === 400 && /not right/.test(a.message))).toBe(true);
    // …then every further try is refused with the address and the time to come back.
    const last = answers[29];
    expect(last.status).toBe(429);
    expect(last.message).toMatch(
      new RegExp(
        `^Too many tries for ${email}\\. Try again after \\d\\d:\\d\\d UTC \\(in about \\d+ minutes?\\)\\.$`,
      ),
    );
    expect(
      answers.filter((a) => a.status === 429 && /Too many tries for/.test(a.message)).length,
    ).toBeGreaterThanOrEqual(15);
    // Even the right code waits out the window; another member from the same address does not.
    const locked = await verify(current.code, current.cookie, "198.51.100.20");
    expect(locked).not.toBeInstanceOf(Response);
    const other = await ask("priya@bramblegate.example", "198.51.100.20");
    const fine = await verify(other.code, other.cookie, "198.51.100.20");
    expect(fine).toBeInstanceOf(Response);
  });

  it("sends the landing page's GitHub button, once the address is over its limit, to a page that says when", async () => {
    const ip = "198.51.100.77";
    const now = new Date();
    // Fill the address's bucket to the server's ceiling (300 per 5 minutes by default).
    for (let i = 0; i < 300; i++) await countSignIn(testDb(), `ip:${ip}`, 300, 300, now);
    const req = new Request(`${TEST_ENV.APP_URL}/auth/github`, {
      method: "POST",
      body: new URLSearchParams(),
    });
    const answer = await startSignIn(testDb(), req, ip).catch((r: unknown) => r);
    expect(answer).toBeInstanceOf(Response);
    const location = (answer as Response).headers.get("location")!;
    expect(location).toMatch(/^\/sign-in\?retry=/);
    const retry = new Date(new URL(location, TEST_ENV.APP_URL).searchParams.get("retry")!);
    expect(retry.getTime() - now.getTime()).toBe(300_000);
  });
});
