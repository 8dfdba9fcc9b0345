import { mkdtemp, readdir, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import nodemailer from "nodemailer";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { parseMail } from "../../fakes/mime";
import { readInbox, startFakeSmtp } from "../../fakes/smtp";
import type { FakeSmtp } from "../../fakes/smtp";

let dir: string;
let smtp: FakeSmtp;

beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), "ramplight-mail-"));
  smtp = await startFakeSmtp({ port: 0, dir });
});
afterEach(async () => {
  await smtp.close();
  await rm(dir, { recursive: true, force: true });
});

const transport = () =>
  nodemailer.createTransport({ host: "127.0.0.1", port: smtp.port, secure: false, ignoreTLS: true });

describe("fake SMTP", () => {
  it("receives a multipart message from nodemailer and reads it back", async () => {
    const info = await transport().sendMail({
      from: "Bramblegate Motor Works <bookings@bramblegate.example>",
      to: "Priya Hale <priya@bramblegate.example>",
      bcc: "dana@bramblegate.example",
      subject: "Grüße: MOT booked for Thursday ✔",
      text: "Hello Priya,\nthe Berlingo is booked for its MOT on Thursday at 09:30.\nGrüße, Ines",
      html: "<p>Hello Priya,</p><p>the <strong>Berlingo</strong> is booked. Grüße, Ines</p>",
    });
    expect(info.accepted).toEqual(["priya@bramblegate.example", "dana@bramblegate.example"]);

    const [message, ...rest] = await smtp.messages();
    expect(rest).toHaveLength(0);
    expect(message).toMatchObject({
      envelope: {
        from: "bookings@bramblegate.example",
        to: ["priya@bramblegate.example", "dana@bramblegate.example"],
      },
      from: "Bramblegate Motor Works <bookings@bramblegate.example>",
      to: "Priya Hale <priya@bramblegate.example>",
      subject: "Grüße: MOT booked for Thursday ✔",
      text: "Hello Priya,\nthe Berlingo is booked for its MOT on Thursday at 09:30.\nGrüße, Ines",
      html: "<p>Hello Priya,</p><p>the <strong>Berlingo</strong> is booked. Grüße, Ines</p>",
      messageId: info.messageId,
    });
    expect(message!.raw).toContain("MIME-Version: 1.0");
  });

  it("keeps a long text-only message intact through quoted-printable", async () => {
    const text = `${"Brake pads and discs replaced on both axles; ".repeat(6)}total £212.40`;
    await transport().sendMail({
      from: "a@saltmarsh.example",
      to: "kit@saltmarsh.example",
      subject: "Invoice",
      text,
    });
    const [message] = await smtp.waitForMessages(1);
    expect(message!.raw).toMatch(/Content-Transfer-Encoding: quoted-printable/i);
    expect(message!.text).toBe(text);
    expect(message!.html).toBeNull();
  });

  it("writes each message as JSON that readInbox returns in arrival order", async () => {
    const t = transport();
    await t.sendMail({
      from: "a@bramblegate.example",
      to: "ines@bramblegate.example",
      subject: "first",
      text: "1",
    });
    await t.sendMail({
      from: "a@bramblegate.example",
      to: "ines@bramblegate.example",
      subject: "second",
      text: "2",
    });
    const inbox = await readInbox(dir);
    expect(inbox.map((m) => m.subject)).toEqual(["first", "second"]);
    expect(inbox).toEqual(await smtp.messages());
  });

  it("clear() empties memory and its own files, and leaves other files alone", async () => {
    await writeFile(join(dir, "notes.json"), "{}");
    await transport().sendMail({
      from: "a@bramblegate.example",
      to: "ines@bramblegate.example",
      subject: "gone soon",
      text: "x",
    });
    expect(await readInbox(dir)).toHaveLength(1);
    await smtp.clear();
    expect(await smtp.messages()).toEqual([]);
    expect(await readInbox(dir)).toEqual([]);
    expect(await readdir(dir)).toEqual(["notes.json"]);
  });

  it("waitForMessages rejects when nothing arrives in time", async () => {
    await expect(smtp.waitForMessages(1, 50)).rejects.toThrow(/expected 1 message/);
  });

  it("readInbox returns an empty list for a directory that does not exist", async () => {
    expect(await readInbox(join(dir, "missing"))).toEqual([]);
  });

  it("refuses to listen on a non-loopback address", async () => {
    await expect(startFakeSmtp({ host: "0.0.0.0" })).rejects.toThrow(/loopback/);
  });
});

describe("minimal MIME parsing", () => {
  it("decodes folded headers, encoded words and base64 parts", () => {
    const raw = [
      "Subject: =?UTF-8?B?U2FsdG1hcnNo?=",
      " =?UTF-8?Q?_Vehicle_Clinic_=E2=80=93_reminder?=",
      'Content-Type: multipart/mixed; boundary="b1"',
      "",
      "preamble",
      "--b1",
      "Content-Type: text/plain; charset=utf-8",
      "Content-Transfer-Encoding: base64",
      "",
      Buffer.from("Service due in 500 km").toString("base64"),
      "--b1",
      "Content-Type: text/plain",
      'Content-Disposition: attachment; filename="quote.txt"',
      "",
      "not the body",
      "--b1--",
      "",
    ].join("\r\n");
    const mail = parseMail(raw);
    expect(mail.headers.subject).toBe("Saltmarsh Vehicle Clinic – reminder");
    expect(mail.text).toBe("Service due in 500 km");
    expect(mail.html).toBeNull();
  });
});
