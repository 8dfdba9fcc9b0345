import { describe, expect, it } from "vitest";
import { readSessionToken, sessionCookie, sessionCookieName } from "~/auth/session.server";

const token = "a".repeat(43); // 32 bytes in base64url is 43 characters (RFC 4648 §5, no padding)

const req = (cookie: string) => new Request("http://x/", { headers: { cookie } });

describe("session cookie", () => {
  it("uses the __Host- prefix only over HTTPS (OWASP ASVS 5.0 V3.3.1–V3.3.4)", () => {
    expect(sessionCookieName(true)).toBe("__Host-rl_session");
    expect(sessionCookieName(false)).toBe("rl_session");
    const secure = sessionCookie(token, true);
    expect(secure).toContain("__Host-rl_session=");
    expect(secure).toContain("Secure");
    expect(secure).toContain("HttpOnly");
    expect(secure).toContain("SameSite=Lax");
    expect(secure).toContain("Path=/");
    expect(secure).not.toMatch(/Domain=/);
    expect(sessionCookie(token, false)).not.toContain("Secure");
  });

  it("clears with Max-Age=0", () => {
    expect(sessionCookie(null, false)).toContain("Max-Age=0");
  });

  it("reads a well-formed token and refuses tampered ones", () => {
    expect(readSessionToken(req(`other=1; rl_session=${token}`), false)).toBe(token);
    expect(readSessionToken(req(`rl_session=${token}x`), false)).toBeNull();
    expect(readSessionToken(req(`rl_session=${token.slice(1)}!`), false)).toBeNull();
    expect(readSessionToken(req(`rl_session=`), false)).toBeNull();
    expect(readSessionToken(req(""), false)).toBeNull();
    // The insecure name is not accepted where the secure one is expected.
    expect(readSessionToken(req(`rl_session=${token}`), true)).toBeNull();
  });
});
