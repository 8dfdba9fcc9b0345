import { sql } from "drizzle-orm";
import { boolean, check, char, integer, numeric, pgTable, text } from "drizzle-orm/pg-core";
import { unitSystemEnum } from "./enums";
import { createdAt, id, updatedAt } from "./helpers";

export const workshops = pgTable(
  "workshops",
  {
    id: id(),
    slug: text("slug").notNull().unique(),
    name: text("name").notNull(),
    country: char("country", { length: 2 }).notNull(), // ISO 3166-1 alpha-2
    currency: char("currency", { length: 3 }).notNull(), // ISO 4217
    taxRate: numeric("tax_rate", { precision: 5, scale: 4, mode: "number" }).notNull(),
    units: unitSystemEnum("units").notNull().default("metric"),
    // Whether the advisor types prices with tax in (a retail habit) or before tax (a trade one).
    pricesIncludeTax: boolean("prices_include_tax").notNull().default(false),
    labourRatePerHour: numeric("labour_rate_per_hour", { precision: 10, scale: 2, mode: "number" }).notNull(),
    // Bumped on every knowledge-base change, so caches (Quick find index, resolved models) know when to rebuild.
    kbVersion: integer("kb_version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    check("workshops_tax_rate_range", sql`${t.taxRate} >= 0 and ${t.taxRate} < 1`),
    check("workshops_labour_rate_nonneg", sql`${t.labourRatePerHour} >= 0`),
    check("workshops_country_upper", sql`${t.country} ~ '^[A-Z]{2}$'`),
    check("workshops_currency_upper", sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);

export type Workshop = typeof workshops.$inferSelect;
export type NewWorkshop = typeof workshops.$inferInsert;
