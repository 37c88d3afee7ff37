// Drizzle tables: the one source of truth for the database. Migrations in drizzle/ are generated
// from this file with `npm run db:generate` and committed.
import { sql } from 'drizzle-orm';
import {
  bigserial,
  boolean,
  index,
  json,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { roles } from '../../shared/permissions';

export const roleEnum = pgEnum('role', roles);

const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();

export const users = pgTable(
  'users',
  {
    id: uuid().primaryKey().defaultRandom(),
    email: text().notNull(),
    name: text().notNull(),
    passwordHash: text().notNull(),
    role: roleEnum().notNull(),
    active: boolean().notNull().default(true),
    createdAt: createdAt(),
    lastSignInAt: timestamp({ withTimezone: true }),
  },
  (t) => [uniqueIndex('users_email_key').on(sql`lower(${t.email})`)],
);

export const teams = pgTable('teams', {
  id: uuid().primaryKey().defaultRandom(),
  name: text().notNull().unique(),
  description: text().notNull().default(''),
  createdAt: createdAt(),
});

export const teamMembers = pgTable(
  'team_members',
  {
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    addedAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index('team_members_user_idx').on(t.userId)],
);

export const invitations = pgTable('invitations', {
  id: uuid().primaryKey().defaultRandom(),
  email: text().notNull(),
  role: roleEnum().notNull(),
  teamId: uuid().references(() => teams.id, { onDelete: 'set null' }),
  tokenHash: text().notNull().unique(),
  invitedBy: uuid()
    .notNull()
    .references(() => users.id),
  expiresAt: timestamp({ withTimezone: true }).notNull(),
  acceptedAt: timestamp({ withTimezone: true }),
  createdAt: createdAt(),
});

export const passwordResets = pgTable('password_resets', {
  id: uuid().primaryKey().defaultRandom(),
  userId: uuid()
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  tokenHash: text().notNull().unique(),
  expiresAt: timestamp({ withTimezone: true }).notNull(),
  usedAt: timestamp({ withTimezone: true }),
  createdAt: createdAt(),
});

/** The table connect-pg-simple reads and writes (its own column names). */
export const sessions = pgTable(
  'session',
  {
    sid: varchar().primaryKey(),
    sess: json().notNull(),
    expire: timestamp({ precision: 6 }).notNull(),
  },
  (t) => [index('session_expire_idx').on(t.expire)],
);

export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    at: createdAt(),
    actorId: uuid().references(() => users.id),
    teamId: uuid(),
    entity: text().notNull(),
    entityId: text(),
    action: text().notNull(),
    before: jsonb(),
    after: jsonb(),
  },
  (t) => [index('audit_log_at_idx').on(t.at), index('audit_log_entity_idx').on(t.entity, t.entityId)],
);

export const mailMessages = pgTable('mail_messages', {
  id: uuid().primaryKey().defaultRandom(),
  receivedAt: createdAt(),
  sender: text().notNull().default(''),
  recipients: text().array().notNull(),
  subject: text().notNull().default(''),
  text: text().notNull().default(''),
  html: text(),
  raw: text().notNull(),
});
