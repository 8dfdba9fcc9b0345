import { sql } from "drizzle-orm";
import { check, index, integer, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";
import { drivetrainEnum, fuelTypeEnum } from "./enums";
import { createdAt, id, updatedAt } from "./helpers";
import { workshops } from "./workshops";

export const owners = pgTable(
  "owners",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    email: text("email"),
    phone: text("phone"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("owners_workshop_idx").on(t.workshopId)],
);

export const vehicles = pgTable(
  "vehicles",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    ownerId: uuid("owner_id")
      .notNull()
      .references(() => owners.id, { onDelete: "restrict" }),
    vin: text("vin"), // ISO 3779: 17 characters, no I, O or Q
    registration: text("registration").notNull(),
    make: text("make").notNull(),
    model: text("model").notNull(),
    year: integer("year").notNull(),
    engine: text("engine"),
    fuelType: fuelTypeEnum("fuel_type").notNull(),
    drivetrain: drivetrainEnum("drivetrain").notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("vehicles_workshop_registration").on(t.workshopId, t.registration),
    index("vehicles_owner_idx").on(t.ownerId),
    check("vehicles_vin_format", sql`${t.vin} is null or ${t.vin} ~ '^[A-HJ-NPR-Z0-9]{17}$'`),
    check("vehicles_year_range", sql`${t.year} between 1886 and 2100`),
  ],
);

// Mileage is a history, not a field: every visit records what the odometer said.
export const mileageReadings = pgTable(
  "mileage_readings",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicles.id, { onDelete: "cascade" }),
    km: integer("km").notNull(),
    readAt: timestamp("read_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("mileage_nonneg", sql`${t.km} >= 0`), index("mileage_vehicle_idx").on(t.vehicleId, t.readAt)],
);

export type Owner = typeof owners.$inferSelect;
export type Vehicle = typeof vehicles.$inferSelect;
