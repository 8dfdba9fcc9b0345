// Applies the committed SQL migrations in drizzle/ to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { createDb } from "../app/db/client.server";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set (scripts/pg.sh url prints the local one)");
  process.exit(2);
}
const { db, pool } = createDb(url, { max: 1 });
try {
  await migrate(db, { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
  console.log("migrations applied");
} finally {
  await pool.end();
}
