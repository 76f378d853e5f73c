CREATE TYPE "public"."clip_state" AS ENUM('awaiting_upload', 'queued', 'processing', 'ready', 'failed');--> statement-breakpoint
CREATE TYPE "public"."fitting_status" AS ENUM('planned', 'in_progress', 'completed');--> statement-breakpoint
CREATE TYPE "public"."handedness" AS ENUM('right', 'left');--> statement-breakpoint
CREATE TYPE "public"."mark_kind" AS ENUM('point', 'line', 'angle', 'scale', 'plane');--> statement-breakpoint
CREATE TYPE "public"."mark_role" AS ENUM('face', 'target', 'path', 'shaft', 'sole', 'ground', 'ball', 'clubhead', 'marker');--> statement-breakpoint
CREATE TYPE "public"."measurement_method" AS ENUM('manual', 'derived', 'suggested');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('admin', 'fitter', 'coach', 'golfer');--> statement-breakpoint
CREATE TYPE "public"."clip_view" AS ENUM('overhead', 'face-on', 'down-the-line');--> statement-breakpoint
CREATE TABLE "api_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"name" text NOT NULL,
	"token_hash" text NOT NULL,
	"last_used_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "api_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "builds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"fitting_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"label" text NOT NULL,
	"is_baseline" boolean DEFAULT false NOT NULL,
	"head_model" text DEFAULT '' NOT NULL,
	"neck_style" text DEFAULT '' NOT NULL,
	"length_in" real,
	"lie_deg" real,
	"loft_deg" real,
	"offset_in" real,
	"toe_hang" text DEFAULT '' NOT NULL,
	"head_mass_g" real,
	"grip_name" text DEFAULT '' NOT NULL,
	"grip_mass_g" real,
	"shaft_mass_g" real,
	"balance_point_in" real,
	"alignment_aid" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "clips" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"fitting_id" uuid NOT NULL,
	"build_id" uuid NOT NULL,
	"stroke_id" uuid,
	"view" "clip_view" NOT NULL,
	"state" "clip_state" DEFAULT 'awaiting_upload' NOT NULL,
	"failure_reason" text,
	"progress" integer DEFAULT 0 NOT NULL,
	"original_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"object_key" text NOT NULL,
	"capture_fps" real NOT NULL,
	"slow_motion_factor" real DEFAULT 8 NOT NULL,
	"mirrored" boolean DEFAULT false NOT NULL,
	"width" integer,
	"height" integer,
	"frame_count" integer,
	"duration_s" double precision,
	"codec" text,
	"rotation" integer,
	"container_fps" double precision,
	"motion_signal" jsonb,
	"suggested_impact_frame" integer,
	"address_frame" integer,
	"takeaway_frame" integer,
	"top_frame" integer,
	"impact_frame" integer,
	"finish_frame" integer,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "coach_golfers" (
	"coach_user_id" uuid NOT NULL,
	"golfer_id" uuid NOT NULL,
	"granted_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "coach_golfers_coach_user_id_golfer_id_pk" PRIMARY KEY("coach_user_id","golfer_id")
);
--> statement-breakpoint
CREATE TABLE "comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"parent_id" uuid,
	"author_user_id" uuid,
	"frame" integer NOT NULL,
	"body" text NOT NULL,
	"resolved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fittings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"golfer_id" uuid NOT NULL,
	"fitter_user_id" uuid,
	"scheduled_at" timestamp with time zone NOT NULL,
	"status" "fitting_status" DEFAULT 'planned' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"consent_confirmed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "golfers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"user_id" uuid,
	"name" text NOT NULL,
	"email" text,
	"handedness" "handedness" DEFAULT 'right' NOT NULL,
	"is_minor" boolean DEFAULT false NOT NULL,
	"intake" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"video_consent_at" timestamp with time zone,
	"video_consent_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "golfers_user_id_unique" UNIQUE("user_id")
);
--> statement-breakpoint
CREATE TABLE "marks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"frame" integer NOT NULL,
	"kind" "mark_kind" NOT NULL,
	"role" "mark_role" NOT NULL,
	"points" jsonb NOT NULL,
	"length_mm" real,
	"width_mm" real,
	"height_mm" real,
	"author_user_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "measurements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"key" text NOT NULL,
	"value" double precision,
	"unit" text NOT NULL,
	"frames" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"mark_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"needs" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"method" "measurement_method" DEFAULT 'derived' NOT NULL,
	"computed_by" uuid,
	"computed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_failures" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "sign_in_failures_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"email" text NOT NULL,
	"ip" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "specs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"golfer_id" uuid NOT NULL,
	"fitting_id" uuid NOT NULL,
	"build_id" uuid,
	"superseded_at" timestamp with time zone,
	"issued_by" uuid,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	"data" jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "strokes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"build_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "studios" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"slug" text NOT NULL,
	"time_zone" text DEFAULT 'UTC' NOT NULL,
	"settings" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "studios_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" "role" NOT NULL,
	"password_hash" text,
	"disabled" boolean DEFAULT false NOT NULL,
	"session_version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "api_tokens" ADD CONSTRAINT "api_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "builds" ADD CONSTRAINT "builds_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "builds" ADD CONSTRAINT "builds_fitting_id_fittings_id_fk" FOREIGN KEY ("fitting_id") REFERENCES "public"."fittings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_fitting_id_fittings_id_fk" FOREIGN KEY ("fitting_id") REFERENCES "public"."fittings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_build_id_builds_id_fk" FOREIGN KEY ("build_id") REFERENCES "public"."builds"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_stroke_id_strokes_id_fk" FOREIGN KEY ("stroke_id") REFERENCES "public"."strokes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "coach_golfers" ADD CONSTRAINT "coach_golfers_coach_user_id_users_id_fk" FOREIGN KEY ("coach_user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "coach_golfers" ADD CONSTRAINT "coach_golfers_golfer_id_golfers_id_fk" FOREIGN KEY ("golfer_id") REFERENCES "public"."golfers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_author_user_id_users_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fittings" ADD CONSTRAINT "fittings_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fittings" ADD CONSTRAINT "fittings_golfer_id_golfers_id_fk" FOREIGN KEY ("golfer_id") REFERENCES "public"."golfers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fittings" ADD CONSTRAINT "fittings_fitter_user_id_users_id_fk" FOREIGN KEY ("fitter_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "golfers" ADD CONSTRAINT "golfers_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "golfers" ADD CONSTRAINT "golfers_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "marks" ADD CONSTRAINT "marks_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "marks" ADD CONSTRAINT "marks_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "marks" ADD CONSTRAINT "marks_author_user_id_users_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_computed_by_users_id_fk" FOREIGN KEY ("computed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "specs" ADD CONSTRAINT "specs_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "specs" ADD CONSTRAINT "specs_golfer_id_golfers_id_fk" FOREIGN KEY ("golfer_id") REFERENCES "public"."golfers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "specs" ADD CONSTRAINT "specs_fitting_id_fittings_id_fk" FOREIGN KEY ("fitting_id") REFERENCES "public"."fittings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "specs" ADD CONSTRAINT "specs_build_id_builds_id_fk" FOREIGN KEY ("build_id") REFERENCES "public"."builds"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "specs" ADD CONSTRAINT "specs_issued_by_users_id_fk" FOREIGN KEY ("issued_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "strokes" ADD CONSTRAINT "strokes_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "strokes" ADD CONSTRAINT "strokes_build_id_builds_id_fk" FOREIGN KEY ("build_id") REFERENCES "public"."builds"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "api_tokens_user_idx" ON "api_tokens" USING btree ("user_id","created_at");--> statement-breakpoint
CREATE INDEX "builds_fitting_position_idx" ON "builds" USING btree ("fitting_id","position");--> statement-breakpoint
CREATE INDEX "clips_build_created_idx" ON "clips" USING btree ("build_id","created_at");--> statement-breakpoint
CREATE INDEX "clips_fitting_created_idx" ON "clips" USING btree ("fitting_id","created_at");--> statement-breakpoint
CREATE INDEX "clips_studio_state_updated_idx" ON "clips" USING btree ("studio_id","state","updated_at");--> statement-breakpoint
CREATE UNIQUE INDEX "clips_stroke_view_key" ON "clips" USING btree ("stroke_id","view");--> statement-breakpoint
CREATE INDEX "coach_golfers_golfer_idx" ON "coach_golfers" USING btree ("golfer_id");--> statement-breakpoint
CREATE INDEX "comments_clip_frame_idx" ON "comments" USING btree ("clip_id","frame");--> statement-breakpoint
CREATE INDEX "comments_parent_idx" ON "comments" USING btree ("parent_id");--> statement-breakpoint
CREATE INDEX "fittings_studio_scheduled_idx" ON "fittings" USING btree ("studio_id","scheduled_at");--> statement-breakpoint
CREATE INDEX "fittings_golfer_scheduled_idx" ON "fittings" USING btree ("golfer_id","scheduled_at");--> statement-breakpoint
CREATE INDEX "golfers_studio_name_idx" ON "golfers" USING btree ("studio_id","name");--> statement-breakpoint
CREATE INDEX "golfers_studio_updated_idx" ON "golfers" USING btree ("studio_id","updated_at");--> statement-breakpoint
CREATE INDEX "marks_clip_frame_idx" ON "marks" USING btree ("clip_id","frame");--> statement-breakpoint
CREATE UNIQUE INDEX "measurements_clip_key" ON "measurements" USING btree ("clip_id","key");--> statement-breakpoint
CREATE INDEX "sign_in_failures_lookup_idx" ON "sign_in_failures" USING btree ("email","ip","at");--> statement-breakpoint
CREATE INDEX "specs_golfer_issued_idx" ON "specs" USING btree ("golfer_id","issued_at");--> statement-breakpoint
CREATE INDEX "strokes_build_position_idx" ON "strokes" USING btree ("build_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree (lower("email"));--> statement-breakpoint
CREATE INDEX "users_studio_role_idx" ON "users" USING btree ("studio_id","role","name");