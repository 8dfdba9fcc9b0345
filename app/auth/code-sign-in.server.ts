import { eq } from "drizzle-orm";
import { data } from "react-router";
import { z } from "zod";
import type { Db } from "~/db/client.server";
import { usedSignInCodes } from "~/db/schema";
import { env } from "~/config/env.server";
import type { FormErrors } from "~/http/forms";
import { signInFromEmail } from "./accounts.server";
import {
  CODE_ERRORS,
  codeKey,
  errorFromAnswer,
  readCodeCookie,
  runStrategy,
  verifiedEmail,
} from "./code.server";
import { clientIp, countSignIn, tryAgainAt } from "./rate-limit.server";
import { openSession } from "./sign-in.server";

export type CodeAnswer = { errors: FormErrors; email?: string };

function refused(errors: FormErrors, status: number, cookies: string[] = []) {
  const headers = new Headers();
  for (const c of cookies) headers.append("Set-Cookie", c);
  return data<CodeAnswer>({ errors }, { status, headers });
}

const EmailSchema = z.object({
  email: z
    .string()
    .trim()
    .toLowerCase()
    .pipe(z.email({ message: CODE_ERRORS.invalidEmail })),
});
const CodeSchema = z.object({
  code: z
    .string()
    .transform((v) => v.replace(/\s+/g, ""))
    .pipe(z.string().regex(/^\d{6}$/, "The code is the 6 digits from the e-mail.")),
});

/**
 * Step one: e-mail a code. Known and unknown addresses get the same answer and the same mail (a
 * code proves the address, nothing more), so the answer never tells whether an account exists.
 */
export async function sendCode(db: Db, request: Request, socketAddress: string | null) {
  const e = env();
  const form = Object.fromEntries(await request.clone().formData());
  const parsed = EmailSchema.safeParse(form);
  if (!parsed.success) return refused({ email: [CODE_ERRORS.invalidEmail] }, 400);
  const email = parsed.data.email;
  const network = await networkLimit(db, request, socketAddress);
  if (network) return network;
  const sends = await countSignIn(
    db,
    `code-send:${email}`,
    e.SIGN_IN_CODE_SENDS_PER_ADDRESS,
    e.SIGN_IN_CODE_WINDOW_S,
  );
  if (!sends.ok)
    return refused(
      { email: [`Several codes went to this address already. ${tryAgainAt(sends.retryAt)}`] },
      429,
    );
  // The strategy reads the address from the form; hand it the normalised one.
  const body = new URLSearchParams({ email });
  return runStrategy(db, new Request(request.url, { method: "POST", headers: request.headers, body }));
}

/** The far higher limit per client address; a refusal to return, or null to go on. */
async function networkLimit(db: Db, request: Request, socketAddress: string | null) {
  const e = env();
  const ip = await countSignIn(
    db,
    `ip:${clientIp(request, socketAddress)}`,
    e.SIGN_IN_LIMIT_PER_IP,
    e.SIGN_IN_WINDOW_S,
  );
  return ip.ok
    ? null
    : refused({ form: [`Too many sign-ins from this network. ${tryAgainAt(ip.retryAt)}`] }, 429);
}

/** Step two: the code typed on the page, or the one the magic link carries (same browser only). */
export async function verifyCode(db: Db, request: Request, socketAddress: string | null) {
  const e = env();
  let typed: string | undefined;
  if (request.method === "POST") {
    const parsed = CodeSchema.safeParse(Object.fromEntries(await request.clone().formData()));
    if (!parsed.success) return refused({ code: [parsed.error.issues[0].message] }, 400);
    typed = parsed.data.code;
  }
  const { email, jwe } = readCodeCookie(request);
  if (!email || !jwe) return refused({ code: [CODE_ERRORS.missingSessionEmail] }, 400);
  const key = codeKey(jwe);

  const network = await networkLimit(db, request, socketAddress);
  if (network) return network;
  // Per address first: whoever guesses at one person's codes is stopped long before the network is.
  const perAddress = await countSignIn(
    db,
    `code-try:${email}`,
    e.SIGN_IN_CODE_TRIES_PER_ADDRESS,
    e.SIGN_IN_CODE_WINDOW_S,
  );
  if (!perAddress.ok)
    return refused({ code: [`Too many tries for ${email}. ${tryAgainAt(perAddress.retryAt)}`] }, 429);
  const [used] = await db.select().from(usedSignInCodes).where(eq(usedSignInCodes.codeHash, key));
  if (used) return refused({ code: ["That code was used already. Ask for a new one."] }, 400);
  const perCode = await countSignIn(db, `code:${key}`, e.SIGN_IN_CODE_TRIES, e.SIGN_IN_CODE_PERIOD_S);
  if (!perCode.ok) return refused({ code: [CODE_ERRORS.rateLimitExceeded] }, 429);

  const strategyRequest =
    typed === undefined
      ? request
      : new Request(request.url, {
          method: "POST",
          headers: request.headers,
          body: new URLSearchParams({ code: typed }),
        });
  const answer = await runStrategy(db, strategyRequest);
  const proven = verifiedEmail.get(strategyRequest);
  if (!proven) {
    const message = errorFromAnswer(answer) ?? CODE_ERRORS.invalidTotp;
    return refused({ code: [message] }, 400, answer.headers.getSetCookie());
  }
  // Single use: the first to record the code signs in; a replayed copy of the cookie is refused.
  const won = await db.insert(usedSignInCodes).values({ codeHash: key }).onConflictDoNothing().returning();
  if (won.length === 0) return refused({ code: ["That code was used already. Ask for a new one."] }, 400);
  const userId = await signInFromEmail(db, proven);
  return openSession(db, request, userId, { email: proven, method: "code" }, answer.headers.getSetCookie());
}

/** The address a code is waiting for in this browser, for the "check your e-mail" page. */
export const pendingEmail = (request: Request) => readCodeCookie(request).email ?? null;
