CREATE TYPE "public"."drainage" AS ENUM('well', 'moderate', 'poor', 'tiled');--> statement-breakpoint
CREATE TYPE "public"."plan_status" AS ENUM('draft', 'submitted', 'approved', 'changes-requested', 'set-up', 'planted');--> statement-breakpoint
CREATE TYPE "public"."seed_unit_kind" AS ENUM('seeds', 'lb');--> statement-breakpoint
CREATE TYPE "public"."tillage" AS ENUM('conventional', 'minimum', 'no-till');--> statement-breakpoint
CREATE TABLE "crop_plans" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "crop_plans_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"season" integer NOT NULL,
	"field_id" integer NOT NULL,
	"crop" text NOT NULL,
	"seed_lot_id" integer,
	"target_stand" integer NOT NULL,
	"survival_percent" numeric(6, 2) DEFAULT 95 NOT NULL,
	"row_spacing_in" numeric(12, 4) NOT NULL,
	"window_start" date,
	"window_end" date,
	"planter_id" integer,
	"speed_mph" numeric(12, 4) DEFAULT 5 NOT NULL,
	"margin_percent" numeric(6, 2) DEFAULT 5 NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"notes" text,
	"status" "plan_status" DEFAULT 'draft' NOT NULL,
	"setup_id" integer,
	"proposed_by" integer,
	"approved_revision" integer,
	"approved_by" integer,
	"approved_at" timestamp with time zone,
	"planted_on" date,
	"planted_acres" numeric(12, 4),
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fields" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "fields_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"name" text NOT NULL,
	"acres" numeric(12, 4) NOT NULL,
	"soil_texture" text,
	"tillage" "tillage" DEFAULT 'conventional' NOT NULL,
	"drainage" "drainage",
	"notes" text,
	"boundary" jsonb,
	"boundary_acres" numeric(12, 4),
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_comments" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "plan_comments_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"plan_id" integer NOT NULL,
	"user_id" integer,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_events" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "plan_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"plan_id" integer NOT NULL,
	"from_status" "plan_status",
	"to_status" "plan_status" NOT NULL,
	"setup_revision" integer,
	"comment" text,
	"user_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "seed_lots" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "seed_lots_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"crop" text NOT NULL,
	"variety" text NOT NULL,
	"lot_number" text NOT NULL,
	"seeds_per_lb" numeric(12, 4) NOT NULL,
	"germination_percent" numeric(6, 2) NOT NULL,
	"size_grade" text,
	"treatment" text,
	"units_on_hand" numeric(12, 4) DEFAULT 0 NOT NULL,
	"unit_kind" "seed_unit_kind" DEFAULT 'seeds' NOT NULL,
	"unit_size" numeric(14, 2) NOT NULL,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_field_id_fields_id_fk" FOREIGN KEY ("field_id") REFERENCES "public"."fields"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_seed_lot_id_seed_lots_id_fk" FOREIGN KEY ("seed_lot_id") REFERENCES "public"."seed_lots"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_proposed_by_users_id_fk" FOREIGN KEY ("proposed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_approved_by_users_id_fk" FOREIGN KEY ("approved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crop_plans" ADD CONSTRAINT "crop_plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fields" ADD CONSTRAINT "fields_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_comments" ADD CONSTRAINT "plan_comments_plan_id_crop_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."crop_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_comments" ADD CONSTRAINT "plan_comments_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_events" ADD CONSTRAINT "plan_events_plan_id_crop_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."crop_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_events" ADD CONSTRAINT "plan_events_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "seed_lots" ADD CONSTRAINT "seed_lots_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "crop_plans_farm_season_idx" ON "crop_plans" USING btree ("farm_id","season","status");--> statement-breakpoint
CREATE INDEX "crop_plans_field_idx" ON "crop_plans" USING btree ("field_id");--> statement-breakpoint
CREATE INDEX "crop_plans_setup_idx" ON "crop_plans" USING btree ("setup_id");--> statement-breakpoint
CREATE INDEX "crop_plans_planter_idx" ON "crop_plans" USING btree ("planter_id","sort_order");--> statement-breakpoint
CREATE UNIQUE INDEX "fields_farm_name_idx" ON "fields" USING btree ("farm_id","name");--> statement-breakpoint
CREATE INDEX "fields_farm_id_idx" ON "fields" USING btree ("farm_id","id");--> statement-breakpoint
CREATE INDEX "plan_comments_plan_idx" ON "plan_comments" USING btree ("plan_id","created_at");--> statement-breakpoint
CREATE INDEX "plan_events_plan_idx" ON "plan_events" USING btree ("plan_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "seed_lots_farm_lot_idx" ON "seed_lots" USING btree ("farm_id","lot_number");--> statement-breakpoint
CREATE INDEX "seed_lots_farm_crop_idx" ON "seed_lots" USING btree ("farm_id","crop");