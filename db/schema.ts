// Fitframe's tables. Every row that belongs to a studio carries studio_id so that every
// query can be scoped to the actor's studio (see lib/server/access).
import { sql } from "drizzle-orm";
import {
  type AnyPgColumn, bigint, boolean, doublePrecision, index, integer, jsonb, pgEnum, pgTable, primaryKey, real,
  text, timestamp, uniqueIndex, uuid,
} from "drizzle-orm/pg-core";

export const roleEnum = pgEnum("role", ["admin", "fitter", "coach", "golfer"]);
export const handednessEnum = pgEnum("handedness", ["right", "left"]);
export const fittingStatusEnum = pgEnum("fitting_status", ["planned", "in_progress", "completed"]);
export const viewEnum = pgEnum("clip_view", ["overhead", "face-on", "down-the-line"]);
export const clipStateEnum = pgEnum("clip_state", ["awaiting_upload", "queued", "processing", "ready", "failed"]);
export const markKindEnum = pgEnum("mark_kind", ["point", "line", "angle", "scale", "plane"]);
export const markRoleEnum = pgEnum("mark_role", [
  "face", "target", "path", "shaft", "sole", "ground", "ball", "clubhead", "marker",
]);
// "derived" is kept for rows stored before marks had a source; new rows say which marks they used.
export const measurementMethodEnum = pgEnum("measurement_method", ["manual", "derived", "suggested", "marked", "tracked", "mixed"]);
export const markSourceEnum = pgEnum("mark_source", ["hand", "tracked"]);

const timestamps = {
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
};

export type StudioSettings = {
  units: "ft" | "m";
  /** How speeds are shown (values stay m/s); absent means m/s. */
  speedUnit?: "m/s" | "ft/s" | "mph";
  frictionMu: number;
  windows: Record<string, { min: number; max: number }>;
  cameraFps: Record<"overhead" | "face-on" | "down-the-line", number>;
};

export const studios = pgTable("studios", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  timeZone: text("time_zone").notNull().default("UTC"),
  settings: jsonb("settings").$type<StudioSettings>().notNull(),
  ...timestamps,
});

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  email: text("email").notNull(),
  name: text("name").notNull(),
  role: roleEnum("role").notNull(),
  passwordHash: text("password_hash"),
  disabled: boolean("disabled").notNull().default(false),
  // Bumped on a role change, a disable or a password change: older sessions stop working at once.
  sessionVersion: integer("session_version").notNull().default(1),
  ...timestamps,
}, (t) => [
  uniqueIndex("users_email_key").on(sql`lower(${t.email})`),
  index("users_studio_role_idx").on(t.studioId, t.role, t.name),
]);

export const apiTokens = pgTable("api_tokens", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  name: text("name").notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("api_tokens_user_idx").on(t.userId, t.createdAt)]);

export const signInFailures = pgTable("sign_in_failures", {
  id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
  email: text("email").notNull(),
  ip: text("ip").notNull(),
  at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("sign_in_failures_lookup_idx").on(t.email, t.ip, t.at)]);

// Accounts made on a public booking page, per client IP: a cap on how fast one network can make them.
export const publicSignups = pgTable("public_signups", {
  id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
  ip: text("ip").notNull(),
  at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("public_signups_ip_at_idx").on(t.ip, t.at)]);

export type GolferIntake = {
  puttingStyle?: string;
  usualMiss?: string;
  ball?: string;
  currentPutter?: { headStyle?: string; lengthIn?: number; lieDeg?: number; loftDeg?: number; grip?: string };
  greenSpeedFt?: number;
  heightCm?: number;
  notes?: string;
};

export const golfers = pgTable("golfers", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  userId: uuid("user_id").unique().references(() => users.id, { onDelete: "set null" }),
  name: text("name").notNull(),
  email: text("email"),
  handedness: handednessEnum("handedness").notNull().default("right"),
  isMinor: boolean("is_minor").notNull().default(false),
  intake: jsonb("intake").$type<GolferIntake>().notNull().default({}),
  videoConsentAt: timestamp("video_consent_at", { withTimezone: true }),
  videoConsentBy: text("video_consent_by"),
  ...timestamps,
}, (t) => [
  index("golfers_studio_name_idx").on(t.studioId, t.name),
  index("golfers_studio_updated_idx").on(t.studioId, t.updatedAt),
]);

