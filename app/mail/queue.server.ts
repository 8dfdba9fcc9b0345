import PgBoss from "pg-boss";
import type { Db, Tx } from "~/db/client.server";

// The job queue that delivers the outbox: pg-boss, in its own schema `pgboss` of the same database,
// so a job commits or rolls back with the change that asked for it and no other service is needed.
export const MAIL_QUEUE = "mail.deliver";
export const BOSS_SCHEMA = "pgboss";

export type MailJob = { outboxId: string };

/**
 * How pg-boss retries a delivery while the relay is away: 6 tries over roughly half an hour
 * (30 s doubling each time), then the row is `failed` and waits for an admin's "Send again".
 * A try that hangs past two minutes counts as failed.
 */
export type MailQueuePolicy = {
  retryLimit: number;
  retryDelay: number;
  retryBackoff: boolean;
  expireInSeconds: number;
};
export const MAIL_QUEUE_POLICY: MailQueuePolicy = {
  retryLimit: 5,
  retryDelay: 30,
  retryBackoff: true,
  expireInSeconds: 120,
};

/**
 * pg-boss's connection for one statement, on the caller's own client: drizzle keeps a transaction's
 * pg client on its session (the pool for a plain Db), so the job row is written inside the same
 * transaction as the outbox row.
 */
export function jobConnection(tx: Db | Tx): PgBoss.Db {
  const client = (tx as unknown as { session?: { client?: { query?: unknown } } }).session?.client;
  if (!client || typeof client.query !== "function")
    throw new Error("mail queue: this drizzle version keeps no pg client on its session");
  const query = client.query.bind(client) as (
    text: string,
    values: unknown[],
  ) => Promise<{ rows: unknown[] }>;
  return { executeSql: (text, values) => query(text, values) };
}

// Sending needs no running boss (no polling, no pool of its own): only its SQL, run on jobConnection.
let sender: PgBoss | undefined;

/** Asks for a delivery of one outbox row, in the caller's transaction. */
export async function enqueueDelivery(tx: Db | Tx, outboxId: string): Promise<string> {
  sender ??= new PgBoss({
    schema: BOSS_SCHEMA,
    db: {
      executeSql: () => Promise.reject(new Error("mail queue: the sender runs on the caller's connection")),
    },
  });
  const jobId = await sender.send(MAIL_QUEUE, { outboxId } satisfies MailJob, { db: jobConnection(tx) });
  // pg-boss answers null when the queue does not exist; a message that can never go out is a fault.
  if (!jobId) throw new Error(`mail queue: the queue ${MAIL_QUEUE} does not exist (run the migrations)`);
  return jobId;
}

/** A pg-boss for the given database, with our schema and an error listener (an unheard error event would end the process). */
export function createBoss(connectionString: string, options: PgBoss.ConstructorOptions = {}) {
  const boss = new PgBoss({ connectionString, schema: BOSS_SCHEMA, max: 2, ...options });
  boss.on("error", (error) => console.error("[mail] job queue:", error.message));
  return boss;
}

/** Creates pg-boss's schema (or brings it up to date) and the mail queue with its retry policy. */
export async function prepareMailQueue(boss: PgBoss, policy: MailQueuePolicy = MAIL_QUEUE_POLICY) {
  await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...policy });
  // createQueue keeps an existing queue as it is; the policy in code is the one that holds.
  await boss.updateQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...policy });
}

/** For the deploy step and the test template: pg-boss's schema and the queue, then nothing running. */
export async function installMailQueue(connectionString: string) {
  const boss = createBoss(connectionString, { supervise: false, schedule: false, max: 1 });
  await boss.start();
  try {
    await prepareMailQueue(boss);
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
}
