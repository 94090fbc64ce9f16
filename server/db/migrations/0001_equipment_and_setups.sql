CREATE TYPE "public"."covering" AS ENUM('none', 'knife', 'disc');--> statement-breakpoint
CREATE TYPE "public"."frame_kind" AS ENUM('pull-type', 'mounted', 'folding', 'toolbar');--> statement-breakpoint
CREATE TYPE "public"."granular" AS ENUM('none', 'insecticide', 'herbicide', 'both');--> statement-breakpoint
CREATE TYPE "public"."opener" AS ENUM('runner', 'double-disc');--> statement-breakpoint
CREATE TYPE "public"."press_wheel" AS ENUM('open-center', 'flat-tread', 'center-rib', 'dual-rib', 'semi-pneumatic');--> statement-breakpoint
CREATE TABLE "drive_sections" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "drive_sections_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"planter_id" integer NOT NULL,
	"name" text NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"rows" integer[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "drive_stages" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "drive_stages_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"section_id" integer NOT NULL,
	"position" integer NOT NULL,
	"chain_pitch" text DEFAULT '#40' NOT NULL,
	"driver_teeth" integer NOT NULL,
	"driven_teeth" integer NOT NULL,
	"driver_options" integer[] NOT NULL,
	"driven_options" integer[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "planters" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "planters_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"name" text NOT NULL,
	"frame_kind" "frame_kind" NOT NULL,
	"row_count" integer NOT NULL,
	"row_spacing_in" numeric(12, 4) NOT NULL,
	"transport_width_ft" numeric(12, 4),
	"tire_description" text,
	"wheel_circumference_in" numeric(12, 4) NOT NULL,
	"circumference_revolutions" numeric(12, 4),
	"circumference_distance_ft" numeric(12, 4),
	"slip_percent" numeric(12, 4) DEFAULT 0 NOT NULL,
	"meter_ratio" numeric(12, 4) DEFAULT 1 NOT NULL,
	"seed_hopper_lb" numeric(12, 4),
	"granular_hopper_lb" numeric(12, 4),
	"notes" text,
	"config_version" integer DEFAULT 1 NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "row_units" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "row_units_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"planter_id" integer NOT NULL,
	"position" integer NOT NULL,
	"opener" "opener" DEFAULT 'double-disc' NOT NULL,
	"gauge_wheels" text,
	"depth_in" numeric(12, 4) DEFAULT 1.75 NOT NULL,
	"depth_band" text,
	"down_pressure_lb" numeric(12, 4),
	"press_wheel" "press_wheel" DEFAULT 'open-center' NOT NULL,
	"press_wheel_width_in" numeric(12, 4),
	"covering" "covering" DEFAULT 'none' NOT NULL,
	"furrower" boolean DEFAULT false NOT NULL,
	"seed_plate_id" integer,
	"granular" "granular" DEFAULT 'none' NOT NULL,
	"granular_band_width_in" numeric(12, 4),
	"granular_dial_setting" numeric(12, 4),
	"fertilizer_setting" text,
	"planting" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "seed_plates" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "seed_plates_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"code" text NOT NULL,
	"crops" text[] NOT NULL,
	"cells_per_plate" integer NOT NULL,
	"cell_description" text,
	"seeds_per_lb_min" integer,
	"seeds_per_lb_max" integer,
	"quantity_on_hand" integer DEFAULT 0 NOT NULL,
	"wear_notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sprockets" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "sprockets_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"teeth" integer NOT NULL,
	"chain_pitch" text DEFAULT '#40' NOT NULL,
	"quantity_on_hand" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "setup_comments" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "setup_comments_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"setup_id" integer NOT NULL,
	"revision" integer,
	"user_id" integer,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "setup_revisions" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "setup_revisions_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"setup_id" integer NOT NULL,
	"revision" integer NOT NULL,
	"config" jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"note" text,
	"saved_by" integer,
	"saved_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "setups" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "setups_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"planter_id" integer NOT NULL,
	"name" text NOT NULL,
	"crop" text NOT NULL,
	"latest_revision" integer DEFAULT 1 NOT NULL,
	"created_by" integer,
	"installed_revision" integer,
	"installed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "drive_sections" ADD CONSTRAINT "drive_sections_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drive_stages" ADD CONSTRAINT "drive_stages_section_id_drive_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."drive_sections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "planters" ADD CONSTRAINT "planters_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "row_units" ADD CONSTRAINT "row_units_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "row_units" ADD CONSTRAINT "row_units_seed_plate_id_seed_plates_id_fk" FOREIGN KEY ("seed_plate_id") REFERENCES "public"."seed_plates"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "seed_plates" ADD CONSTRAINT "seed_plates_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sprockets" ADD CONSTRAINT "sprockets_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_comments" ADD CONSTRAINT "setup_comments_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_comments" ADD CONSTRAINT "setup_comments_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_revisions" ADD CONSTRAINT "setup_revisions_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_revisions" ADD CONSTRAINT "setup_revisions_saved_by_users_id_fk" FOREIGN KEY ("saved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setups" ADD CONSTRAINT "setups_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setups" ADD CONSTRAINT "setups_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setups" ADD CONSTRAINT "setups_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "drive_sections_planter_idx" ON "drive_sections" USING btree ("planter_id","sort_order");--> statement-breakpoint
CREATE UNIQUE INDEX "drive_stages_section_pos_idx" ON "drive_stages" USING btree ("section_id","position");--> statement-breakpoint
CREATE INDEX "planters_farm_idx" ON "planters" USING btree ("farm_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "row_units_planter_pos_idx" ON "row_units" USING btree ("planter_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "seed_plates_farm_code_idx" ON "seed_plates" USING btree ("farm_id","code");--> statement-breakpoint
CREATE UNIQUE INDEX "sprockets_farm_teeth_pitch_idx" ON "sprockets" USING btree ("farm_id","teeth","chain_pitch");--> statement-breakpoint
CREATE INDEX "setup_comments_setup_idx" ON "setup_comments" USING btree ("setup_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "setup_revisions_setup_rev_idx" ON "setup_revisions" USING btree ("setup_id","revision");--> statement-breakpoint
CREATE INDEX "setups_farm_id_idx" ON "setups" USING btree ("farm_id","id");--> statement-breakpoint
CREATE INDEX "setups_farm_updated_idx" ON "setups" USING btree ("farm_id","updated_at");--> statement-breakpoint
CREATE INDEX "setups_planter_idx" ON "setups" USING btree ("planter_id");