export const coachGolfers = pgTable("coach_golfers", {
  coachUserId: uuid("coach_user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  golferId: uuid("golfer_id").notNull().references(() => golfers.id, { onDelete: "cascade" }),
  grantedAt: timestamp("granted_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [primaryKey({ columns: [t.coachUserId, t.golferId] }), index("coach_golfers_golfer_idx").on(t.golferId)]);

export const fittings = pgTable("fittings", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  golferId: uuid("golfer_id").notNull().references(() => golfers.id, { onDelete: "cascade" }),
  fitterUserId: uuid("fitter_user_id").references(() => users.id, { onDelete: "set null" }),
  scheduledAt: timestamp("scheduled_at", { withTimezone: true }).notNull(),
  status: fittingStatusEnum("status").notNull().default("planned"),
  notes: text("notes").notNull().default(""),
  consentConfirmedAt: timestamp("consent_confirmed_at", { withTimezone: true }),
  // The build new putts from the capture computer's watch folder go to (at most one per fitting).
  recordingBuildId: uuid("recording_build_id").references((): AnyPgColumn => builds.id, { onDelete: "set null" }),
  ...timestamps,
}, (t) => [
  index("fittings_studio_scheduled_idx").on(t.studioId, t.scheduledAt),
  index("fittings_golfer_scheduled_idx").on(t.golferId, t.scheduledAt),
]);

export const builds = pgTable("builds", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  fittingId: uuid("fitting_id").notNull().references(() => fittings.id, { onDelete: "cascade" }),
  position: integer("position").notNull(),
  label: text("label").notNull(),
  isBaseline: boolean("is_baseline").notNull().default(false),
  headModel: text("head_model").notNull().default(""),
  neckStyle: text("neck_style").notNull().default(""),
  lengthIn: real("length_in"),
  lieDeg: real("lie_deg"),
  loftDeg: real("loft_deg"),
  offsetIn: real("offset_in"),
  toeHang: text("toe_hang").notNull().default(""),
  headMassG: real("head_mass_g"),
  gripName: text("grip_name").notNull().default(""),
  gripMassG: real("grip_mass_g"),
  // Grip shape for the Equipment Rules' putter-grip checks (largest cross-section, a second grip).
  gripMaxWidthIn: real("grip_max_width_in"),
  gripCount: integer("grip_count").notNull().default(1),
  gripsCircular: boolean("grips_circular"),
  gripGapIn: real("grip_gap_in"),
  // The head's designed shaft lean at normal address along the line of play, + toward the target.
  designShaftLeanDeg: real("design_shaft_lean_deg"),
  shaftMassG: real("shaft_mass_g"),
  balancePointIn: real("balance_point_in"),
  alignmentAid: text("alignment_aid").notNull().default(""),
  notes: text("notes").notNull().default(""),
  ...timestamps,
}, (t) => [index("builds_fitting_position_idx").on(t.fittingId, t.position)]);

export const strokes = pgTable("strokes", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  buildId: uuid("build_id").notNull().references(() => builds.id, { onDelete: "cascade" }),
  position: integer("position").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("strokes_build_position_idx").on(t.buildId, t.position)]);

export const clips = pgTable("clips", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  fittingId: uuid("fitting_id").notNull().references(() => fittings.id, { onDelete: "cascade" }),
  buildId: uuid("build_id").notNull().references(() => builds.id, { onDelete: "cascade" }),
  strokeId: uuid("stroke_id").references(() => strokes.id, { onDelete: "set null" }),
  view: viewEnum("view").notNull(),
  state: clipStateEnum("state").notNull().default("awaiting_upload"),
  failureReason: text("failure_reason"),
  progress: integer("progress").notNull().default(0),
  originalName: text("original_name").notNull(),
  contentType: text("content_type").notNull(),
  sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
  objectKey: text("object_key").notNull(),
  captureFps: real("capture_fps").notNull(),
  slowMotionFactor: real("slow_motion_factor").notNull().default(8),
  mirrored: boolean("mirrored").notNull().default(false),
  width: integer("width"),
  height: integer("height"),
  frameCount: integer("frame_count"),
  durationS: doublePrecision("duration_s"),
  codec: text("codec"),
  rotation: integer("rotation"),
  containerFps: doublePrecision("container_fps"),
  motionSignal: jsonb("motion_signal").$type<number[]>(),
  suggestedImpactFrame: integer("suggested_impact_frame"),
  // The worker's tracking pass: on unless the fitter turns it off; its summary once it has run.
  trackingEnabled: boolean("tracking_enabled").notNull().default(true),
  tracking: jsonb("tracking").$type<Record<string, unknown>>(),
  addressFrame: integer("address_frame"),
  takeawayFrame: integer("takeaway_frame"),
  topFrame: integer("top_frame"),
  impactFrame: integer("impact_frame"),
  finishFrame: integer("finish_frame"),
  // Bumped by every write that changes what the measurements are computed from (marks, moments,
  // clip settings), in the same statement as the change.
  measureRevision: integer("measure_revision").notNull().default(0),
  createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
  // SHA-256 of the file as sent (hex): one file is never uploaded twice into a fitting.
  contentSha256: text("content_sha256"),
  // The store's multipart upload of a large file while it is under way: aborted when the clip is
  // deleted before it arrived, so no orphaned parts stay behind. Cleared once the parts are put together.
  multipartUploadId: text("multipart_upload_id"),
  // A putt the fitter set aside (a mishit): kept and shown, left out of every statistic. Null counts.
  // Set on every clip of its stroke together, since a putt is one stroke from up to three views.
  mishitReason: text("mishit_reason"),
  mishitAt: timestamp("mishit_at", { withTimezone: true }),
  ...timestamps,
}, (t) => [
  index("clips_build_created_idx").on(t.buildId, t.createdAt),
  uniqueIndex("clips_fitting_content_sha256_key").on(t.fittingId, t.contentSha256),
  index("clips_fitting_created_idx").on(t.fittingId, t.createdAt),
  index("clips_studio_state_updated_idx").on(t.studioId, t.state, t.updatedAt),
  uniqueIndex("clips_stroke_view_key").on(t.strokeId, t.view),
]);

