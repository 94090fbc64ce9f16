CREATE TYPE "public"."check_kind" AS ENUM('seed-drop', 'stand-count', 'spacing');--> statement-breakpoint
CREATE TYPE "public"."check_review_status" AS ENUM('awaiting-review', 'accepted', 'correction-needed', 'replant-considered');--> statement-breakpoint
CREATE TABLE "field_checks" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "field_checks_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"kind" "check_kind" NOT NULL,
	"field_id" integer,
	"plan_id" integer,
	"setup_id" integer,
	"setup_revision" integer,
	"rows" integer[] DEFAULT '{}' NOT NULL,
	"checked_on" date NOT NULL,
	"author_id" integer,
	"inputs" jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"csv_upload_id" integer,
	"photo_upload_ids" integer[] DEFAULT '{}' NOT NULL,
	"note" text,
	"review_status" "check_review_status" DEFAULT 'awaiting-review' NOT NULL,
	"review_comment" text,
	"reviewed_by" integer,
	"reviewed_at" timestamp with time zone,
	"slip_applied_percent" numeric(12, 4),
	"slip_applied_planter_id" integer,
	"slip_applied_by" integer,
	"slip_applied_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "uploads_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"storage_key" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"file_name" text,
	"uploaded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_field_id_fields_id_fk" FOREIGN KEY ("field_id") REFERENCES "public"."fields"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_plan_id_crop_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."crop_plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_csv_upload_id_uploads_id_fk" FOREIGN KEY ("csv_upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_reviewed_by_users_id_fk" FOREIGN KEY ("reviewed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_slip_applied_planter_id_planters_id_fk" FOREIGN KEY ("slip_applied_planter_id") REFERENCES "public"."planters"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_checks" ADD CONSTRAINT "field_checks_slip_applied_by_users_id_fk" FOREIGN KEY ("slip_applied_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "field_checks_farm_idx" ON "field_checks" USING btree ("farm_id","checked_on","id");--> statement-breakpoint
CREATE INDEX "field_checks_setup_idx" ON "field_checks" USING btree ("setup_id","setup_revision");--> statement-breakpoint
CREATE INDEX "field_checks_field_idx" ON "field_checks" USING btree ("field_id");--> statement-breakpoint
CREATE INDEX "field_checks_plan_idx" ON "field_checks" USING btree ("plan_id");--> statement-breakpoint
CREATE INDEX "field_checks_farm_review_idx" ON "field_checks" USING btree ("farm_id","review_status");--> statement-breakpoint
CREATE UNIQUE INDEX "uploads_storage_key_idx" ON "uploads" USING btree ("storage_key");--> statement-breakpoint
CREATE INDEX "uploads_farm_idx" ON "uploads" USING btree ("farm_id","created_at");