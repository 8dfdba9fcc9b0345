import { createTransport, type Transporter } from "nodemailer";

// Mail goes through nodemailer over SMTP: the local fake in the demo and tests, a real relay in
// production. Without SMTP_URL nothing is sent: messages wait in the outbox (app/mail/outbox.server.ts).
let transport: { url: string; t: Transporter } | undefined;

export function mailConfigured() {
  return Boolean(process.env.SMTP_URL);
}

/** The Message-ID (RFC 5322 section 3.6.4) of an outbox row: the same id on every attempt, so a
 * message that did reach the relay twice is recognisable as one. */
export function messageIdFor(outboxId: string) {
  return `<${outboxId}@ramplight.invalid>`;
}

export async function sendMail(message: { to: string; subject: string; text: string; outboxId?: string }) {
  const url = process.env.SMTP_URL;
  if (!url) return false;
  // One transport per URL: tests point the mailer at a fake that moves between runs.
  if (transport?.url !== url) {
    // Loopback fakes speak plain SMTP; anything else must offer TLS.
    const loopback = /^smtp:\/\/(127\.0\.0\.1|localhost)[:/]/.test(url);
    transport = {
      url,
      // Short timeouts: the delivery job holds the outbox row's lock while it talks to the relay,
      // and a relay that does not answer is better retried later than waited for.
      t: createTransport({
        url,
        ignoreTLS: loopback,
        connectionTimeout: 10_000,
        greetingTimeout: 10_000,
        socketTimeout: 30_000,
      } as Parameters<typeof createTransport>[0]),
    };
  }
  const { outboxId, ...rest } = message;
  await transport.t.sendMail({
    from: process.env.MAIL_FROM ?? "Ramplight <no-reply@ramplight.invalid>",
    ...rest,
    ...(outboxId ? { messageId: messageIdFor(outboxId) } : {}),
  });
  return true;
}
