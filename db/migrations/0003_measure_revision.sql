ALTER TABLE "clips" ADD COLUMN "measure_revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "measure_revision" integer DEFAULT 0 NOT NULL;