// Applies the committed SQL migrations in drizzle/ to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { createDb } from "../app/db/client.server";
import { databaseUrl } from "./database-url";

const { db, pool } = createDb(databaseUrl(), { max: 1 });
try {
  await migrate(db, { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
  console.log("migrations applied");
} finally {
  await pool.end();
}
