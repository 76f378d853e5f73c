ALTER TABLE "clips" ADD COLUMN "content_sha256" text;--> statement-breakpoint
ALTER TABLE "fittings" ADD COLUMN "recording_build_id" uuid;--> statement-breakpoint
ALTER TABLE "fittings" ADD CONSTRAINT "fittings_recording_build_id_builds_id_fk" FOREIGN KEY ("recording_build_id") REFERENCES "public"."builds"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "clips_fitting_content_sha256_key" ON "clips" USING btree ("fitting_id","content_sha256");