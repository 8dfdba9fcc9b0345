// Which bucket a sign-in attempt counts against. OWASP ASVS 5.0 V6.3.1 asks for limits an attacker
// cannot sidestep: a forwarded-for entry the client wrote itself must not choose the bucket, and an
// IPv6 host must not get a fresh bucket per address of its /64 (RFC 4291 §2.5.4).
import { afterEach, describe, expect, it } from "vitest";
import { addressBucket, clientIp } from "~/auth/rate-limit.server";

const req = (headers: Record<string, string> = {}) =>
  new Request("http://127.0.0.1/auth/github", { headers });

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

  it("behind one proxy, takes the address that proxy appended (the rightmost), not what the client sent", () => {
    process.env.TRUST_PROXY = "1";
    // The client sent "198.51.100.66" itself; the proxy appended the address it saw.
    expect(clientIp(req({ "x-forwarded-for": "198.51.100.66, 203.0.113.9" }), "10.0.0.2")).toBe(
      "203.0.113.9",
    );
    expect(clientIp(req({ "x-forwarded-for": "203.0.113.9" }), "10.0.0.2")).toBe("203.0.113.9");
  });

  it("behind two proxies, counts two from the right; without the header, falls back to the socket", () => {
    process.env.TRUST_PROXY = "2";
    expect(clientIp(req({ "x-forwarded-for": "198.51.100.66, 203.0.113.9, 10.0.0.7" }), "10.0.0.2")).toBe(
      "203.0.113.9",
    );
    expect(clientIp(req(), "10.0.0.2")).toBe("10.0.0.2");
    expect(clientIp(req(), null)).toBe("unknown");
  });
});

describe("addressBucket", () => {
  it("keeps an IPv4 address as it is (RFC 5737 documentation addresses)", () => {
    expect(addressBucket("192.0.2.10")).toBe("192.0.2.10");
  });

  it("counts an IPv4-mapped IPv6 address as the IPv4 address (RFC 4291 §2.5.5.2)", () => {
    expect(addressBucket("::ffff:192.0.2.10")).toBe("192.0.2.10");
    expect(addressBucket("::FFFF:192.0.2.10")).toBe("192.0.2.10");
  });

  it("puts every address of one IPv6 /64 in one bucket, in any spelling (RFC 3849, RFC 5952)", () => {
    const bucket = "2001:db8:0:0::/64";
    expect(addressBucket("2001:db8::1")).toBe(bucket);
    expect(addressBucket("2001:0db8:0000:0000:1234:5678:9abc:def0")).toBe(bucket);
    expect(addressBucket("2001:db8::ffff:1%eth0")).toBe(bucket);
    expect(addressBucket("2001:db8:0:1::1")).toBe("2001:db8:0:1::/64");
    expect(addressBucket("::1")).toBe("0:0:0:0::/64");
    expect(addressBucket("64:ff9b::192.0.2.33")).toBe("64:ff9b:0:0::/64");
  });
});
