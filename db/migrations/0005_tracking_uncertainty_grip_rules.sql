CREATE TYPE "public"."mark_source" AS ENUM('hand', 'tracked');--> statement-breakpoint
ALTER TYPE "public"."measurement_method" ADD VALUE 'marked';--> statement-breakpoint
ALTER TYPE "public"."measurement_method" ADD VALUE 'tracked';--> statement-breakpoint
ALTER TYPE "public"."measurement_method" ADD VALUE 'mixed';--> statement-breakpoint
ALTER TABLE "builds" ADD COLUMN "grip_max_width_in" real;--> statement-breakpoint
ALTER TABLE "builds" ADD COLUMN "grip_count" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "builds" ADD COLUMN "grips_circular" boolean;--> statement-breakpoint
ALTER TABLE "builds" ADD COLUMN "grip_gap_in" real;--> statement-breakpoint
ALTER TABLE "builds" ADD COLUMN "design_shaft_lean_deg" real;--> statement-breakpoint
ALTER TABLE "clips" ADD COLUMN "tracking_enabled" boolean DEFAULT true NOT NULL;--> statement-breakpoint
ALTER TABLE "clips" ADD COLUMN "tracking" jsonb;--> statement-breakpoint
ALTER TABLE "marks" ADD COLUMN "source" "mark_source" DEFAULT 'hand' NOT NULL;--> statement-breakpoint
ALTER TABLE "marks" ADD COLUMN "precision_px" real;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "uncertainty" double precision;