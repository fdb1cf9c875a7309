CREATE TABLE "recording_cycle_summaries" (
	"recording_id" uuid PRIMARY KEY NOT NULL,
	"team_id" uuid NOT NULL,
	"analysis_version" integer NOT NULL,
	"computed_at" timestamp with time zone NOT NULL,
	"cycle_count" integer NOT NULL,
	"total_points" double precision NOT NULL,
	"summary" jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "recording_cycles" (
	"recording_id" uuid NOT NULL,
	"team_id" uuid NOT NULL,
	"index" integer NOT NULL,
	"piece" text NOT NULL,
	"phase" text NOT NULL,
	"crosses_phase" boolean NOT NULL,
	"is_preload" boolean NOT NULL,
	"start_s" double precision NOT NULL,
	"acquired_s" double precision NOT NULL,
	"align_start_s" double precision,
	"place_start_s" double precision,
	"end_s" double precision NOT NULL,
	"duration_s" double precision NOT NULL,
	"acquire_s" double precision NOT NULL,
	"travel_s" double precision,
	"align_s" double precision,
	"place_s" double precision,
	"called_branch" text,
	"called_level" text,
	"called_algae" text,
	"called_at_s" double precision,
	"reached_branch" text,
	"reached_level" text,
	"reached_algae" text,
	"is_on_target" boolean,
	"level" text,
	"face" text,
	"station" text,
	"outcome" text NOT NULL,
	"ended_by" text NOT NULL,
	"points" double precision NOT NULL,
	"call_to_place_s" double precision,
	CONSTRAINT "recording_cycles_recording_id_index_pk" PRIMARY KEY("recording_id","index")
);
--> statement-breakpoint
ALTER TABLE "recording_cycle_summaries" ADD CONSTRAINT "recording_cycle_summaries_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_cycle_summaries" ADD CONSTRAINT "recording_cycle_summaries_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_cycles" ADD CONSTRAINT "recording_cycles_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_cycles" ADD CONSTRAINT "recording_cycles_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recording_cycle_summaries_team_idx" ON "recording_cycle_summaries" USING btree ("team_id");--> statement-breakpoint
CREATE INDEX "recording_cycles_team_idx" ON "recording_cycles" USING btree ("team_id","recording_id");