// A read-only studio-screen link for one fitting: only the SHA-256 of its token is kept. It works
// until it expires, is revoked (a new link revokes the older ones) or the fitting is completed.
export const studioScreenLinks = pgTable("studio_screen_links", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  fittingId: uuid("fitting_id").notNull().references(() => fittings.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("studio_screen_links_fitting_idx").on(t.fittingId, t.createdAt)]);

export type Point2 = [number, number];

export const marks = pgTable("marks", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  frame: integer("frame").notNull(),
  kind: markKindEnum("kind").notNull(),
  role: markRoleEnum("role").notNull(),
  points: jsonb("points").$type<Point2[]>().notNull(),
  lengthMm: real("length_mm"),
  widthMm: real("width_mm"),
  heightMm: real("height_mm"),
  source: markSourceEnum("source").notNull().default("hand"),
  // One standard deviation of each point, px; null means the stated default for a hand click.
  precisionPx: real("precision_px"),
  authorUserId: uuid("author_user_id").references(() => users.id, { onDelete: "set null" }),
  version: integer("version").notNull().default(1),
  ...timestamps,
}, (t) => [index("marks_clip_frame_idx").on(t.clipId, t.frame)]);

export const measurements = pgTable("measurements", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  key: text("key").notNull(),
  value: doublePrecision("value"),
  // One standard error of the value, same unit (docs/measurements.md, "Uncertainty").
  uncertainty: doublePrecision("uncertainty"),
  unit: text("unit").notNull(),
  frames: jsonb("frames").$type<number[]>().notNull().default([]),
  markIds: jsonb("mark_ids").$type<string[]>().notNull().default([]),
  needs: jsonb("needs").$type<string[]>().notNull().default([]),
  method: measurementMethodEnum("method").notNull().default("derived"),
  computedBy: uuid("computed_by").references(() => users.id, { onDelete: "set null" }),
  computedAt: timestamp("computed_at", { withTimezone: true }).notNull().defaultNow(),
  // The clip's measure revision the value was computed from; an older computation never overwrites a newer one.
  measureRevision: integer("measure_revision").notNull().default(0),
}, (t) => [uniqueIndex("measurements_clip_key").on(t.clipId, t.key)]);

