CREATE TABLE "recording_notes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"recording_id" uuid NOT NULL,
	"author_id" uuid,
	"author_name" text NOT NULL,
	"author_role" "team_role" NOT NULL,
	"t_s" double precision NOT NULL,
	"text" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "recording_notes" ADD CONSTRAINT "recording_notes_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_notes" ADD CONSTRAINT "recording_notes_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recording_notes_recording_idx" ON "recording_notes" USING btree ("recording_id","t_s","created_at");