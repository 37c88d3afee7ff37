// Drizzle tables: the one source of truth for the database. Migrations in drizzle/ are generated
// from this file with `npm run db:generate` and committed.
import { sql } from 'drizzle-orm';
import {
  bigserial,
  boolean,
  customType,
  date,
  doublePrecision,
  index,
  integer,
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
import { detections, quantitations, readModes } from '../../shared/schemas/assays';
import { studyStatuses } from '../../shared/schemas/studies';

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

/**
 * Failed sign-ins counted per account and per address (server/auth/rate-limit-store.ts): kept in
 * the database so that the limits hold across restarts and across app processes.
 */
export const signInLimits = pgTable('sign_in_limits', {
  key: text().primaryKey(),
  hits: integer().notNull(),
  resetAt: timestamp({ withTimezone: true }).notNull(),
});

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

// ---- Records of the science: enzymes, variants, preparations, assays, buffers, studies ----

const updatedAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();
const teamRef = () =>
  uuid()
    .notNull()
    .references(() => teams.id);
const userRef = () =>
  uuid()
    .notNull()
    .references(() => users.id);

export const enzymes = pgTable('enzymes', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  organism: text().notNull().default(''),
  notes: text().notNull().default(''),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const variants = pgTable(
  'variants',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: teamRef(),
    enzymeId: uuid()
      .notNull()
      .references(() => enzymes.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    /** Normalised one-letter notation, e.g. "D92N/S110A"; empty for the parent. */
    mutations: text().notNull().default(''),
    isParent: boolean().notNull().default(false),
    notes: text().notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('variants_enzyme_name_key').on(t.enzymeId, t.name)],
);

export const preparations = pgTable('preparations', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  variantId: uuid()
    .notNull()
    .references(() => variants.id, { onDelete: 'cascade' }),
  lot: text().notNull(),
  proteinMgPerMl: doublePrecision().notNull(),
  preparedOn: date().notNull(),
  storageBuffer: text().notNull().default(''),
  notes: text().notNull().default(''),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const readModeEnum = pgEnum('read_mode', readModes);
export const detectionEnum = pgEnum('detection', detections);
export const quantitationEnum = pgEnum('quantitation', quantitations);

export const assays = pgTable('assays', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  substrate: text().notNull(),
  substrateMm: doublePrecision().notNull(),
  kmMm: doublePrecision(),
  substrateRegime: text().notNull().default('unknown'),
  readMode: readModeEnum().notNull(),
  detection: detectionEnum().notNull(),
  wavelengthNm: integer().notNull(),
  emissionNm: integer(),
  quantitation: quantitationEnum().notNull(),
  extinctionCoefficient: doublePrecision(),
  extinctionUnit: text().notNull().default('M-1cm-1'),
  pathLengthCm: doublePrecision(),
  wellVolumeUl: doublePrecision().notNull(),
  temperatureC: doublePrecision().notNull(),
  stopSolution: text().notNull().default(''),
  chromophorePka: doublePrecision(),
  notes: text().notNull().default(''),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** The buffer library: built-in systems (from shared/chemistry) and lab-added ones (admins). */
export const bufferSystems = pgTable('buffer_systems', {
  id: uuid().primaryKey().defaultRandom(),
  slug: text().notNull().unique(),
  name: text().notNull(),
  builtIn: boolean().notNull().default(false),
  /** The full system as shared/chemistry's buffer-system schema describes it. */
  data: jsonb().notNull(),
  createdBy: uuid().references(() => users.id),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const bufferSeries = pgTable('buffer_series', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  /** What the scientist asked for: pH points, temperature, concentration, ionic strength, choices. */
  input: jsonb().notNull(),
  /** The designed points with their recipes, as the designer returned them when saved. */
  design: jsonb().notNull(),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  version: integer().notNull().default(1),
});

export const studyStatusEnum = pgEnum('study_status', studyStatuses);

export const studies = pgTable('studies', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  enzymeId: uuid()
    .notNull()
    .references(() => enzymes.id),
  referenceVariantId: uuid()
    .notNull()
    .references(() => variants.id),
  assayId: uuid()
    .notNull()
    .references(() => assays.id),
  bufferSeriesId: uuid().references(() => bufferSeries.id),
  ownerId: userRef(),
  status: studyStatusEnum().notNull().default('draft'),
  notes: text().notNull().default(''),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  version: integer().notNull().default(1),
});

export const studyVariants = pgTable(
  'study_variants',
  {
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    variantId: uuid()
      .notNull()
      .references(() => variants.id),
    position: integer().notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.studyId, t.variantId] })],
);

// ---- Plates, plate maps, reader files and reads ----

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

export const plates = pgTable('plates', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  studyId: uuid()
    .notNull()
    .references(() => studies.id, { onDelete: 'cascade' }),
  name: text().notNull(),
  format: integer().notNull(),
  /** The plate map (shared/plate-map schema). */
  map: jsonb().notNull(),
  /** Optimistic concurrency: a save based on an older version gets 409. */
  version: integer().notNull().default(1),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const plateTemplates = pgTable('plate_templates', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  format: integer().notNull(),
  map: jsonb().notNull(),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** An uploaded reader file, kept byte for byte. */
export const readerFiles = pgTable(
  'reader_files',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: teamRef(),
    plateId: uuid()
      .notNull()
      .references(() => plates.id, { onDelete: 'cascade' }),
    fileName: text().notNull(),
    sizeBytes: integer().notNull(),
    sha256: text().notNull(),
    contentType: text().notNull(),
    content: bytea().notNull(),
    uploadedBy: userRef(),
    uploadedAt: createdAt(),
  },
  (t) => [index('reader_files_sha_idx').on(t.teamId, t.sha256)],
);

/** One block of a reader file imported into a plate: an end-point read or a kinetic read. */
export const reads = pgTable('reads', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  plateId: uuid()
    .notNull()
    .references(() => plates.id, { onDelete: 'cascade' }),
  fileId: uuid()
    .notNull()
    .references(() => readerFiles.id, { onDelete: 'cascade' }),
  blockIndex: integer().notNull(),
  kind: readModeEnum().notNull(),
  label: text().notNull(),
  wavelengthNm: integer(),
  sheet: text().notNull(),
  location: text().notNull(),
  /** Kinetic reads: seconds from the first read. */
  timesS: doublePrecision().array(),
  createdAt: createdAt(),
});

export const wellRecords = pgTable(
  'well_records',
  {
    readId: uuid()
      .notNull()
      .references(() => reads.id, { onDelete: 'cascade' }),
    well: varchar({ length: 4 }).notNull(),
    /** End-point value (null = missing, see flag). */
    value: doublePrecision(),
    /** Kinetic values in the order of reads.times_s (nulls = missing points). */
    values: doublePrecision().array().$type<(number | null)[]>(),
    /** Why a value is missing: saturated | empty | invalid. */
    flag: text(),
    pointFlags: jsonb(),
  },
  (t) => [primaryKey({ columns: [t.readId, t.well] })],
);

// ---- Review: comments and decisions on a study ----

export const studyEvents = pgTable(
  'study_events',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: teamRef(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    authorId: userRef(),
    /** comment | submit | withdraw | approve | return | unlock */
    kind: text().notNull(),
    body: text().notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('study_events_study_idx').on(t.studyId, t.createdAt)],
);

// ---- Analysis: settings, exclusions, stored results and fits, background jobs ----

export const analysisSettings = pgTable('analysis_settings', {
  studyId: uuid()
    .primaryKey()
    .references(() => studies.id, { onDelete: 'cascade' }),
  teamId: teamRef(),
  /** shared/analysis AnalysisSettings plus which read and preparation to use (server/services/analysis). */
  settings: jsonb().notNull(),
  version: integer().notNull().default(1),
  updatedBy: userRef(),
  updatedAt: updatedAt(),
});

/** A well left out of the analysis, always with a reason; lifting keeps the row (and its reason). */
export const exclusions = pgTable(
  'exclusions',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: teamRef(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    plateId: uuid()
      .notNull()
      .references(() => plates.id, { onDelete: 'cascade' }),
    well: varchar({ length: 4 }).notNull(),
    reason: text().notNull(),
    createdBy: userRef(),
    createdAt: createdAt(),
    liftedAt: timestamp({ withTimezone: true }),
    liftedBy: uuid().references(() => users.id),
    liftReason: text(),
  },
  (t) => [index('exclusions_study_idx').on(t.studyId)],
);

/** The latest analysis of a study, keyed by the hash of everything that went into it. */
export const analysisRuns = pgTable('analysis_runs', {
  studyId: uuid()
    .primaryKey()
    .references(() => studies.id, { onDelete: 'cascade' }),
  teamId: teamRef(),
  engineVersion: text().notNull(),
  analysisVersion: text().notNull(),
  inputHash: text().notNull(),
  result: jsonb().notNull(),
  computedAt: createdAt(),
  /** Bootstrap intervals, valid for the input hash they were computed from. */
  bootstrap: jsonb(),
  bootstrapHash: text(),
  bootstrapAt: timestamp({ withTimezone: true }),
});

/** One fitted profile per variant and study: what comparisons read. */
export const profileFits = pgTable(
  'profile_fits',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: teamRef(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    variantId: uuid()
      .notNull()
      .references(() => variants.id, { onDelete: 'cascade' }),
    engineVersion: text().notNull(),
    inputHash: text().notNull(),
    model: text(),
    profile: jsonb().notNull(),
    computedAt: createdAt(),
  },
  (t) => [uniqueIndex('profile_fits_study_variant_key').on(t.studyId, t.variantId)],
);

export const analysisJobs = pgTable('analysis_jobs', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  studyId: uuid()
    .notNull()
    .references(() => studies.id, { onDelete: 'cascade' }),
  kind: text().notNull(),
  /** queued | running | done | failed */
  state: text().notNull().default('queued'),
  done: integer().notNull().default(0),
  total: integer().notNull().default(0),
  error: text(),
  inputHash: text(),
  options: jsonb(),
  requestedBy: userRef(),
  createdAt: createdAt(),
  startedAt: timestamp({ withTimezone: true }),
  finishedAt: timestamp({ withTimezone: true }),
});

// ---- Comparisons of variants across studies ----

export const comparisons = pgTable('comparisons', {
  id: uuid().primaryKey().defaultRandom(),
  teamId: teamRef(),
  name: text().notNull(),
  /** [{ studyId, variantId }] in display order. */
  entries: jsonb().notNull(),
  /** `${studyId}:${variantId}` of the reference profile. */
  referenceKey: text().notNull(),
  includeUnapproved: boolean().notNull().default(false),
  /** Optional global fit: { model, shared: ['pKa1'] }. */
  globalFit: jsonb(),
  notes: text().notNull().default(''),
  createdBy: userRef(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  version: integer().notNull().default(1),
});
