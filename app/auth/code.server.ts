import { createHash } from "node:crypto";
import { TOTPStrategy } from "remix-auth-totp";
import type { Db } from "~/db/client.server";
import { env, isSecure } from "~/config/env.server";
import { queueMail } from "~/mail/outbox.server";

export const CODE_PATH = "/sign-in/code";
export const LINK_PATH = "/sign-in/link";
const COOKIE = "_totp"; // the library's cookie name

// The library's messages in our words; the keys let the flow pick a status for each.
export const CODE_ERRORS = {
  requiredEmail: "Enter your e-mail address.",
  invalidEmail: "That e-mail address does not look right.",
  invalidTotp: "That code is not right. Check the e-mail and type it again.",
  expiredTotp: "That code has expired. Ask for a new one below.",
  rateLimitExceeded: "That code has had too many wrong tries and no longer works. Ask for a new one below.",
  missingSessionEmail:
    "No code is waiting in this browser: it was used already, or asked for in another browser. Ask for a new one.",
  missingSessionTotp: "No code is waiting in this browser. Ask for a new one.",
} as const;

// Handed from the flow to the strategy's callbacks for one request: the database to queue mail in,
// and the address the strategy found proven.
const dbFor = new WeakMap<Request, Db>();
export const verifiedEmail = new WeakMap<Request, string>();

let strategy: TOTPStrategy<string> | undefined;

function codeSecret(): string {
  const e = env();
  // Without its own key, one derived from the OAuth client secret: stable across restarts and servers.
  return (
    e.SIGN_IN_CODE_SECRET ??
    createHash("sha256").update(`ramplight sign-in code:${e.GITHUB_CLIENT_SECRET}`).digest("hex")
  );
}

export function codeStrategy() {
  const e = env();
  strategy ??= new TOTPStrategy<string>(
    {
      secret: codeSecret(),
      cookieOptions: {
        path: "/sign-in",
        // Outlives the code, so a late try hears "expired" rather than "no code here".
        maxAge: e.SIGN_IN_CODE_PERIOD_S + 3600,
        ...(isSecure(e) ? { secure: true } : {}),
      },
      // Digits only: typed on a workshop phone with gloves more often than not. The library's own
      // try counter lives in the cookie, which the client controls; ours is in the database.
      totpGeneration: {
        digits: 6,
        charSet: "0123456789",
        period: e.SIGN_IN_CODE_PERIOD_S,
        maxAttempts: 1000,
      },
      magicLinkPath: LINK_PATH,
      customErrors: CODE_ERRORS,
      sendTOTP: async ({ email, code, magicLink, request }) => {
        const db = dbFor.get(request);
        if (!db) throw new Error("sign-in code sent outside the flow");
        // The link is built from the request's origin; behind a proxy the public address is APP_URL.
        const link = new URL(magicLink);
        const pub = new URL(link.pathname + link.search, e.APP_URL).toString();
        await queueMail(db, signInMail(email, code, pub, e.SIGN_IN_CODE_PERIOD_S));
      },
      emailSentRedirect: CODE_PATH,
      successRedirect: "/",
      failureRedirect: CODE_PATH,
    },
    async ({ email, request }) => {
      verifiedEmail.set(request, email);
      return email;
    },
  );
  return strategy;
}

function signInMail(to: string, code: string, link: string, periodS: number) {
  const minutes = Math.round(periodS / 60);
  return {
    workshopId: null,
    kind: "sign-in-code",
    to,
    subject: `Your Ramplight sign-in code: ${code}`,
    text: `Your sign-in code is ${code}\n\nType it on the sign-in page, or open this link in the same browser:\n${link}\n\nThe code works once, for ${minutes} minutes. If you did not ask for it, ignore this e-mail.`,
  };
}

/** Runs the strategy with the database at hand for its callbacks; it always answers by throwing a Response. */
export async function runStrategy(db: Db, request: Request): Promise<Response> {
  dbFor.set(request, db);
  try {
    await codeStrategy().authenticate(request);
  } catch (answer) {
    if (answer instanceof Response) return answer;
    throw answer;
  }
  throw new Error("the code strategy answered without a redirect");
}

/** What the library's cookie holds: the address a code was sent to and the encrypted code. */
export function readCodeCookie(request: Request): { email?: string; jwe?: string } {
  for (const part of (request.headers.get("cookie") ?? "").split(";")) {
    const [k, ...rest] = part.trim().split("=");
    if (k !== COOKIE) continue;
    const params = new URLSearchParams(rest.join("="));
    let jwe: string | undefined;
    try {
      jwe = (JSON.parse(params.get("totp") ?? "null") as { jwe?: string } | null)?.jwe;
    } catch {
      jwe = undefined;
    }
    return { email: params.get("email") ?? undefined, jwe };
  }
  return {};
}

/** The error the library put in its cookie when it answered with the failure redirect. */
export function errorFromAnswer(answer: Response): string | undefined {
  for (const c of answer.headers.getSetCookie()) {
    if (!c.startsWith(`${COOKIE}=`)) continue;
    const value = c.slice(COOKIE.length + 1).split(";")[0];
    return new URLSearchParams(value).get("error") ?? undefined;
  }
  return undefined;
}

export const codeKey = (jwe: string) => createHash("sha256").update(jwe).digest("hex");
