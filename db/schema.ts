import { relations } from "drizzle-orm";
import { bigint, boolean, date, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";

// Column names are snake_case in PostgreSQL (set by `casing` in db/client.ts and drizzle.config.ts); the property
// names below are the ones better-auth's drizzle adapter expects for its own tables.
const id = () => text().primaryKey().$defaultFn(() => crypto.randomUUID());
const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();
const updatedAt = () =>
  timestamp({ withTimezone: true })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date());

// ---------------------------------------------------------------------------------------------------------------
// better-auth core tables (email and password), with the admin plugin's ban fields used to deactivate people.
export const user = pgTable("user", {
  id: text().primaryKey(),
  name: text().notNull(),
  email: text().notNull().unique(),
  emailVerified: boolean().notNull().default(false),
  image: text(),
  role: text(),
  banned: boolean().default(false),
  banReason: text(),
  banExpires: timestamp({ withTimezone: true }),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});
export type User = typeof user.$inferSelect;
export type NewUser = typeof user.$inferInsert;

export const session = pgTable(
  "session",
  {
    id: text().primaryKey(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    token: text().notNull().unique(),
    ipAddress: text(),
    userAgent: text(),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    activeOrganizationId: text(),
    impersonatedBy: text(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (table) => [index("session_user_id_idx").on(table.userId)],
);
export type Session = typeof session.$inferSelect;

export const account = pgTable(
  "account",
  {
    id: text().primaryKey(),
    accountId: text().notNull(),
    providerId: text().notNull(),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    accessToken: text(),
    refreshToken: text(),
    idToken: text(),
    accessTokenExpiresAt: timestamp({ withTimezone: true }),
    refreshTokenExpiresAt: timestamp({ withTimezone: true }),
    scope: text(),
    password: text(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (table) => [index("account_user_id_idx").on(table.userId)],
);
export type Account = typeof account.$inferSelect;

export const verification = pgTable(
  "verification",
  {
    id: text().primaryKey(),
    identifier: text().notNull(),
    value: text().notNull(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (table) => [index("verification_identifier_idx").on(table.identifier)],
);

// Rate-limit counters live in PostgreSQL so that every web instance shares them.
export const rateLimit = pgTable("rate_limit", {
  id: text().primaryKey(),
  key: text().notNull().unique(),
  count: bigint({ mode: "number" }).notNull(),
  lastRequest: bigint({ mode: "number" }).notNull(),
});

// ---------------------------------------------------------------------------------------------------------------
// better-auth organization plugin: a clinic is an organization; its people are members with one of Rampline's roles.
export const organization = pgTable("organization", {
  id: text().primaryKey(),
  name: text().notNull(),
  slug: text().notNull().unique(),
  logo: text(),
  metadata: text(),
  createdAt: createdAt(),
});
export type Organization = typeof organization.$inferSelect;

export const member = pgTable(
  "member",
  {
    id: text().primaryKey(),
    organizationId: text()
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: text().notNull(),
    createdAt: createdAt(),
  },
  (table) => [uniqueIndex("member_organization_user_idx").on(table.organizationId, table.userId)],
);
export type Member = typeof member.$inferSelect;

export const invitation = pgTable(
  "invitation",
  {
    id: text().primaryKey(),
    organizationId: text()
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    email: text().notNull(),
    role: text(),
    status: text().notNull().default("pending"),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    inviterId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    // Rampline's additions: the invitee's name (for the e-mail and the accept page) and, for a client or carer
    // invitation, the client record it belongs to.
    inviteeName: text(),
    clientId: text(),
    createdAt: createdAt(),
  },
  (table) => [index("invitation_email_idx").on(table.email)],
);
export type Invitation = typeof invitation.$inferSelect;

// ---------------------------------------------------------------------------------------------------------------
// Rampline's own tables.

// A person receiving stimulation. The record exists from the moment the therapist invites them; `userId` is filled
// in when they accept and set a password.
export const client = pgTable(
  "client",
  {
    id: id(),
    organizationId: text()
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    userId: text().references(() => user.id, { onDelete: "set null" }).unique(),
    fullName: text().notNull(),
    email: text().notNull(),
    // The clinical summary a therapist keeps on the record; empty until they fill it in.
    condition: text(),
    affectedSide: text({ enum: ["left", "right", "both"] }),
    goals: text(),
    onsetDate: date(),
    primaryTherapistId: text()
      .notNull()
      .references(() => user.id),
    createdById: text()
      .notNull()
      .references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (table) => [
    index("client_organization_idx").on(table.organizationId),
    uniqueIndex("client_organization_email_idx").on(table.organizationId, table.email),
  ],
);
export type Client = typeof client.$inferSelect;
export type NewClient = typeof client.$inferInsert;

// A family member or support worker acting for one client, always with the client's consent on record.
export const carerLink = pgTable(
  "carer_link",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    carerUserId: text().references(() => user.id, { onDelete: "set null" }),
    invitationId: text().references(() => invitation.id, { onDelete: "set null" }),
    carerName: text().notNull(),
    carerEmail: text().notNull(),
    relationship: text().notNull(),
    // "client": the client asked for this carer themselves; "recorded-by-therapist": the client told their
    // therapist, who recorded the consent (with how it was given).
    consentSource: text({ enum: ["client", "recorded-by-therapist"] }).notNull(),
    consentMethod: text({ enum: ["in-app", "verbal", "written"] }).notNull(),
    consentNote: text(),
    consentRecordedById: text()
      .notNull()
      .references(() => user.id),
    consentRecordedAt: createdAt(),
    endedAt: timestamp({ withTimezone: true }),
    createdAt: createdAt(),
  },
  (table) => [
    index("carer_link_client_idx").on(table.clientId),
    index("carer_link_carer_idx").on(table.carerUserId),
    uniqueIndex("carer_link_client_email_idx").on(table.clientId, table.carerEmail),
  ],
);
export type CarerLink = typeof carerLink.$inferSelect;
export type NewCarerLink = typeof carerLink.$inferInsert;

// Who did what to which record, with the values before and after, for the clinic's audit trail.
export const auditEvent = pgTable(
  "audit_event",
  {
    id: id(),
    organizationId: text().references(() => organization.id, { onDelete: "cascade" }),
    actorUserId: text().references(() => user.id, { onDelete: "set null" }),
    action: text().notNull(),
    entityType: text().notNull(),
    entityId: text().notNull(),
    clientId: text().references(() => client.id, { onDelete: "set null" }),
    before: jsonb(),
    after: jsonb(),
    createdAt: createdAt(),
  },
  (table) => [
    index("audit_event_organization_idx").on(table.organizationId, table.createdAt),
    index("audit_event_client_idx").on(table.clientId),
  ],
);
export type AuditEvent = typeof auditEvent.$inferSelect;
export type NewAuditEvent = typeof auditEvent.$inferInsert;

// Consent events for one client: each give or withdraw is a new row, so the history stays; the latest row per kind is
// the consent in force.
export const CONSENT_KINDS = ["treatment", "remote-monitoring", "photos-care", "photos-teaching"] as const;
export const consent = pgTable(
  "consent",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    kind: text({ enum: CONSENT_KINDS }).notNull(),
    status: text({ enum: ["given", "withdrawn"] }).notNull(),
    method: text({ enum: ["verbal", "written", "in-app"] }).notNull(),
    note: text(),
    recordedById: text()
      .notNull()
      .references(() => user.id),
    recordedAt: createdAt(),
  },
  (table) => [index("consent_client_idx").on(table.clientId, table.kind, table.recordedAt)],
);
export type Consent = typeof consent.$inferSelect;

// A signed contraindication screening. Versions are immutable: a re-screen is a new row with the next number.
export const screening = pgTable(
  "screening",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    version: integer().notNull(),
    answers: jsonb().notNull(),
    redFlags: jsonb().$type<string[]>().notNull(),
    outcome: text({ enum: ["eligible", "eligible-with-precautions", "not-eligible"] }).notNull(),
    rescreenOn: date(),
    signedById: text()
      .notNull()
      .references(() => user.id),
    signedAt: createdAt(),
  },
  (table) => [uniqueIndex("screening_client_version_idx").on(table.clientId, table.version)],
);
export type Screening = typeof screening.$inferSelect;

// A named clinician's clearance of one systemic red flag on one screening; publishing waits for every flag's clearance.
export const redFlagClearance = pgTable(
  "red_flag_clearance",
  {
    id: id(),
    screeningId: text()
      .notNull()
      .references(() => screening.id, { onDelete: "cascade" }),
    flag: text().notNull(),
    clinicianName: text().notNull(),
    note: text().notNull(),
    recordedById: text()
      .notNull()
      .references(() => user.id),
    recordedAt: createdAt(),
  },
  (table) => [uniqueIndex("red_flag_clearance_flag_idx").on(table.screeningId, table.flag)],
);
export type RedFlagClearance = typeof redFlagClearance.$inferSelect;

// One programme per client: a working draft (with a revision number so two editors cannot overwrite each other) and
// the immutable versions published from it.
export const programme = pgTable("programme", {
  id: id(),
  clientId: text()
    .notNull()
    .unique()
    .references(() => client.id, { onDelete: "cascade" }),
  draft: jsonb(),
  draftRevision: integer().notNull().default(0),
  draftUpdatedById: text().references(() => user.id),
  draftUpdatedAt: timestamp({ withTimezone: true }),
  createdAt: createdAt(),
});
export type Programme = typeof programme.$inferSelect;

export const programmeVersion = pgTable(
  "programme_version",
  {
    id: id(),
    programmeId: text()
      .notNull()
      .references(() => programme.id, { onDelete: "cascade" }),
    number: integer().notNull(),
    content: jsonb().notNull(),
    reason: text().notNull(),
    // What prompted the change, when it came from a report (a check-in or a flag), for the client's timeline.
    promptedByType: text(),
    promptedById: text(),
    authorId: text()
      .notNull()
      .references(() => user.id),
    publishedAt: createdAt(),
  },
  (table) => [uniqueIndex("programme_version_number_idx").on(table.programmeId, table.number)],
);
export type ProgrammeVersion = typeof programmeVersion.$inferSelect;

// A clinic's own starting points for new programmes (Rampline's built-in ones live in code).
export const programmeTemplate = pgTable("programme_template", {
  id: id(),
  organizationId: text()
    .notNull()
    .references(() => organization.id, { onDelete: "cascade" }),
  name: text().notNull(),
  description: text(),
  content: jsonb().notNull(),
  createdById: text()
    .notNull()
    .references(() => user.id),
  createdAt: createdAt(),
});
export type ProgrammeTemplate = typeof programmeTemplate.$inferSelect;

// An uploaded photo, re-encoded without metadata and stored privately; only the client's circle and clinic see it.
export const PHOTO_KINDS = ["placement", "skin", "message"] as const;
export const photo = pgTable(
  "photo",
  {
    id: id(),
    organizationId: text()
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    kind: text({ enum: PHOTO_KINDS }).notNull(),
    uploadedById: text()
      .notNull()
      .references(() => user.id),
    contentType: text().notNull(),
    width: integer().notNull(),
    height: integer().notNull(),
    bytes: integer().notNull(),
    storageKey: text().notNull(),
    thumbnailKey: text().notNull(),
    createdAt: createdAt(),
  },
  (table) => [index("photo_client_idx").on(table.clientId)],
);
export type Photo = typeof photo.$inferSelect;
export type NewPhoto = typeof photo.$inferInsert;

// One logged session, by the client or a carer on their behalf, measured against the programme version in force
// (or the one the client says their device was set to). Per-channel amplitudes and per-electrode skin checks are
// stored with it as JSON: they are always read and written together.
export const SKIN_LEVELS = [1, 2, 3, 4, 5] as const;
export const checkIn = pgTable(
  "check_in",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    programmeVersionId: text().references(() => programmeVersion.id, { onDelete: "set null" }),
    loggedById: text()
      .notNull()
      .references(() => user.id),
    loggedByRole: text({ enum: ["client", "carer"] }).notNull(),
    sessionDate: date().notNull(),
    minutes: integer().notNull(),
    comfort: integer().notNull(),
    movement: text({ enum: ["full", "partial", "none"] }).notNull(),
    fatigue: text({ enum: ["none", "mild", "moderate", "severe"] }).notNull(),
    channels: jsonb().$type<{ channelId: string; amplitudeMa: number }[]>().notNull(),
    skin: jsonb().$type<{ channelId: string; electrode: "A" | "B"; level: number; spreads: boolean; itch: boolean; photoIds: string[] }[]>().notNull(),
    electrodeCondition: text({ enum: ["fine", "edges-lifting", "poor-sticking"] }).notNull().default("fine"),
    notes: text(),
    createdAt: createdAt(),
  },
  (table) => [index("check_in_client_idx").on(table.clientId, table.sessionDate)],
);
export type CheckIn = typeof checkIn.$inferSelect;
export type NewCheckIn = typeof checkIn.$inferInsert;

// Something a therapist should look at, raised by a rule; kept after it is resolved, with the note that resolved it.
export const flag = pgTable(
  "flag",
  {
    id: id(),
    organizationId: text()
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    checkInId: text().references(() => checkIn.id, { onDelete: "set null" }),
    rule: text().notNull(),
    severity: text({ enum: ["review", "urgent"] }).notNull(),
    status: text({ enum: ["open", "acknowledged", "resolved"] }).notNull().default("open"),
    title: text().notNull(),
    detail: jsonb(),
    acknowledgedById: text().references(() => user.id),
    acknowledgedAt: timestamp({ withTimezone: true }),
    resolvedById: text().references(() => user.id),
    resolvedAt: timestamp({ withTimezone: true }),
    resolutionNote: text(),
    createdAt: createdAt(),
  },
  (table) => [
    index("flag_organization_status_idx").on(table.organizationId, table.status, table.createdAt),
    index("flag_client_idx").on(table.clientId),
  ],
);
export type Flag = typeof flag.$inferSelect;
export type NewFlag = typeof flag.$inferInsert;

// A pack of electrodes the client opened; uses are counted from the check-ins logged since.
export const electrodePack = pgTable(
  "electrode_pack",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    openedOn: date().notNull(),
    recordedById: text()
      .notNull()
      .references(() => user.id),
    note: text(),
    createdAt: createdAt(),
  },
  (table) => [index("electrode_pack_client_idx").on(table.clientId, table.openedOn)],
);
export type ElectrodePack = typeof electrodePack.$inferSelect;

// One thread per client: the clinic's staff, the client and their carers. System messages (a published change, a
// confirmation) sit in the same thread so the conversation and the changes read as one story.
export const message = pgTable(
  "message",
  {
    id: id(),
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    authorId: text().references(() => user.id, { onDelete: "set null" }),
    kind: text({ enum: ["message", "system"] }).notNull().default("message"),
    body: text().notNull(),
    photoIds: jsonb().$type<string[]>().notNull().default([]),
    // What the message is about, when it is about something: a check-in, a flag or a programme version.
    aboutType: text({ enum: ["check-in", "flag", "version"] }),
    aboutId: text(),
    createdAt: createdAt(),
  },
  (table) => [index("message_client_idx").on(table.clientId, table.createdAt)],
);
export type Message = typeof message.$inferSelect;
export type NewMessage = typeof message.$inferInsert;

// How far each person has read each thread; unread is everything after it written by someone else.
export const threadRead = pgTable(
  "thread_read",
  {
    clientId: text()
      .notNull()
      .references(() => client.id, { onDelete: "cascade" }),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    lastReadAt: timestamp({ withTimezone: true }).notNull(),
    lastNotifiedAt: timestamp({ withTimezone: true }),
  },
  (table) => [uniqueIndex("thread_read_client_user_idx").on(table.clientId, table.userId)],
);

// Each person's choice of e-mails; no row means the defaults (all on).
export const notificationSetting = pgTable("notification_setting", {
  userId: text()
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  emailMessages: boolean().notNull().default(true),
  emailProgrammeUpdates: boolean().notNull().default(true),
  emailFlags: boolean().notNull().default(true),
  updatedAt: updatedAt(),
});

// The client (or a carer) saying their stimulator now matches a published version.
export const versionConfirmation = pgTable(
  "version_confirmation",
  {
    id: id(),
    programmeVersionId: text()
      .notNull()
      .references(() => programmeVersion.id, { onDelete: "cascade" }),
    confirmedById: text()
      .notNull()
      .references(() => user.id),
    confirmedAt: createdAt(),
  },
  (table) => [uniqueIndex("version_confirmation_idx").on(table.programmeVersionId, table.confirmedById)],
);

// ---------------------------------------------------------------------------------------------------------------
export const userRelations = relations(user, ({ many }) => ({
  sessions: many(session),
  accounts: many(account),
  memberships: many(member),
}));
export const sessionRelations = relations(session, ({ one }) => ({
  user: one(user, { fields: [session.userId], references: [user.id] }),
}));
export const accountRelations = relations(account, ({ one }) => ({
  user: one(user, { fields: [account.userId], references: [user.id] }),
}));
export const organizationRelations = relations(organization, ({ many }) => ({
  members: many(member),
  invitations: many(invitation),
  clients: many(client),
}));
export const memberRelations = relations(member, ({ one }) => ({
  organization: one(organization, { fields: [member.organizationId], references: [organization.id] }),
  user: one(user, { fields: [member.userId], references: [user.id] }),
}));
export const invitationRelations = relations(invitation, ({ one }) => ({
  organization: one(organization, { fields: [invitation.organizationId], references: [organization.id] }),
  inviter: one(user, { fields: [invitation.inviterId], references: [user.id] }),
}));
export const clientRelations = relations(client, ({ one, many }) => ({
  organization: one(organization, { fields: [client.organizationId], references: [organization.id] }),
  user: one(user, { fields: [client.userId], references: [user.id] }),
  primaryTherapist: one(user, { fields: [client.primaryTherapistId], references: [user.id] }),
  carers: many(carerLink),
}));
export const carerLinkRelations = relations(carerLink, ({ one }) => ({
  client: one(client, { fields: [carerLink.clientId], references: [client.id] }),
  carer: one(user, { fields: [carerLink.carerUserId], references: [user.id] }),
}));
