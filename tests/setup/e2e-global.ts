import { type ChildProcess, spawn } from "node:child_process";
import type { TestProject } from "vitest/node";
import { startAllFakes } from "../fakes/start";
import { cloneTemplate, dropDatabase } from "./pg-admin";
import { E2E_ENV } from "./e2e-env";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    e2eDatabaseUrl: string;
    fakeOAuthUrl: string;
  }
}

async function waitFor(url: string, child: ChildProcess, ms = 30_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`the app server exited early with code ${child.exitCode}`);
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the app server did not answer at ${url} within ${ms} ms`);
}

/** The production build (made by scripts/test.sh) served on loopback against its own database and fakes. */
export default async function setup(project: TestProject) {
  const dbName = "rl_e2e";
  const databaseUrl = await cloneTemplate(dbName);
  const fakes = await startAllFakes({ ...E2E_ENV });
  const server = spawn(process.execPath, ["scripts/serve.mjs"], {
    env: { ...process.env, ...E2E_ENV, DATABASE_URL: databaseUrl, NODE_ENV: "production" },
    stdio: ["ignore", "ignore", "pipe"],
  });
  let stderr = "";
  server.stderr?.on("data", (d) => (stderr += String(d)));
  try {
    await waitFor(`${E2E_ENV.APP_URL}/`, server);
  } catch (error) {
    server.kill();
    await fakes.close();
    throw new Error(`${(error as Error).message}\n${stderr}`);
  }
  project.provide("baseUrl", E2E_ENV.APP_URL);
  project.provide("e2eDatabaseUrl", databaseUrl);
  project.provide("fakeOAuthUrl", E2E_ENV.GITHUB_OAUTH_URL);
  return async () => {
    // Let the server close its pool before its database is dropped under it.
    const exited = new Promise((r) => server.once("exit", r));
    server.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
    await fakes.close();
    await dropDatabase(dbName);
    if (stderr.trim()) console.log(`app server stderr:\n${stderr.slice(-4000)}`);
  };
}
