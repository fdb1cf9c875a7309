CREATE TYPE "public"."recording_kind" AS ENUM('match', 'practice', 'drill', 'simulated');--> statement-breakpoint
CREATE TYPE "public"."recording_source" AS ENUM('live', 'upload', 'simulator');--> statement-breakpoint
CREATE TYPE "public"."recording_status" AS ENUM('recording', 'finished');--> statement-breakpoint
CREATE TYPE "public"."recording_signal_type" AS ENUM('number', 'boolean', 'enum');--> statement-breakpoint
CREATE TABLE "recording_chunks" (
	"recording_id" uuid NOT NULL,
	"signal_index" integer NOT NULL,
	"first_seq" integer NOT NULL,
	"t0_ms" double precision NOT NULL,
	"t_last_ms" double precision NOT NULL,
	"dt_ms" double precision NOT NULL,
	"ticks" integer NOT NULL,
	"times_ms" "bytea",
	"values" "bytea" NOT NULL,
	CONSTRAINT "recording_chunks_recording_id_signal_index_first_seq_pk" PRIMARY KEY("recording_id","signal_index","first_seq")
);
--> statement-breakpoint
CREATE TABLE "recording_events" (
	"recording_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"t_ms" double precision NOT NULL,
	"kind" text NOT NULL,
	"data" jsonb,
	CONSTRAINT "recording_events_recording_id_seq_pk" PRIMARY KEY("recording_id","seq")
);
--> statement-breakpoint
CREATE TABLE "recording_signals" (
	"recording_id" uuid NOT NULL,
	"index" integer NOT NULL,
	"name" text NOT NULL,
	"type" "recording_signal_type" NOT NULL,
	"unit" text NOT NULL,
	"labels" jsonb,
	CONSTRAINT "recording_signals_recording_id_index_pk" PRIMARY KEY("recording_id","index")
);
--> statement-breakpoint
CREATE TABLE "recording_stream_seqs" (
	"recording_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	CONSTRAINT "recording_stream_seqs_recording_id_seq_pk" PRIMARY KEY("recording_id","seq")
);
--> statement-breakpoint
CREATE TABLE "recordings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"robot" text NOT NULL,
	"robot_key_id" uuid,
	"stream_id" text NOT NULL,
	"kind" "recording_kind" NOT NULL,
	"source" "recording_source" NOT NULL,
	"status" "recording_status" DEFAULT 'recording' NOT NULL,
	"origin_t_ms" double precision NOT NULL,
	"started_at" timestamp with time zone NOT NULL,
	"ended_at" timestamp with time zone,
	"duration_ms" double precision DEFAULT 0 NOT NULL,
	"event" text,
	"match_type" text,
	"match_number" integer,
	"alliance" text,
	"station" integer,
	"operator_name" text,
	"tags" text[] DEFAULT '{}'::text[] NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "recording_chunks" ADD CONSTRAINT "recording_chunks_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_events" ADD CONSTRAINT "recording_events_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_signals" ADD CONSTRAINT "recording_signals_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recording_stream_seqs" ADD CONSTRAINT "recording_stream_seqs_recording_id_recordings_id_fk" FOREIGN KEY ("recording_id") REFERENCES "public"."recordings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recordings" ADD CONSTRAINT "recordings_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recordings" ADD CONSTRAINT "recordings_robot_key_id_robot_keys_id_fk" FOREIGN KEY ("robot_key_id") REFERENCES "public"."robot_keys"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "recording_signals_name_key" ON "recording_signals" USING btree ("recording_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "recordings_team_stream_key" ON "recordings" USING btree ("team_id","stream_id");--> statement-breakpoint
CREATE INDEX "recordings_team_started_idx" ON "recordings" USING btree ("team_id","started_at");