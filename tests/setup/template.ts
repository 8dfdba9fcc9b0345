import { migrate } from "drizzle-orm/node-postgres/migrator";
import { fileURLToPath } from "node:url";
import { createDb } from "../../app/db/client.server";
import { installMailQueue } from "../../app/mail/queue.server";
import { seedDemo } from "../../seeds/demo";
import { TEMPLATE_DB, adminUrl, withAdmin } from "./pg-admin";

/**
 * Builds the template database once per run: migrations from drizzle/, pg-boss's schema and the
 * mail queue (once here, so each test's copy has them instead of every file creating them), then
 * the demo seed.
 */
export async function buildTemplate() {
  await withAdmin(async (c) => {
    await c.query(`drop database if exists "${TEMPLATE_DB}" with (force)`);
    await c.query(`create database "${TEMPLATE_DB}"`);
  });
  const { db, pool } = createDb(adminUrl(TEMPLATE_DB), { max: 1 });
  try {
    await migrate(db, { migrationsFolder: fileURLToPath(new URL("../../drizzle", import.meta.url)) });
    await seedDemo(db, new Date("2026-11-30T09:00:00Z"));
  } finally {
    await pool.end();
  }
  await installMailQueue(adminUrl(TEMPLATE_DB));
}
