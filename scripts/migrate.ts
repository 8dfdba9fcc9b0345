// Applies the committed SQL migrations in drizzle/ to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { createDb } from "../app/db/client.server";
import { installMailQueue } from "../app/mail/queue.server";
import { databaseUrl } from "./database-url";

const { db, pool } = createDb(databaseUrl(), { max: 1 });
try {
  await migrate(db, { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
  // The job queue's own schema, so a request can queue mail before any delivery worker started.
  await installMailQueue(databaseUrl());
  console.log("migrations applied");
} finally {
  await pool.end();
}
