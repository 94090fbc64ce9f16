CREATE TYPE "public"."inspection_status" AS ENUM('started', 'completed');--> statement-breakpoint
CREATE TYPE "public"."inspection_item_result" AS ENUM('ok', 'needs-fixing', 'replaced');--> statement-breakpoint
CREATE TYPE "public"."work_item_status" AS ENUM('open', 'in-progress', 'closed');--> statement-breakpoint
CREATE TABLE "checklist_templates" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "checklist_templates_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"name" text NOT NULL,
	"items" jsonb NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "inspection_items" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "inspection_items_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"inspection_id" integer NOT NULL,
	"position" integer NOT NULL,
	"area" text NOT NULL,
	"label" text NOT NULL,
	"hint" text,
	"result" "inspection_item_result",
	"notes" text,
	"photo_upload_ids" integer[] DEFAULT '{}' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "inspections" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "inspections_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"planter_id" integer NOT NULL,
	"template_id" integer,
	"template_name" text NOT NULL,
	"status" "inspection_status" DEFAULT 'started' NOT NULL,
	"notes" text,
	"inspected_by" integer,
	"completed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_events" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "service_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"planter_id" integer NOT NULL,
	"serviced_on" date NOT NULL,
	"task" text NOT NULL,
	"notes" text,
	"interval_acres" numeric(12, 4),
	"next_due_on" date,
	"performed_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "work_items" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "work_items_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"planter_id" integer NOT NULL,
	"inspection_item_id" integer,
	"title" text NOT NULL,
	"notes" text,
	"status" "work_item_status" DEFAULT 'open' NOT NULL,
	"assigned_to" integer,
	"created_by" integer,
	"closed_by" integer,
	"closed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "checklist_templates" ADD CONSTRAINT "checklist_templates_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspection_items" ADD CONSTRAINT "inspection_items_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_template_id_checklist_templates_id_fk" FOREIGN KEY ("template_id") REFERENCES "public"."checklist_templates"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_inspected_by_users_id_fk" FOREIGN KEY ("inspected_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_events" ADD CONSTRAINT "service_events_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_events" ADD CONSTRAINT "service_events_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_events" ADD CONSTRAINT "service_events_performed_by_users_id_fk" FOREIGN KEY ("performed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_planter_id_planters_id_fk" FOREIGN KEY ("planter_id") REFERENCES "public"."planters"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_inspection_item_id_inspection_items_id_fk" FOREIGN KEY ("inspection_item_id") REFERENCES "public"."inspection_items"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_assigned_to_users_id_fk" FOREIGN KEY ("assigned_to") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_items" ADD CONSTRAINT "work_items_closed_by_users_id_fk" FOREIGN KEY ("closed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "checklist_templates_farm_idx" ON "checklist_templates" USING btree ("farm_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "inspection_items_pos_idx" ON "inspection_items" USING btree ("inspection_id","position");--> statement-breakpoint
CREATE INDEX "inspections_farm_created_idx" ON "inspections" USING btree ("farm_id","created_at");--> statement-breakpoint
CREATE INDEX "inspections_planter_idx" ON "inspections" USING btree ("planter_id","created_at");--> statement-breakpoint
CREATE INDEX "service_events_planter_idx" ON "service_events" USING btree ("planter_id","serviced_on");--> statement-breakpoint
CREATE INDEX "service_events_farm_idx" ON "service_events" USING btree ("farm_id","serviced_on");--> statement-breakpoint
CREATE INDEX "work_items_farm_status_idx" ON "work_items" USING btree ("farm_id","status","created_at");--> statement-breakpoint
CREATE INDEX "work_items_planter_idx" ON "work_items" USING btree ("planter_id");