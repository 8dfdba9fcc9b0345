import { describe, expect, it } from "vitest";
import { maskLinks } from "~/mail/outbox.server";

describe("the admin's mail page hides links that act for someone", () => {
  it("hides an owner's estimate link and a sign-in token, keeps the rest", () => {
    const token = "0UZFmpyj_nyxnCYJWGTER-Iv4OZXZkcdrMTL3T-7s5s";
    expect(maskLinks(`Open http://127.0.0.1:3000/o/${token} to answer.`)).toBe(
      "Open http://127.0.0.1:3000/o/[hidden] to answer.",
    );
    expect(maskLinks("Sign in: http://x.example/auth/magic?code=123456&x=1")).toBe(
      "Sign in: http://x.example/auth/magic?code=[hidden]&x=1",
    );
    expect(maskLinks("See http://127.0.0.1:3000/sign-in")).toBe("See http://127.0.0.1:3000/sign-in");
  });
});
