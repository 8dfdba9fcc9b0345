import { env } from "~/env.server";
import { createDb, type Db } from "./client.server";

// The server process builds its pool once, on the first request, and hands it to loaders
// through the router context; tests build their own with createDb and pass it in.
let shared: Db | undefined;

export function serverDb(): Db {
  shared ??= createDb(env().DATABASE_URL).db;
  return shared;
}
