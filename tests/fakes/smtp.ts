// A fake SMTP relay (RFC 5321) that accepts every message and delivers none: mail stays in memory
// and, when `dir` is given, in JSON files the demo can show as an inbox. No TLS and no auth, so
// it must stay on loopback; senders connect with nodemailer's `ignoreTLS: true`.
import { randomBytes } from "node:crypto";
import { mkdir, readFile, readdir, rename, rm, writeFile } from "node:fs/promises";
import { join } from "node:path";
import { SMTPServer } from "smtp-server";
import { assertLoopback, DEFAULT_HOST } from "./http-util";
import { parseMail } from "./mime";

export type StoredMessage = {
  id: string;
  receivedAt: string; // ISO 8601
  envelope: { from: string | null; to: string[] }; // MAIL FROM / RCPT TO: includes Bcc recipients
  from: string; // header values, encoded words decoded
  to: string;
  subject: string;
  text: string | null;
  html: string | null;
  messageId: string | null;
  raw: string;
};

export type FakeSmtpOptions = { port?: number; host?: string; dir?: string };

export type FakeSmtp = {
  port: number;
  host: string;
  close(): Promise<void>;
  messages(): Promise<StoredMessage[]>;
  clear(): Promise<void>;
  // Resolves once at least `count` messages have arrived; mail sending is async in most apps.
  waitForMessages(count: number, timeoutMs?: number): Promise<StoredMessage[]>;
};

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;
// Only files we wrote: clear() must never delete something else that lives in the directory.
const FILE_NAME = /^\d{13}-\d{6}-[0-9a-f]{12}\.json$/;

export async function startFakeSmtp(opts: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = opts.host ?? DEFAULT_HOST;
  assertLoopback(host);
  const stored: StoredMessage[] = [];
  const waiters = new Set<() => void>();
  let sequence = 0; // orders files written within the same millisecond
  if (opts.dir) await mkdir(opts.dir, { recursive: true });

  async function keep(raw: string, from: string | null, to: string[]): Promise<string> {
    const received = new Date();
    const id = randomBytes(6).toString("hex");
    const mail = parseMail(raw);
    const message: StoredMessage = {
      id,
      receivedAt: received.toISOString(),
      envelope: { from, to },
      from: mail.headers.from ?? "",
      to: mail.headers.to ?? "",
      subject: mail.headers.subject ?? "",
      text: mail.text,
      html: mail.html,
      messageId: mail.headers["message-id"] ?? null,
      raw,
    };
    if (opts.dir) {
      // Write then rename, so a reader polling the directory never sees half a message.
      const seq = String(++sequence % 1_000_000).padStart(6, "0");
      const file = join(opts.dir, `${received.getTime()}-${seq}-${id}.json`);
      // The folder may have been cleared since start-up (tests empty it between journeys).
      await mkdir(opts.dir, { recursive: true });
      await writeFile(`${file}.tmp`, JSON.stringify(message, null, 2));
      await rename(`${file}.tmp`, file);
    }
    stored.push(message);
    for (const wake of waiters) wake();
    return id;
  }

  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    banner: "Ramplight fake SMTP: local demo only, nothing is delivered",
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", (err: Error) => callback(err));
      stream.on("end", () => {
        if (stream.sizeExceeded)
          return callback(Object.assign(new Error("Message too large"), { responseCode: 552 }));
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
        const to = session.envelope.rcptTo.map((r) => r.address);
        keep(Buffer.concat(chunks).toString("utf8"), from, to).then(
          (id) => callback(null, `Queued as ${id}`),
          (err: Error) => callback(err),
        );
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port ?? 0, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const address = server.server.address();
  if (address === null || typeof address === "string") throw new Error("SMTP fake has no TCP address");

  return {
    port: address.port,
    host,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
    messages: async () => [...stored],
    clear: async () => {
      stored.length = 0;
      if (!opts.dir) return;
      for (const name of await readdir(opts.dir)) {
        if (FILE_NAME.test(name)) await rm(join(opts.dir, name), { force: true });
      }
    },
    waitForMessages: (count, timeoutMs = 5000) =>
      new Promise<StoredMessage[]>((resolve, reject) => {
        const check = () => {
          if (stored.length < count) return;
          cleanup();
          resolve([...stored]);
        };
        const timer = setTimeout(() => {
          cleanup();
          reject(new Error(`expected ${count} message(s), got ${stored.length} within ${timeoutMs} ms`));
        }, timeoutMs);
        const cleanup = () => {
          clearTimeout(timer);
          waiters.delete(check);
        };
        waiters.add(check);
        check();
      }),
  };
}

// For the demo's inbox page and for tests that run the fake in another process.
export async function readInbox(dir: string): Promise<StoredMessage[]> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  const files = names.filter((name) => FILE_NAME.test(name)).sort();
  const messages: StoredMessage[] = [];
  for (const name of files) {
    messages.push(JSON.parse(await readFile(join(dir, name), "utf8")) as StoredMessage);
  }
  return messages;
}
