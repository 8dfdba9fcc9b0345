import { afterAll, beforeAll } from "vitest";
import { createDb, type Db } from "../../app/db/client.server";
import { closeServerDb } from "../../app/db/pool.server";
import { cloneTemplate, dropDatabase } from "./pg-admin";
import { TEST_ENV } from "./test-env";

Object.assign(process.env, TEST_ENV);

let current: { db: Db; end: () => Promise<void>; name: string } | undefined;

beforeAll(async () => {
  const name = `rl_t_${process.env.VITEST_POOL_ID ?? "0"}_${Math.random().toString(36).slice(2, 8)}`;
  const url = await cloneTemplate(name);
  process.env.DATABASE_URL = url;
  const { db, pool } = createDb(url, { max: 4 });
  current = { db, end: () => pool.end(), name };
});

afterAll(async () => {
  if (!current) return;
  await current.end();
  // Route modules run through the router reach the database by the process's own pool.
  await closeServerDb();
  await dropDatabase(current.name);
});

/** This test file's own database, a copy of the seeded template. */
export function testDb(): Db {
  if (!current) throw new Error("testDb() is only available inside tests (after beforeAll)");
  return current.db;
}
