import { spawn } from "node:child_process";
import { mkdtemp, readFile, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { startAllFakes } from "../../fakes/start";

const ENV = {
  OAUTH_CLIENT_ID: "ramplight-demo",
  OAUTH_CLIENT_SECRET: "demo-secret-1234",
  OAUTH_REDIRECT_URI:
    "http://127.0.0.1:3999/auth/github/callback, http://localhost:3999/auth/github/callback",
  FAKE_OAUTH_PORT: "0",
  FAKE_SMTP_PORT: "0",
  FAKE_PAY_PORT: "0",
};

const dirs: string[] = [];
afterEach(async () => {
  for (const dir of dirs.splice(0)) await rm(dir, { recursive: true, force: true });
});

describe("tests/fakes/start.ts", () => {
  it("starts all three fakes and registers every redirect URI in the comma list", async () => {
    const fakes = await startAllFakes(ENV);
    try {
      expect(fakes.lines).toHaveLength(3);
      const [oauthUrl, , payUrl] = fakes.lines.map((line) => /(\S+:\/\/127\.0\.0\.1:\d+)/.exec(line)![1]!);
      expect(await (await fetch(`${oauthUrl}/__health`)).text()).toBe("ok");
      expect(await (await fetch(`${payUrl}/__health`)).text()).toBe("ok");
      const authorize = new URL("/login/oauth/authorize", oauthUrl);
      authorize.search = new URLSearchParams({
        client_id: "ramplight-demo",
        redirect_uri: "http://localhost:3999/auth/github/callback",
        state: "s",
      }).toString();
      expect((await fetch(authorize)).status).toBe(200);
    } finally {
      await fakes.close();
    }
  });

  it("refuses to start without the OAuth client variables", async () => {
    await expect(startAllFakes({ FAKE_OAUTH_PORT: "0" })).rejects.toThrow(
      /OAUTH_CLIENT_ID, OAUTH_CLIENT_SECRET, OAUTH_REDIRECT_URI/,
    );
    await expect(
      startAllFakes({ ...ENV, PAY_WEBHOOK_URL: "http://127.0.0.1:3999/webhooks" }),
    ).rejects.toThrow(/PAY_WEBHOOK_SECRET/);
    await expect(startAllFakes({ ...ENV, FAKE_SMTP_PORT: "lots" })).rejects.toThrow(
      /FAKE_SMTP_PORT must be a port/,
    );
  });

  it("runs as a CLI: prints one line per service, writes its pid, stops cleanly on SIGTERM", async () => {
    const dir = await mkdtemp(join(tmpdir(), "ramplight-fakes-"));
    dirs.push(dir);
    const pidFile = join(dir, "fakes.pid");
    // `node --import tsx` rather than npx, so the signal reaches the fakes and not a wrapper.
    const child = spawn(process.execPath, ["--import", "tsx", "tests/fakes/start.ts"], {
      cwd: process.cwd(),
      env: { ...process.env, ...ENV, FAKES_PID_FILE: pidFile, FAKE_MAIL_DIR: join(dir, "mail") },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let out = "";
    child.stdout.on("data", (chunk: Buffer) => (out += chunk.toString()));
    child.stderr.on("data", (chunk: Buffer) => (out += chunk.toString()));
    const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
    const deadline = Date.now() + 15_000;
    while (out.split("\n").filter((l) => l.startsWith("fake-")).length < 3 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 50));
    }
    const lines = out.split("\n").filter((l) => l.startsWith("fake-"));
    expect(lines.map((l) => l.split(" ")[0])).toEqual(["fake-oauth", "fake-smtp", "fake-payments"]);
    expect(lines[1]).toMatch(/^fake-smtp +smtp:\/\/127\.0\.0\.1:\d+/);
    expect((await readFile(pidFile, "utf8")).trim()).toBe(String(child.pid));

    child.kill("SIGTERM");
    expect(await exited).toBe(0);
    expect(out).toContain("fakes: SIGTERM, stopping");
    await expect(stat(pidFile)).rejects.toMatchObject({ code: "ENOENT" });
  }, 20_000);
});
