/**
 * The database schema (Drizzle, PostgreSQL dialect: the same SQL runs on PGlite and on a server).
 * Every business table carries `organisation_id`: data belongs to one organisation, and queries
 * filter on it so another organisation's record is simply not found.
 */
import { sql } from "drizzle-orm";
import {
  bigint,
  boolean,
  customType,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

export const ROLES = ["admin", "adviser", "approver", "foreman"] as const;
export const roleEnum = pgEnum("role", ROLES);
export const gripEnum = pgEnum("grip_quality", ["good", "fair", "poor"]);
export const massSourceEnum = pgEnum("mass_source", ["weighed", "datasheet", "estimated"]);
export const revisionStatusEnum = pgEnum("revision_status", ["draft", "submitted", "approved", "superseded"]);
export const emailStatusEnum = pgEnum("email_status", ["pending", "sent", "failed"]);

const bytea = customType<{ data: Uint8Array; driverData: Uint8Array }>({ dataType: () => "bytea" });

const id = () =>
  uuid("id")
    .primaryKey()
    .default(sql`gen_random_uuid()`);
const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();
const organisationId = () =>
  uuid("organisation_id")
    .notNull()
    .references(() => organisations.id, { onDelete: "cascade" });

export const organisations = pgTable("organisations", {
  id: id(),
  name: text("name").notNull(),
  /** PNG or JPEG printed on the pack's cover; null prints the name only. */
  logo: bytea("logo"),
  logoType: text("logo_type"),
  /** What the submit step suggests as the review date, in months from submission. */
  reviewPeriodMonths: integer("review_period_months").notNull().default(6),
  /** Days before a review date when its author and the administrators are reminded (Heftwise policy default). */
  reviewReminderDays: integer("review_reminder_days")
    .array()
    .notNull()
    .default(sql`'{30,7}'::integer[]`),
  /** Days a review request may wait before its approver is reminded. */
  approvalReminderDays: integer("approval_reminder_days").notNull().default(3),
  /** The roles that must use a second factor (an authenticator app) to sign in. */
  secondFactorRoles: roleEnum("second_factor_roles")
    .array()
    .notNull()
    .default(sql`'{}'::role[]`),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const users = pgTable(
  "users",
  {
    id: id(),
    organisationId: organisationId(),
    /** Stored lower-case; one account per address across Heftwise. */
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: roleEnum("role").notNull(),
    /** Null until the invited user sets a password. */
    passwordHash: text("password_hash"),
    /** Null until the address is proven: an invitation link used, or a sign-up's confirmation link. */
    emailVerifiedAt: timestamp("email_verified_at", { withTimezone: true }),
    /** The authenticator secret, encrypted with the server's secret (lib/auth/second-factor.ts). */
    totpSecret: text("totp_secret"),
    /** Set once a first code has proven the enrolment; null means no second factor. */
    totpEnabledAt: timestamp("totp_enabled_at", { withTimezone: true }),
    /** The time step of the last code accepted: a code is never accepted twice. */
    totpLastStep: bigint("totp_last_step", { mode: "number" }),
    active: boolean("active").notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email), index("users_organisation_idx").on(t.organisationId)],
);

export const invites = pgTable(
  "invites",
  {
    id: id(),
    organisationId: organisationId(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** SHA-256 of the token in the link; the token itself is never stored. */
    tokenHash: text("token_hash").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("invites_token_hash_unique").on(t.tokenHash)],
);

export const jobs = pgTable(
  "jobs",
  {
    id: id(),
    organisationId: organisationId(),
    name: text("name").notNull(),
    client: text("client").notNull(),
    location: text("location").notNull(),
    /** Railway only: engineer's line reference and mileage (e.g. "HWL 12m 34ch"). */
    lineReference: text("line_reference"),
    mileage: text("mileage"),
    accessPoint: text("access_point"),
    nearestHospital: text("nearest_hospital"),
    emergencyArrangements: text("emergency_arrangements"),
    siteContactName: text("site_contact_name"),
    siteContactPhone: text("site_contact_phone"),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("jobs_organisation_idx").on(t.organisationId),
    index("jobs_organisation_name_idx").on(t.organisationId, t.name, t.id),
  ],
);

export const components = pgTable(
  "components",
  {
    id: id(),
    organisationId: organisationId(),
    name: text("name").notNull(),
    massKg: doublePrecision("mass_kg").notNull(),
    lengthMm: integer("length_mm"),
    widthMm: integer("width_mm"),
    heightMm: integer("height_mm"),
    grip: gripEnum("grip").notNull(),
    massSource: massSourceEnum("mass_source").notNull(),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  // One name per organisation, whatever the case: enforced here so that parallel creates cannot race.
  (t) => [
    index("components_organisation_idx").on(t.organisationId),
    uniqueIndex("components_organisation_name_idx").on(t.organisationId, sql`lower(${t.name})`),
    // The register's orders (keyset pagination) and its name search by trigrams.
    index("components_organisation_sort_name_idx").on(t.organisationId, t.name, t.id),
    index("components_organisation_mass_idx").on(t.organisationId, t.massKg, t.id),
    index("components_name_trgm_idx").using("gin", t.name.op("gin_trgm_ops")),
  ],
);

/**
 * Signed-in sessions. The session token carries only this row's id (and the user's): a token whose
 * row is gone — signed out, signed out everywhere, the account deactivated — stops working at once,
 * even if it was copied, and can never be revived.
 */
export const userSessions = pgTable(
  "user_sessions",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    /** How the user signed in: "password" or "password+authenticator" (or "+recovery-code"). */
    method: text("method").notNull().default("password"),
    address: text("address"),
    client: text("client"),
  },
  (t) => [index("user_sessions_user_idx").on(t.userId)],
);

/**
 * Sign-in failures by key ("pair:<email>|<address>", "address:<address>", "account:<email>"), kept
 * in the database so that several app instances on one PostgreSQL server throttle as one.
 */
export const signInAttempts = pgTable("sign_in_attempts", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull(),
  lastFailure: timestamp("last_failure", { withTimezone: true }).notNull(),
});

/**
 * The organisation's library of hazards with suggested controls (by the hierarchy of control), which
 * advisers copy into an assessment and edit there; admins maintain it. One row a hazard name.
 */
export const hazardLibrary = pgTable(
  "hazard_library",
  {
    id: id(),
    organisationId: organisationId(),
    hazard: text("hazard").notNull(),
    whoIsAtRisk: text("who_is_at_risk").notNull(),
    likelihoodBefore: integer("likelihood_before").notNull(),
    severityBefore: integer("severity_before").notNull(),
    /** [{ text, level }] in the content schema's shape. */
    controls: jsonb("controls").notNull(),
    likelihoodAfter: integer("likelihood_after").notNull(),
    severityAfter: integer("severity_after").notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("hazard_library_organisation_hazard_idx").on(t.organisationId, t.hazard)],
);

/** File contents, kept by the storage module (lib/storage.ts); the database is the default store. */
export const storedFiles = pgTable("stored_files", {
  id: id(),
  organisationId: organisationId(),
  contentType: text("content_type").notNull(),
  size: integer("size").notNull(),
  sha256: text("sha256").notNull(),
  data: bytea("data").notNull(),
  createdAt: createdAt(),
});

/** A file attached to a load-register entry: a maker's data sheet, a photograph. */
export const componentAttachments = pgTable(
  "component_attachments",
  {
    id: id(),
    organisationId: organisationId(),
    componentId: uuid("component_id")
      .notNull()
      .references(() => components.id, { onDelete: "cascade" }),
    fileId: uuid("file_id")
      .notNull()
      .references(() => storedFiles.id, { onDelete: "cascade" }),
    filename: text("filename").notNull(),
    contentType: text("content_type").notNull(),
    size: integer("size").notNull(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("component_attachments_component_idx").on(t.componentId)],
);

export const assessments = pgTable(
  "assessments",
  {
    id: id(),
    organisationId: organisationId(),
    jobId: uuid("job_id")
      .notNull()
      .references(() => jobs.id, { onDelete: "restrict" }),
    title: text("title").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  // The list sorted by title, page after page: a walk along this index (keyset pagination).
  (t) => [
    index("assessments_organisation_idx").on(t.organisationId),
    index("assessments_organisation_title_idx").on(t.organisationId, t.title, t.id),
    index("assessments_job_idx").on(t.jobId),
    // "Search titles" (ILIKE '%…%') by trigrams (the pg_trgm extension, migration 0009).
    index("assessments_title_trgm_idx").using("gin", t.title.op("gin_trgm_ops")),
  ],
);

export const revisions = pgTable(
  "revisions",
  {
    id: id(),
    organisationId: organisationId(),
    assessmentId: uuid("assessment_id")
      .notNull()
      .references(() => assessments.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    status: revisionStatusEnum("status").notNull().default("draft"),
    /** The method statement, tasks with their stored result snapshots, hazards, people and plant. */
    content: jsonb("content").notNull().default({}),
    /** Optimistic concurrency: a save names the version it edited; a stale one is refused. */
    version: integer("version").notNull().default(1),
    reviewDate: date("review_date"),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    approverId: uuid("approver_id").references(() => users.id, { onDelete: "set null" }),
    returnComments: jsonb("return_comments"),
    /** Each task's scored result as saved, with the rules version: an approved revision never changes. */
    results: jsonb("results"),
    /** The worst band of the tasks as saved (null while none is scored), for lists and filters. */
    worstBand: text("worst_band"),
    /**
     * The assessment's newest revision (the highest number), kept by the code that creates a
     * revision: lists and counts read "the latest revision of each assessment" from an index
     * instead of grouping every revision.
     */
    isLatest: boolean("is_latest").notNull().default(false),
    /** Set by a foreman's site change note: conditions differ from the assessment. */
    needsReview: boolean("needs_review").notNull().default(false),
    contentHash: text("content_hash"),
    submittedAt: timestamp("submitted_at", { withTimezone: true }),
    approvedAt: timestamp("approved_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("revisions_assessment_number_unique").on(t.assessmentId, t.number),
    index("revisions_organisation_idx").on(t.organisationId),
    // At most one latest revision an assessment; the list's default order (last saved first).
    uniqueIndex("revisions_latest_unique")
      .on(t.assessmentId)
      .where(sql`${t.isLatest}`),
    index("revisions_latest_updated_idx")
      .on(t.organisationId, t.updatedAt, t.id)
      .where(sql`${t.isLatest}`),
    // Counts by status for the overview; an approver's queue.
    index("revisions_organisation_status_idx").on(t.organisationId, t.status),
    index("revisions_approver_status_idx").on(t.approverId, t.status),
  ],
);

export const auditEvents = pgTable(
  "audit_events",
  {
    id: id(),
    organisationId: organisationId(),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    entityType: text("entity_type").notNull(),
    entityId: uuid("entity_id"),
    contentHash: text("content_hash"),
    details: jsonb("details"),
    createdAt: createdAt(),
    /** The event's place in its organisation's chain: 1, 2, 3… with no gaps. */
    seq: bigint("seq", { mode: "number" }).notNull(),
    /** The previous event's `hash` (null for the first): removing or reordering an event breaks the link. */
    prevHash: text("prev_hash"),
    /** SHA-256 over this event's fields and `prevHash` (lib/audit-chain.ts): editing an event breaks it. */
    hash: text("hash"),
  },
  (t) => [
    index("audit_events_entity_idx").on(t.entityType, t.entityId, t.createdAt),
    index("audit_events_organisation_idx").on(t.organisationId, t.createdAt),
    uniqueIndex("audit_events_organisation_seq_idx").on(t.organisationId, t.seq),
  ],
);

/**
 * One-time links sent by e-mail for an account: confirming a sign-up's address, resetting a
 * password. Only the SHA-256 of the token is stored; a link works once, before it expires.
 */
export const accountLinkPurposeEnum = pgEnum("account_link_purpose", ["verify-email", "reset-password"]);
export const accountLinks = pgTable(
  "account_links",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    purpose: accountLinkPurposeEnum("purpose").notNull(),
    tokenHash: text("token_hash").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("account_links_token_hash_unique").on(t.tokenHash), index("account_links_user_idx").on(t.userId)],
);

/** Recovery codes for a second factor: each works once, stored as SHA-256 only. */
export const recoveryCodes = pgTable(
  "recovery_codes",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    codeHash: text("code_hash").notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
  },
  (t) => [index("recovery_codes_user_idx").on(t.userId)],
);

/**
 * API tokens an administrator creates for an integration. The token is shown once; only its SHA-256
 * is kept. It acts for its creator with the permissions of `scope`, never more than the creator's
 * own at the time of each request.
 */
export const apiTokens = pgTable(
  "api_tokens",
  {
    id: id(),
    organisationId: organisationId(),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    /** The first characters of the token, to tell tokens apart in the list. */
    prefix: text("prefix").notNull(),
    tokenHash: text("token_hash").notNull(),
    scope: roleEnum("scope").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("api_tokens_token_hash_unique").on(t.tokenHash),
    index("api_tokens_organisation_idx").on(t.organisationId),
  ],
);

export const outboundEmails = pgTable(
  "outbound_emails",
  {
    id: id(),
    organisationId: uuid("organisation_id").references(() => organisations.id, { onDelete: "cascade" }),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    /** Which kind of e-mail this is ("invite", "approval-request", ...). */
    kind: text("kind").notNull(),
    status: emailStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    messageId: text("message_id"),
    createdAt: createdAt(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (t) => [index("outbound_emails_organisation_idx").on(t.organisationId)],
);

export type Role = (typeof ROLES)[number];
export type User = typeof users.$inferSelect;
export type Job = typeof jobs.$inferSelect;
export type Component = typeof components.$inferSelect;

/** A countersignature: the drawn image, the typed name and role, when, and what was signed. */
export const signatures = pgTable(
  "signatures",
  {
    id: id(),
    organisationId: organisationId(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    signerId: uuid("signer_id").references(() => users.id, { onDelete: "set null" }),
    signerName: text("signer_name").notNull(),
    signerRole: text("signer_role").notNull(),
    /** PNG of the drawn signature. */
    image: bytea("image").notNull(),
    contentHash: text("content_hash").notNull(),
    signedAt: timestamp("signed_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("signatures_revision_idx").on(t.revisionId)],
);

/** Every pack PDF Heftwise issued, by the SHA-256 of its bytes: what /verify compares an upload with. */
export const issuedPacks = pgTable(
  "issued_packs",
  {
    id: id(),
    organisationId: organisationId(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    fileId: uuid("file_id")
      .notNull()
      .references(() => storedFiles.id, { onDelete: "cascade" }),
    sha256: text("sha256").notNull(),
    /** `draft` for the pack attached to an approval request, `approved` for the signed pack. */
    kind: text("kind").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("issued_packs_sha256_idx").on(t.sha256), index("issued_packs_revision_idx").on(t.revisionId)],
);

/** The organisation's document-signing certificate and key (PKCS#12, encrypted), made on first use. */
export const signingKeys = pgTable("signing_keys", {
  organisationId: uuid("organisation_id")
    .primaryKey()
    .references(() => organisations.id, { onDelete: "cascade" }),
  p12: bytea("p12").notNull(),
  certificatePem: text("certificate_pem").notNull(),
  createdAt: createdAt(),
});

/** Foremen assigned to a job: they see its approved revisions and brief from them. */
export const jobAssignments = pgTable(
  "job_assignments",
  {
    organisationId: organisationId(),
    jobId: uuid("job_id")
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("job_assignments_unique").on(t.jobId, t.userId)],
);

/** A briefing of the gang against an approved revision. */
export const briefings = pgTable(
  "briefings",
  {
    id: id(),
    organisationId: organisationId(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    foremanId: uuid("foreman_id").references(() => users.id, { onDelete: "set null" }),
    foremanName: text("foreman_name").notNull(),
    place: text("place").notNull(),
    /** When the foreman started it, by the phone's clock: a briefing taken without signal arrives later. */
    startedAt: timestamp("started_at", { withTimezone: true }).notNull().defaultNow(),
    completedAt: timestamp("completed_at", { withTimezone: true }),
    foremanSignature: bytea("foreman_signature"),
    /** The phone's key for the briefing: sending the start again returns this briefing, never a second one. */
    deviceKey: text("device_key"),
    /** The phone's key for the sign-off, so a repeated sign-off is recognised as the same one. */
    completionKey: text("completion_key"),
    /** When the server received the start (later than started_at when the phone had no signal). */
    receivedAt: createdAt(),
    /** Taken against a revision that had been superseded (the phone was offline): reported to the adviser. */
    againstSuperseded: boolean("against_superseded").notNull().default(false),
  },
  (t) => [index("briefings_revision_idx").on(t.revisionId), uniqueIndex("briefings_device_key_unique").on(t.deviceKey)],
);

/** An operative's sign-on, sent once even when the phone retries: the device's key is unique. */
export const briefingAttendees = pgTable(
  "briefing_attendees",
  {
    id: id(),
    organisationId: organisationId(),
    briefingId: uuid("briefing_id")
      .notNull()
      .references(() => briefings.id, { onDelete: "cascade" }),
    idempotencyKey: text("idempotency_key").notNull(),
    name: text("name").notNull(),
    employer: text("employer").notNull(),
    cardNumber: text("card_number").notNull(),
    signature: bytea("signature").notNull(),
    signedAt: timestamp("signed_at", { withTimezone: true }).notNull(),
    receivedAt: createdAt(),
  },
  (t) => [
    uniqueIndex("briefing_attendees_key_unique").on(t.idempotencyKey),
    index("briefing_attendees_briefing_idx").on(t.briefingId),
  ],
);

/** A foreman's record that site conditions differ from the assessment. */
export const siteChangeNotes = pgTable(
  "site_change_notes",
  {
    id: id(),
    organisationId: organisationId(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    authorName: text("author_name").notNull(),
    text: text("text").notNull(),
    photoFileId: uuid("photo_file_id").references(() => storedFiles.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    /**
     * The adviser's decision on the note: "no-change" (the assessment still holds, with their reason)
     * or "new-revision" (a new revision was started). Null while the revision needs review.
     */
    decision: text("decision"),
    decisionNote: text("decision_note"),
    decidedBy: uuid("decided_by").references(() => users.id, { onDelete: "set null" }),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
  },
  (t) => [index("site_change_notes_revision_idx").on(t.revisionId)],
);

/**
 * Reminders sent, one row per revision, kind and person: the reminder job inserts before it sends,
 * and only a row it inserted is sent, so running the job twice (or twice at once) sends nothing twice.
 */
export const remindersSent = pgTable(
  "reminders_sent",
  {
    id: id(),
    organisationId: organisationId(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    /** "review-due-30", "review-due-7", "review-overdue", "approval-waiting". */
    kind: text("kind").notNull(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("reminders_sent_once_idx").on(t.revisionId, t.kind, t.userId)],
);