export const comments = pgTable("comments", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  parentId: uuid("parent_id"),
  authorUserId: uuid("author_user_id").references(() => users.id, { onDelete: "set null" }),
  frame: integer("frame").notNull(),
  body: text("body").notNull(),
  resolvedAt: timestamp("resolved_at", { withTimezone: true }),
  ...timestamps,
}, (t) => [index("comments_clip_frame_idx").on(t.clipId, t.frame), index("comments_parent_idx").on(t.parentId)]);

export const specs = pgTable("specs", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  golferId: uuid("golfer_id").notNull().references(() => golfers.id, { onDelete: "cascade" }),
  fittingId: uuid("fitting_id").notNull().references(() => fittings.id, { onDelete: "cascade" }),
  buildId: uuid("build_id").references(() => builds.id, { onDelete: "set null" }),
  supersededAt: timestamp("superseded_at", { withTimezone: true }),
  issuedBy: uuid("issued_by").references(() => users.id, { onDelete: "set null" }),
  issuedAt: timestamp("issued_at", { withTimezone: true }).notNull().defaultNow(),
  // A frozen copy: once issued, a spec is never edited; a new spec supersedes it.
  data: jsonb("data").$type<Record<string, unknown>>().notNull(),
}, (t) => [index("specs_golfer_issued_idx").on(t.golferId, t.issuedAt)]);

// --- Booking and fees ---
// Opening hours and closed days are kept in the studio's local time (studios.time_zone);
// bookings and payments are instants in UTC. The no-double-booking rule is an exclusion
// constraint on (fitter, [starts_at, blocked_until)) added by hand in the booking migration.
export const bookingStatusEnum = pgEnum("booking_status", ["requested", "confirmed", "declined", "cancelled"]);
export const paymentStateEnum = pgEnum("payment_state", ["pending", "paid", "refund_pending", "refunded"]);

export const bookingSettings = pgTable("booking_settings", {
  studioId: uuid("studio_id").primaryKey().references(() => studios.id, { onDelete: "cascade" }),
  // A cancellation at least this long before the start is refunded; a reschedule needs it too.
  cancelNoticeHours: integer("cancel_notice_hours").notNull().default(48),
  currency: text("currency").notNull().default("gbp"),
  ...timestamps,
});

export const fittingTypes = pgTable("fitting_types", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  name: text("name").notNull(),
  durationMin: integer("duration_min").notNull(),
  bufferMin: integer("buffer_min").notNull().default(0),
  feeMinor: integer("fee_minor").notNull(),
  active: boolean("active").notNull().default(true),
  ...timestamps,
}, (t) => [index("fitting_types_studio_idx").on(t.studioId, t.name)]);

export const availabilityRules = pgTable("availability_rules", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  fitterUserId: uuid("fitter_user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  weekday: integer("weekday").notNull(), // ISO: 1 = Monday … 7 = Sunday
  startMinute: integer("start_minute").notNull(), // minutes after local midnight
  endMinute: integer("end_minute").notNull(),
}, (t) => [index("availability_rules_fitter_idx").on(t.fitterUserId, t.weekday)]);

export const closedDays = pgTable("closed_days", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  // null: the whole studio is closed that day.
  fitterUserId: uuid("fitter_user_id").references(() => users.id, { onDelete: "cascade" }),
  day: text("day").notNull(), // local date, yyyy-mm-dd
  reason: text("reason").notNull().default(""),
}, (t) => [index("closed_days_studio_day_idx").on(t.studioId, t.day)]);

