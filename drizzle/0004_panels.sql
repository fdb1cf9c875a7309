CREATE TABLE "panel_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"panel_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"document" jsonb NOT NULL,
	"author_id" uuid NOT NULL,
	"author_name" text NOT NULL,
	"message" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "panel_versions_panel_number_key" UNIQUE("panel_id","number"),
	CONSTRAINT "panel_versions_panel_id_id_key" UNIQUE("panel_id","id")
);
--> statement-breakpoint
CREATE TABLE "panels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_version_id" uuid,
	"deleted_at" timestamp with time zone,
	CONSTRAINT "panels_team_id_id_key" UNIQUE("team_id","id")
);
--> statement-breakpoint
CREATE TABLE "team_published_panels" (
	"team_id" uuid PRIMARY KEY NOT NULL,
	"panel_id" uuid NOT NULL,
	"published_by" uuid,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "panel_versions" ADD CONSTRAINT "panel_versions_panel_id_panels_id_fk" FOREIGN KEY ("panel_id") REFERENCES "public"."panels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panels" ADD CONSTRAINT "panels_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panels" ADD CONSTRAINT "panels_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panels" ADD CONSTRAINT "panels_published_version_fk" FOREIGN KEY ("id","published_version_id") REFERENCES "public"."panel_versions"("panel_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "team_published_panels" ADD CONSTRAINT "team_published_panels_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "team_published_panels" ADD CONSTRAINT "team_published_panels_published_by_users_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "team_published_panels" ADD CONSTRAINT "team_published_panels_panel_fk" FOREIGN KEY ("team_id","panel_id") REFERENCES "public"."panels"("team_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "panels_team_idx" ON "panels" USING btree ("team_id","created_at") WHERE "panels"."deleted_at" is null;