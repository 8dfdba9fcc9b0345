import { eq, sql } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { asMember } from "~/auth/guards.server";
import { loadAccount } from "~/auth/accounts.server";
import { mailOutbox, workshops } from "~/db/schema";
import { deliverOutboxMail } from "~/mail/deliver.server";
import { messageIdFor } from "~/mail/mailer.server";
import { queueMail, resendMail } from "~/mail/outbox.server";
import { MAIL_QUEUE } from "~/mail/queue.server";
import { startMailWorker, stopMailWorker } from "~/mail/worker.server";
import { invite } from "~/workshop/members.server";
import { seedId } from "../../../seeds/ids";
import { type FakeSmtp, startFakeSmtp } from "../../fakes/smtp";
import { testDb } from "../../setup/integration-worker";

// Recipients under .example (RFC 2606: reserved, never delivered anywhere).
let smtp: FakeSmtp | undefined;
let workshopId: string;

async function smtpOn(port = 0) {
  smtp = await startFakeSmtp({ port });
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtp.port}`;
  return smtp.port;
}
async function smtpDown() {
  await smtp?.close();
  smtp = undefined;
}
const row = async (id: string) => (await testDb().select().from(mailOutbox).where(eq(mailOutbox.id, id)))[0];
const jobsFor = async (id: string) =>
  (
    await testDb().execute<{ n: number }>(
      sql`select count(*)::int as n from pgboss.job where name = ${MAIL_QUEUE} and data->>'outboxId' = ${id}`,
    )
  ).rows[0].n;
const mail = (subject: string) => ({
  workshopId,
  kind: "test",
  to: "someone@mail.example",
  subject,
  text: "Hello",
});

async function until<T>(what: string, probe: () => Promise<T | undefined | false>, ms = 15_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const got = await probe();
    if (got) return got;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

beforeAll(async () => {
  const [w] = await testDb()
    .select({ id: workshops.id })
    .from(workshops)
    .where(eq(workshops.slug, "bramblegate"));
  workshopId = w.id;
});
afterEach(async () => {
  await stopMailWorker();
  await smtpDown();
  delete process.env.SMTP_URL;
});
afterAll(() => stopMailWorker());

describe("the mail outbox", () => {
  it("leaves no outbox row and no job behind when the transaction rolls back", async () => {
    let id = "";
    await expect(
      testDb().transaction(async (tx) => {
        id = await queueMail(tx, mail("Rolled back"));
        // Inside the transaction both exist…
        expect((await tx.select().from(mailOutbox).where(eq(mailOutbox.id, id))).length).toBe(1);
        throw new Error("the change failed");
      }),
    ).rejects.toThrow("the change failed");
    expect(id).not.toBe("");
    expect(await row(id)).toBeUndefined();
    expect(await jobsFor(id)).toBe(0);
    // …and a worker finds nothing to deliver.
    await smtpOn();
    expect(await deliverOutboxMail(testDb(), id, { final: false })).toBe("skipped");
    expect(await smtp!.messages()).toHaveLength(0);
  });

  it("queues one delivery job with the outbox row when the transaction commits", async () => {
    const id = await testDb().transaction((tx) => queueMail(tx, mail("Committed")));
    expect(await row(id)).toMatchObject({ state: "queued", attempts: 0, sentAt: null });
    expect(await jobsFor(id)).toBe(1);
  });

  it("keeps the message queued with its error while the relay is down, and delivers it once it is back", async () => {
    // A port that was free a moment ago: nothing listens there now, so connecting is refused.
    const port = await smtpOn();
    await smtpDown();
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    // pg-boss retries after 1 s here instead of 30 s doubling, so the test takes seconds.
    await startMailWorker({
      db: testDb(),
      connectionString: process.env.DATABASE_URL,
      policy: { retryLimit: 20, retryDelay: 1, retryBackoff: false, expireInSeconds: 30 },
      pollingIntervalSeconds: 0.5,
    });
    const id = await testDb().transaction((tx) => queueMail(tx, mail("While the relay is away")));
    const failed = await until("a failed attempt", async () => {
      const r = await row(id);
      return r.attempts >= 1 && r;
    });
    expect(failed.state).toBe("queued");
    expect(failed.sentAt).toBeNull();
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);

    await smtpOn(port);
    const sent = await until("the delivery", async () => {
      const r = await row(id);
      return r.state === "sent" && r;
    });
    expect(sent.attempts).toBeGreaterThanOrEqual(2);
    expect(sent.sentAt).toBeInstanceOf(Date);
    const [message] = await smtp!.waitForMessages(1, 5_000);
    expect(message.subject).toBe("While the relay is away");
    expect(message.messageId).toBe(messageIdFor(id));
  });

  it("lets pg-boss make the row failed on its last try, counting every attempt", async () => {
    const port = await smtpOn();
    await smtpDown();
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    // Two tries in all: the first and one retry a second later.
    await startMailWorker({
      db: testDb(),
      connectionString: process.env.DATABASE_URL,
      policy: { retryLimit: 1, retryDelay: 1, retryBackoff: false, expireInSeconds: 30 },
      pollingIntervalSeconds: 0.5,
    });
    const id = await testDb().transaction((tx) => queueMail(tx, mail("Never reaches the relay")));
    const failed = await until("the last try", async () => {
      const r = await row(id);
      return r.state === "failed" && r;
    });
    expect(failed.attempts).toBe(2);
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);
    // No third try: the job is spent, the row waits for "Send again".
    await new Promise((r) => setTimeout(r, 2_000));
    expect(await row(id)).toMatchObject({ state: "failed", attempts: 2 });
  });

  it("sends a message once when two deliveries of the same job run, together or later", async () => {
    await smtpOn();
    const id = await testDb().transaction((tx) => queueMail(tx, mail("Only once")));
    const outcomes = await Promise.all([
      deliverOutboxMail(testDb(), id, { final: false }),
      deliverOutboxMail(testDb(), id, { final: false }),
    ]);
    expect(outcomes.sort()).toEqual(["sent", "skipped"]);
    expect(await deliverOutboxMail(testDb(), id, { final: false })).toBe("skipped");
    expect((await smtp!.messages()).filter((m) => m.subject === "Only once")).toHaveLength(1);
    expect(await row(id)).toMatchObject({ state: "sent", attempts: 1 });
  });

  it("marks the message failed after the last try, and an admin's Send again delivers it", async () => {
    const port = await smtpOn();
    await smtpDown();
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    const id = await testDb().transaction((tx) => queueMail(tx, mail("Ran out of tries")));
    await expect(deliverOutboxMail(testDb(), id, { final: false })).rejects.toThrow();
    expect(await deliverOutboxMail(testDb(), id, { final: true })).toBe("failed");
    expect(await row(id)).toMatchObject({ state: "failed", attempts: 2 });

    const admin = asMember((await loadAccount(testDb(), seedId("user:ines-okafor")))!);
    expect(await resendMail(testDb(), admin, id)).toMatch(/queued again/);
    expect(await row(id)).toMatchObject({ state: "queued" });
    expect(await jobsFor(id)).toBe(2);
    // Queued again already: a second press is refused and queues nothing.
    await expect(resendMail(testDb(), admin, id)).rejects.toMatchObject({ status: 409 });
    expect(await jobsFor(id)).toBe(2);

    await smtpOn(port);
    expect(await deliverOutboxMail(testDb(), id, { final: false })).toBe("sent");
    expect(await smtp!.messages()).toHaveLength(1);
    await expect(resendMail(testDb(), admin, id)).rejects.toMatchObject({ status: 409 });
  });

  it("queues the invitation e-mail with the invitation and says so, even with the relay down", async () => {
    process.env.SMTP_URL = "smtp://127.0.0.1:9"; // the discard port: nothing is sent before the job runs
    const admin = asMember((await loadAccount(testDb(), seedId("user:ines-okafor")))!);
    const notice = await invite(testDb(), admin, {
      target: "queued.invite@mail.example",
      role: "technician",
    });
    expect(notice).toMatch(/queued.invite@mail.example is queued/);
    const [r] = await testDb()
      .select()
      .from(mailOutbox)
      .where(eq(mailOutbox.toAddress, "queued.invite@mail.example"));
    expect(r).toMatchObject({ kind: "invitation", state: "queued", workshopId });
    expect(r.subject).toBe("You are invited to Bramblegate Motor Works on Ramplight");
    expect(await jobsFor(r.id)).toBe(1);
  });
});
