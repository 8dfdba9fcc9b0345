import { createTransport, type Transporter } from "nodemailer";

// Mail goes through nodemailer over SMTP: the local fake in the demo and tests, a real relay in
// production. Without SMTP_URL nothing is sent and the caller says so on screen.
let transport: Transporter | undefined;

export function mailConfigured() {
  return Boolean(process.env.SMTP_URL);
}

export async function sendMail(message: { to: string; subject: string; text: string }) {
  const url = process.env.SMTP_URL;
  if (!url) return false;
  // Loopback fakes speak plain SMTP; anything else must offer TLS.
  const loopback = /^smtp:\/\/(127\.0\.0\.1|localhost)[:/]/.test(url);
  transport ??= createTransport({ url, ignoreTLS: loopback } as Parameters<typeof createTransport>[0]);
  await transport.sendMail({
    from: process.env.MAIL_FROM ?? "Ramplight <no-reply@ramplight.invalid>",
    ...message,
  });
  return true;
}