export const bookings = pgTable("bookings", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  golferId: uuid("golfer_id").notNull().references(() => golfers.id, { onDelete: "cascade" }),
  fitterUserId: uuid("fitter_user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  fittingTypeId: uuid("fitting_type_id").notNull().references(() => fittingTypes.id, { onDelete: "restrict" }),
  fittingId: uuid("fitting_id").references(() => fittings.id, { onDelete: "set null" }),
  startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
  endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
  // End plus the fitter's buffer: the span no other booking of the fitter may overlap.
  blockedUntil: timestamp("blocked_until", { withTimezone: true }).notNull(),
  status: bookingStatusEnum("status").notNull().default("requested"),
  feeMinor: integer("fee_minor").notNull(),
  currency: text("currency").notNull(),
  creditTowardOrder: boolean("credit_toward_order").notNull().default(true),
  intake: jsonb("intake").$type<GolferIntake>().notNull().default({}),
  reminderSentAt: timestamp("reminder_sent_at", { withTimezone: true }),
  ...timestamps,
}, (t) => [
  index("bookings_studio_starts_idx").on(t.studioId, t.startsAt),
  index("bookings_golfer_starts_idx").on(t.golferId, t.startsAt),
]);

export const payments = pgTable("payments", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  bookingId: uuid("booking_id").notNull().references(() => bookings.id, { onDelete: "cascade" }),
  provider: text("provider").notNull().default("stripe"),
  checkoutSessionId: text("checkout_session_id").notNull().unique(),
  paymentIntentId: text("payment_intent_id").unique(),
  refundId: text("refund_id"),
  amountMinor: integer("amount_minor").notNull(),
  currency: text("currency").notNull(),
  state: paymentStateEnum("state").notNull().default("pending"),
  paidAt: timestamp("paid_at", { withTimezone: true }),
  refundedAt: timestamp("refunded_at", { withTimezone: true }),
  ...timestamps,
}, (t) => [index("payments_booking_idx").on(t.bookingId, t.createdAt)]);

// Every provider event applied once: a replayed event id is ignored.
export const paymentEvents = pgTable("payment_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

// --- Invitations and comments ---
export const invitationRoleEnum = pgEnum("invitation_role", ["golfer", "coach"]);

// A single-use link sent by e-mail; only the SHA-256 of the token is kept.
export const invitations = pgTable("invitations", {
  id: uuid("id").primaryKey().defaultRandom(),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  email: text("email").notNull(),
  name: text("name").notNull(),
  role: invitationRoleEnum("role").notNull(),
  // The golfer an invitation is for (a golfer invitation links the account to this row).
  golferId: uuid("golfer_id").references(() => golfers.id, { onDelete: "cascade" }),
  invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
  userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("invitations_studio_created_idx").on(t.studioId, t.createdAt)]);

// Up to when each person has read a clip's comments (for unread counts).
export const commentReads = pgTable("comment_reads", {
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  readAt: timestamp("read_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [primaryKey({ columns: [t.userId, t.clipId] })]);

// One row per (recipient, comment) still to be e-mailed; the worker batches them per clip.
export const commentMailOutbox = pgTable("comment_mail_outbox", {
  recipientUserId: uuid("recipient_user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  commentId: uuid("comment_id").notNull().references(() => comments.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  studioId: uuid("studio_id").notNull().references(() => studios.id, { onDelete: "cascade" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  sentAt: timestamp("sent_at", { withTimezone: true }),
}, (t) => [primaryKey({ columns: [t.recipientUserId, t.commentId] }), index("comment_mail_outbox_pending_idx").on(t.sentAt, t.recipientUserId, t.clipId)]);

// When each person was last e-mailed about a clip: at most one e-mail per window.
export const commentMailSent = pgTable("comment_mail_sent", {
  recipientUserId: uuid("recipient_user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  clipId: uuid("clip_id").notNull().references(() => clips.id, { onDelete: "cascade" }),
  lastSentAt: timestamp("last_sent_at", { withTimezone: true }).notNull(),
}, (t) => [primaryKey({ columns: [t.recipientUserId, t.clipId] })]);
