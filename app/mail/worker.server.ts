import type PgBoss from "pg-boss";
import type { Db } from "~/db/client.server";
import { serverDb } from "~/db/pool.server";
import { env } from "~/config/env.server";
import { deliverOutboxMail } from "./deliver.server";
import { mailConfigured } from "./mailer.server";
import { createBoss, MAIL_QUEUE, type MailJob, type MailQueuePolicy, prepareMailQueue } from "./queue.server";

let running: PgBoss | undefined;

export type MailWorkerOptions = {
  db?: Db; // the outbox's database; the server's pool unless told
  connectionString?: string; // pg-boss's own connections; DATABASE_URL unless told
  policy?: MailQueuePolicy; // tests retry within seconds
  pollingIntervalSeconds?: number;
};

/**
 * Starts delivering the outbox in this process: pg-boss creates or updates its schema, the queue
 * gets its retry policy, and each job is one delivery attempt. Every server process may run one;
 * pg-boss hands each job to one of them and the row lock keeps a message from going out twice.
 * Without SMTP_URL nothing starts and messages wait in the outbox.
 */
export async function startMailWorker(options: MailWorkerOptions = {}): Promise<boolean> {
  if (running) return true;
  if (!mailConfigured()) {
    console.warn("[mail] SMTP_URL is not set: messages stay in the outbox until a mail server is configured");
    return false;
  }
  const db = options.db ?? serverDb();
  const boss = createBoss(options.connectionString ?? env().DATABASE_URL);
  await boss.start();
  try {
    await prepareMailQueue(boss, options.policy);
    await boss.work<MailJob>(
      MAIL_QUEUE,
      // One job at a time per process; the first poll is at once, then every second, so a message
      // queued by a request usually leaves within a second or two.
      { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1 },
      async ([job]) => {
        await deliverOutboxMail(db, job.data.outboxId, { final: job.retryCount >= job.retryLimit });
      },
    );
  } catch (error) {
    await boss.stop({ graceful: false });
    throw error;
  }
  running = boss;
  return true;
}

/** Stops taking jobs, lets the one in hand finish (up to 3 s, inside the server's 5 s exit) and closes pg-boss's connections. */
export async function stopMailWorker(): Promise<void> {
  const boss = running;
  running = undefined;
  if (!boss) return;
  // wait: true resolves once the job in hand is done (or the timeout passed) and the pool is closed.
  await boss.stop({ graceful: true, timeout: 3_000, wait: true });
}
