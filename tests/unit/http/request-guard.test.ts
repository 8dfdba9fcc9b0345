// The root middleware's guard on its own: each refusal with its status, and what passes.
import { describe, expect, it } from "vitest";
import { bodyRuleFor } from "~/http/body-rules";
import { guardRequest } from "~/http/request-guard.server";

const APP = "http://127.0.0.1:3000";

async function status(
  url: string,
  init: RequestInit & { headers?: Record<string, string> } = {},
): Promise<number> {
  try {
    await guardRequest(new Request(url, init), APP);
    return 200;
  } catch (refused) {
    if (refused instanceof Response) return refused.status;
    throw refused;
  }
}

const form = (body: string, headers: Record<string, string> = {}) => ({
  method: "POST",
  body,
  headers: { origin: APP, "content-type": "application/x-www-form-urlencoded", ...headers },
});

describe("the request guard", () => {
  it("lets reads through and our own forms and JSON through", async () => {
    expect(await status(`${APP}/board`)).toBe(200);
    expect(await status(`${APP}/settings`, form("name=Works"))).toBe(200);
    expect(
      await status(`${APP}/api/what-if`, {
        method: "POST",
        body: "{}",
        headers: { origin: APP, "content-type": "application/json" },
      }),
    ).toBe(200);
    // A DELETE with no body needs no content type, and may name one (the browser's fetch does).
    expect(
      await status(`${APP}/api/cases/x/findings/y`, { method: "DELETE", headers: { origin: APP } }),
    ).toBe(200);
    expect(
      await status(`${APP}/api/cases/x/findings/y`, {
        method: "DELETE",
        headers: { origin: APP, "content-type": "application/json" },
      }),
    ).toBe(200);
    expect(
      await status(`${APP}/api/cases/x/findings/y`, {
        method: "DELETE",
        headers: { origin: APP, "content-type": "application/json", "content-length": "0" },
      }),
    ).toBe(200);
  });

  it("judges the Origin against APP_URL, not the request's own URL (the //host path forgery)", async () => {
    // The router built this URL from the raw path //127.0.0.1:4403/settings: its origin is the forger's.
    expect(
      await status("http://127.0.0.1:4403/settings", form("name=x", { origin: "http://127.0.0.1:4403" })),
    ).toBe(403);
    expect(await status(`${APP}/settings`, form("name=x", { origin: "http://evil.example" }))).toBe(403);
    expect(
      await status(`${APP}/sign-out`, {
        method: "POST",
        body: "",
        headers: { "content-type": "application/x-www-form-urlencoded" },
      }),
    ).toBe(403);
    // A browser that sends no Origin but says same-origin is one of ours.
    expect(
      await status(`${APP}/settings`, {
        method: "POST",
        body: "a=1",
        headers: { "sec-fetch-site": "same-origin", "content-type": "application/x-www-form-urlencoded" },
      }),
    ).toBe(200);
  });

  it("refuses a declared length over the route's limit before reading, and a chunked body without one", async () => {
    expect(await status(`${APP}/sign-out`, form("", { "content-length": String(300 * 1024 * 1024) }))).toBe(
      413,
    );
    expect(
      await status(`${APP}/api/cases/x/observations`, {
        method: "POST",
        body: "{}",
        headers: {
          origin: APP,
          "content-type": "application/json",
          "content-length": String(5 * 1024 * 1024),
        },
      }),
    ).toBe(413);
    expect(await status(`${APP}/settings`, form("a=1", { "transfer-encoding": "chunked" }))).toBe(411);
    expect(await status(`${APP}/settings`, form("a=1", { "content-length": "-3" }))).toBe(400);
  });

  it("refuses the wrong kind of body with 415 and an unreadable one with 400", async () => {
    expect(
      await status(`${APP}/settings`, {
        method: "POST",
        body: "{}",
        headers: { origin: APP, "content-type": "application/json" },
      }),
    ).toBe(415);
    expect(await status(`${APP}/settings`, { method: "POST", body: "", headers: { origin: APP } })).toBe(415);
    expect(await status(`${APP}/api/what-if`, form("a=1"))).toBe(415);
    expect(
      await status(`${APP}/api/what-if`, {
        method: "POST",
        body: "{not json",
        headers: { origin: APP, "content-type": "application/json" },
      }),
    ).toBe(400);
    expect(
      await status(`${APP}/settings`, {
        method: "POST",
        body: "--x\r\nbroken",
        headers: { origin: APP, "content-type": "multipart/form-data; boundary=zzz" },
      }),
    ).toBe(400);
  });

  it("refuses a NUL character in a form field, a field name, JSON (escaped or deep) and the address", async () => {
    expect(await status(`${APP}/settings`, form("name=a%00b"))).toBe(400);
    expect(await status(`${APP}/settings`, form("na%00me=ab"))).toBe(400);
    const json = (body: string) => ({
      method: "POST",
      body,
      headers: { origin: APP, "content-type": "application/json" },
    });
    expect(await status(`${APP}/api/what-if`, json('{"note":"a\\u0000b"}'))).toBe(400);
    expect(await status(`${APP}/api/what-if`, json('{"a":[{"b":[["x\\u0000"]]}]}'))).toBe(400);
    expect(await status(`${APP}/api/what-if`, json('{"a\\u0000":1}'))).toBe(400);
    expect(await status(`${APP}/cases?q=%00`)).toBe(400);
    expect(await status(`${APP}/cases/%00`)).toBe(400);
  });

  it("has a rule for every kind of address", () => {
    expect(bodyRuleFor("/api/what-if")).toMatchObject({ kind: "json", maxBytes: 1024 * 1024 });
    expect(bodyRuleFor("/api/cases/1/findings")).toMatchObject({ kind: "json", maxBytes: 16 * 1024 });
    expect(bodyRuleFor("/settings")).toMatchObject({ kind: "form", maxBytes: 64 * 1024 });
  });

  it("exempts exactly the payments webhook from the origin check, not from the body rules", async () => {
    const event = (headers: Record<string, string>, body = "{}") => ({
      method: "POST",
      body,
      headers: { "content-type": "application/json; charset=utf-8", ...headers },
    });
    // The payments service sends no Origin of ours (no browser is involved).
    expect(await status(`${APP}/api/payments/webhook`, event({}))).toBe(200);
    expect(await status(`${APP}/api/payments/webhook`, event({ origin: "http://evil.example" }))).toBe(200);
    for (const near of ["/api/payments/webhook/", "/api/payments/webhooks", "/api/payments/webhook.data"])
      expect(await status(`${APP}${near}`, event({})), near).toBe(403);
    expect(
      await status(`${APP}/api/payments/webhook`, event({ "content-length": String(65 * 1024) }, "x")),
    ).toBe(413);
    expect(await status(`${APP}/api/payments/webhook`, event({}, "not json"))).toBe(400);
    expect(bodyRuleFor("/api/payments/webhook")).toEqual({ kind: "json", maxBytes: 64 * 1024 });
  });
});
