// Which address a sign-in attempt counts against. A forwarded-for header is only believed behind
// our own proxy: OWASP ASVS 5.0 V6.3.1 asks for limits an attacker cannot sidestep by spoofing it.
import { afterEach, describe, expect, it } from "vitest";
import { clientIp } from "~/auth/rate-limit.server";

const req = (headers: Record<string, string> = {}) => new Request("http://127.0.0.1/auth/github", { headers });

describe("clientIp", () => {
  afterEach(() => {
    delete process.env.TRUST_PROXY;
  });

  it("uses the socket's address and ignores a forwarded-for header without a trusted proxy", () => {
    expect(clientIp(req({ "x-forwarded-for": "203.0.113.9" }), "192.0.2.10")).toBe("192.0.2.10");
  });

  it("shares one bucket when no server reports the address", () => {
    expect(clientIp(req(), null)).toBe("direct");
  });

  it("believes the first forwarded-for hop behind a trusted proxy", () => {
    process.env.TRUST_PROXY = "1";
    expect(clientIp(req({ "x-forwarded-for": "203.0.113.9, 10.0.0.2" }), "10.0.0.2")).toBe("203.0.113.9");
    expect(clientIp(req(), "10.0.0.2")).toBe("unknown");
  });
});
