CREATE TABLE "fab_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"fab_run_id" uuid NOT NULL,
	"file_name" text NOT NULL,
	"mime_type" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"data" "bytea" NOT NULL,
	"thumbnail" "bytea" NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fab_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"recorded_by" uuid,
	"run_date" date NOT NULL,
	"tool" text NOT NULL,
	"dose" double precision NOT NULL,
	"dose_unit" text NOT NULL,
	"focus" double precision NOT NULL,
	"resist" text NOT NULL,
	"resist_thickness" double precision NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "phase_maps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"design_id" uuid NOT NULL,
	"name" text NOT NULL,
	"format" text NOT NULL,
	"pitch" double precision NOT NULL,
	"phase_scale" double precision NOT NULL,
	"columns" integer NOT NULL,
	"rows" integer NOT NULL,
	"data" "bytea" NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "designs" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "designs" ADD COLUMN "last_revision_number" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "designs" ADD COLUMN "updated_by" uuid;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "process_profile" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_status" text DEFAULT 'queued' NOT NULL;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_progress" real DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_stage" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_error" text;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_attempts" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_started_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "build_finished_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "parameters" jsonb;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "report" jsonb;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "manifest" jsonb;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "bundle" "bytea";--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "bundle_sha256" text;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "bundle_bytes" integer;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "zone_count" integer;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "narrowest_feature" double precision;--> statement-breakpoint
ALTER TABLE "fab_photos" ADD CONSTRAINT "fab_photos_fab_run_id_fab_runs_id_fk" FOREIGN KEY ("fab_run_id") REFERENCES "public"."fab_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fab_photos" ADD CONSTRAINT "fab_photos_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fab_runs" ADD CONSTRAINT "fab_runs_revision_id_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fab_runs" ADD CONSTRAINT "fab_runs_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "phase_maps" ADD CONSTRAINT "phase_maps_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "phase_maps" ADD CONSTRAINT "phase_maps_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "fab_photos_run_idx" ON "fab_photos" USING btree ("fab_run_id");--> statement-breakpoint
CREATE INDEX "fab_runs_revision_idx" ON "fab_runs" USING btree ("revision_id");--> statement-breakpoint
CREATE UNIQUE INDEX "phase_maps_design_name_unique" ON "phase_maps" USING btree ("design_id","name");--> statement-breakpoint
ALTER TABLE "designs" ADD CONSTRAINT "designs_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "revisions_state_idx" ON "revisions" USING btree ("state");