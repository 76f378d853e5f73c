CREATE TABLE "studio_screen_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"fitting_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "studio_screen_links_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "clips" ADD COLUMN "multipart_upload_id" text;--> statement-breakpoint
ALTER TABLE "clips" ADD COLUMN "mishit_reason" text;--> statement-breakpoint
ALTER TABLE "clips" ADD COLUMN "mishit_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "studio_screen_links" ADD CONSTRAINT "studio_screen_links_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studio_screen_links" ADD CONSTRAINT "studio_screen_links_fitting_id_fittings_id_fk" FOREIGN KEY ("fitting_id") REFERENCES "public"."fittings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studio_screen_links" ADD CONSTRAINT "studio_screen_links_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "studio_screen_links_fitting_idx" ON "studio_screen_links" USING btree ("fitting_id","created_at");