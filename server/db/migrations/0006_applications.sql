CREATE TABLE "application_records" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "application_records_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"season" integer NOT NULL,
	"applied_on" date NOT NULL,
	"applied_time" time,
	"field_id" integer,
	"field_name" text NOT NULL,
	"location" text,
	"crop" text NOT NULL,
	"product_name" text NOT NULL,
	"epa_reg_number" text,
	"restricted_use" boolean DEFAULT false NOT NULL,
	"rate" numeric(12, 4) NOT NULL,
	"rate_unit" text NOT NULL,
	"total_amount" numeric(12, 4),
	"total_unit" text,
	"area_treated_acres" numeric(12, 4) NOT NULL,
	"band_width_in" numeric(12, 4),
	"row_spacing_in" numeric(12, 4),
	"applicator_name" text NOT NULL,
	"certification_number" text,
	"calibration_run_id" integer,
	"weather_notes" text,
	"notes" text,
	"corrects_id" integer,
	"correction_reason" text,
	"recorded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "calibration_runs" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "calibration_runs_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"setup_id" integer NOT NULL,
	"setup_revision_id" integer NOT NULL,
	"revision" integer NOT NULL,
	"product_name" text,
	"rows" integer[] NOT NULL,
	"course_ft" numeric(12, 4) NOT NULL,
	"revolutions" numeric(12, 4),
	"row_spacing_in" numeric(12, 4) NOT NULL,
	"target_lb_per_acre" numeric(12, 4) NOT NULL,
	"points" jsonb NOT NULL,
	"fit" jsonb NOT NULL,
	"r2" numeric(8, 6) NOT NULL,
	"dial_setting" numeric(12, 4),
	"applied_revision" integer,
	"note" text,
	"run_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "application_records" ADD CONSTRAINT "application_records_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "application_records" ADD CONSTRAINT "application_records_field_id_fields_id_fk" FOREIGN KEY ("field_id") REFERENCES "public"."fields"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "application_records" ADD CONSTRAINT "application_records_calibration_run_id_calibration_runs_id_fk" FOREIGN KEY ("calibration_run_id") REFERENCES "public"."calibration_runs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "application_records" ADD CONSTRAINT "application_records_corrects_id_application_records_id_fk" FOREIGN KEY ("corrects_id") REFERENCES "public"."application_records"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "application_records" ADD CONSTRAINT "application_records_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_runs" ADD CONSTRAINT "calibration_runs_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_runs" ADD CONSTRAINT "calibration_runs_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_runs" ADD CONSTRAINT "calibration_runs_setup_revision_id_setup_revisions_id_fk" FOREIGN KEY ("setup_revision_id") REFERENCES "public"."setup_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_runs" ADD CONSTRAINT "calibration_runs_run_by_users_id_fk" FOREIGN KEY ("run_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "application_records_farm_season_idx" ON "application_records" USING btree ("farm_id","season","applied_on");--> statement-breakpoint
CREATE INDEX "application_records_field_idx" ON "application_records" USING btree ("field_id");--> statement-breakpoint
CREATE INDEX "application_records_calibration_idx" ON "application_records" USING btree ("calibration_run_id");--> statement-breakpoint
CREATE UNIQUE INDEX "application_records_corrects_idx" ON "application_records" USING btree ("corrects_id");--> statement-breakpoint
CREATE INDEX "calibration_runs_setup_idx" ON "calibration_runs" USING btree ("setup_id","created_at");--> statement-breakpoint
CREATE INDEX "calibration_runs_farm_idx" ON "calibration_runs" USING btree ("farm_id","created_at");