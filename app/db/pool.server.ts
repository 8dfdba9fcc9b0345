import type pg from "pg";
import { env } from "~/config/env.server";
import { createDb, type Db } from "./client.server";

// The server process builds its pool once, on the first request, and hands it to loaders
// through the router context; tests build their own with createDb and pass it in.
let shared: { db: Db; pool: pg.Pool } | undefined;

export function serverDb(): Db {
  shared ??= createDb(env().DATABASE_URL);
  return shared.db;
}

/** Closes the process's pool (tests do, before dropping their database); the next request opens a new one. */
export async function closeServerDb(): Promise<void> {
  const closing = shared;
  shared = undefined;
  await closing?.pool.end();
}
