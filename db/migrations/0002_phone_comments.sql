CREATE TYPE "public"."invitation_role" AS ENUM('golfer', 'coach');--> statement-breakpoint
CREATE TABLE "comment_mail_outbox" (
	"recipient_user_id" uuid NOT NULL,
	"comment_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"studio_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	CONSTRAINT "comment_mail_outbox_recipient_user_id_comment_id_pk" PRIMARY KEY("recipient_user_id","comment_id")
);
--> statement-breakpoint
CREATE TABLE "comment_mail_sent" (
	"recipient_user_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"last_sent_at" timestamp with time zone NOT NULL,
	CONSTRAINT "comment_mail_sent_recipient_user_id_clip_id_pk" PRIMARY KEY("recipient_user_id","clip_id")
);
--> statement-breakpoint
CREATE TABLE "comment_reads" (
	"user_id" uuid NOT NULL,
	"clip_id" uuid NOT NULL,
	"read_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "comment_reads_user_id_clip_id_pk" PRIMARY KEY("user_id","clip_id")
);
--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" "invitation_role" NOT NULL,
	"golfer_id" uuid,
	"invited_by" uuid,
	"user_id" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "invitations_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "comment_mail_outbox" ADD CONSTRAINT "comment_mail_outbox_recipient_user_id_users_id_fk" FOREIGN KEY ("recipient_user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_mail_outbox" ADD CONSTRAINT "comment_mail_outbox_comment_id_comments_id_fk" FOREIGN KEY ("comment_id") REFERENCES "public"."comments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_mail_outbox" ADD CONSTRAINT "comment_mail_outbox_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_mail_outbox" ADD CONSTRAINT "comment_mail_outbox_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_mail_sent" ADD CONSTRAINT "comment_mail_sent_recipient_user_id_users_id_fk" FOREIGN KEY ("recipient_user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_mail_sent" ADD CONSTRAINT "comment_mail_sent_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_reads" ADD CONSTRAINT "comment_reads_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment_reads" ADD CONSTRAINT "comment_reads_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_golfer_id_golfers_id_fk" FOREIGN KEY ("golfer_id") REFERENCES "public"."golfers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_users_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "comment_mail_outbox_pending_idx" ON "comment_mail_outbox" USING btree ("sent_at","recipient_user_id","clip_id");--> statement-breakpoint
CREATE INDEX "invitations_studio_created_idx" ON "invitations" USING btree ("studio_id","created_at");