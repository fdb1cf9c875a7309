CREATE TABLE "drill_result_calls" (
	"result_id" uuid NOT NULL,
	"index" integer NOT NULL,
	"call" jsonb NOT NULL,
	"shown_at_ms" double precision NOT NULL,
	"reaction_ms" double precision,
	"errors" integer NOT NULL,
	"is_miss" boolean NOT NULL,
	"taps" jsonb NOT NULL,
	CONSTRAINT "drill_result_calls_result_id_index_pk" PRIMARY KEY("result_id","index")
);
--> statement-breakpoint
CREATE TABLE "drill_results" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"drill_id" uuid,
	"drill_name" text NOT NULL,
	"operator_id" uuid,
	"operator_name" text NOT NULL,
	"operator_role" "team_role" NOT NULL,
	"mode" text NOT NULL,
	"coach_name" text,
	"is_simulator_driven" boolean NOT NULL,
	"is_complete" boolean NOT NULL,
	"seed" integer,
	"started_at" timestamp with time zone NOT NULL,
	"finished_at" timestamp with time zone DEFAULT now() NOT NULL,
	"call_count" integer NOT NULL,
	"answered_count" integer NOT NULL,
	"miss_count" integer NOT NULL,
	"error_count" integer NOT NULL,
	"clean_count" integer NOT NULL,
	"accuracy" double precision NOT NULL,
	"median_ms" double precision,
	"p90_ms" double precision,
	"mean_ms" double precision,
	"fastest_ms" double precision
);
--> statement-breakpoint
CREATE TABLE "drills" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"plan" jsonb NOT NULL,
	"pace" jsonb NOT NULL,
	"created_by_id" uuid,
	"created_by_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "drill_result_calls" ADD CONSTRAINT "drill_result_calls_result_id_drill_results_id_fk" FOREIGN KEY ("result_id") REFERENCES "public"."drill_results"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drill_results" ADD CONSTRAINT "drill_results_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drill_results" ADD CONSTRAINT "drill_results_drill_id_drills_id_fk" FOREIGN KEY ("drill_id") REFERENCES "public"."drills"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drill_results" ADD CONSTRAINT "drill_results_operator_id_users_id_fk" FOREIGN KEY ("operator_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drills" ADD CONSTRAINT "drills_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drills" ADD CONSTRAINT "drills_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "drill_results_team_time_idx" ON "drill_results" USING btree ("team_id","started_at");--> statement-breakpoint
CREATE INDEX "drill_results_operator_idx" ON "drill_results" USING btree ("team_id","operator_id","started_at");--> statement-breakpoint
CREATE INDEX "drills_team_idx" ON "drills" USING btree ("team_id","name");