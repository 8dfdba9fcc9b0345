import { sql } from "drizzle-orm";
import { index, pgTable, text, timestamp, unique, uuid, check, bigint } from "drizzle-orm/pg-core";
import { memberStatusEnum, roleEnum, skillEnum } from "./enums";
import { createdAt, id, updatedAt } from "./helpers";
import { workshops } from "./workshops";

// A user is a person who can sign in; a member is that person's place in one workshop.
// Keeping them apart lets a newcomer sign in before any workshop has them.
export const users = pgTable("users", {
  id: id(),
  name: text("name").notNull(),
  email: text("email"),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const identities = pgTable(
  "identities",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    provider: text("provider").notNull(),
    providerUserId: text("provider_user_id").notNull(),
    login: text("login").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("identities_provider_user").on(t.provider, t.providerUserId),
    index("identities_user_idx").on(t.userId),
  ],
);

export const members = pgTable(
  "members",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    skill: skillEnum("skill").notNull().default("technician"),
    status: memberStatusEnum("status").notNull().default("active"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  // One workshop per person: the unique user id enforces it.
  (t) => [unique("members_user_unique").on(t.userId), index("members_workshop_idx").on(t.workshopId)],
);

export const invitations = pgTable(
  "invitations",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    email: text("email"),
    githubLogin: text("github_login"),
    role: roleEnum("role").notNull(),
    invitedBy: uuid("invited_by").references(() => members.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    check("invitations_target", sql`${t.email} is not null or ${t.githubLogin} is not null`),
    index("invitations_workshop_idx").on(t.workshopId),
  ],
);

// The cookie carries a random token; only its SHA-256 is stored, so a read of this table grants nothing.
export const sessions = pgTable(
  "sessions",
  {
    tokenHash: text("token_hash").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    lastSeenAt: timestamp("last_seen_at", { withTimezone: true }).notNull().defaultNow(),
    userAgent: text("user_agent"),
  },
  (t) => [index("sessions_user_idx").on(t.userId), index("sessions_expiry_idx").on(t.expiresAt)],
);

// Sign-in attempts for rate limiting, kept in the database so every app server sees the same counts.
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    bucket: text("bucket").notNull(), // "ip:127.0.0.1" or "account:github:910001"
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_bucket_at_idx").on(t.bucket, t.at)],
);

// E-mailed sign-in codes that have signed someone in. The code's secret travels in the browser's
// cookie, so only this row makes a code single-use: a copy of the cookie replayed later is refused.
export const usedSignInCodes = pgTable("used_sign_in_codes", {
  codeHash: text("code_hash").primaryKey(), // SHA-256 of the encrypted code the cookie carries
  usedAt: timestamp("used_at", { withTimezone: true }).notNull().defaultNow(),
});

export type User = typeof users.$inferSelect;
export type MemberRow = typeof members.$inferSelect;
export type Session = typeof sessions.$inferSelect;
